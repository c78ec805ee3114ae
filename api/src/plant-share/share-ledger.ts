import type { WordLocale } from '@homeground/shared';
import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { ShareDb } from './share-db.js';
import type { WaitlistRow } from './share-rows.js';
import { newToken } from './share-tokens.js';

/** How long plants offered to a waitlisted household are held for them (Homeground's rule: two days to answer an e-mail). */
export const OFFER_HOLD_MS = 48 * 60 * 60 * 1000;

/** Plants offered to a waitlisted household, with the secret of the link that claims them (for the e-mail). */
export interface WaitlistOfferMade {
  entryId: string;
  slug: string;
  count: number;
  name: string | null;
  email: string | null;
  token: string;
  heldUntil: string;
  locale: WordLocale;
}

/** Where released plants went. */
export interface Released {
  slug: string;
  toWaitlist: number;
  toStock: number;
  offers: WaitlistOfferMade[];
}

/**
 * The stock and slot moves every plant-share write is made of. Each is a conditional statement whose
 * affected-row count says whether it happened, so run inside `ShareDb.atomically` two requests can
 * never both take the last plant or the last place in a slot. Call only inside `atomically`.
 */
@Injectable()
export class ShareLedger {
  constructor(private readonly db: ShareDb) {}

  /** Takes `n` plants of a species if that many are left. */
  takeStock(shareId: string, slug: string, n: number): boolean {
    return (
      this.db.run(
        'UPDATE share_stock SET remaining = remaining - ? WHERE share_id = ? AND slug = ? AND remaining >= ?',
        n,
        shareId,
        slug,
        n,
      ) === 1
    );
  }

  /** Books one household into a slot if it has room and has not started. */
  bookSlot(slotId: string, nowMs: number): boolean {
    return (
      this.db.run(
        'UPDATE share_slots SET booked = booked + 1 WHERE id = ? AND booked < capacity AND starts_at_ms > ?',
        slotId,
        nowMs,
      ) === 1
    );
  }

  freeSlot(slotId: string): void {
    this.db.run('UPDATE share_slots SET booked = booked - 1 WHERE id = ? AND booked > 0', slotId);
  }

  /**
   * Plants come free (a cancellation, a no-show, a smaller reservation, new stock): households on the
   * species' waitlist are offered them first, in the order they joined, and the plants are held for
   * them; what is left goes back on offer.
   */
  release(shareId: string, slug: string, n: number, nowMs: number): Released {
    const offers: WaitlistOfferMade[] = [];
    let left = n;
    if (left > 0) {
      const waiting = this.db.all<WaitlistRow>(
        `SELECT id, slug, count, name, email, locale FROM share_waitlist
         WHERE share_id = ? AND slug = ? AND status = 'waiting' ORDER BY seq`,
        shareId,
        slug,
      );
      for (const w of waiting) {
        if (left === 0) break;
        const hold = Math.min(left, w.count);
        const { token, hash } = newToken();
        const changed = this.db.run(
          `UPDATE share_waitlist SET held = ?, status = 'offered', token_hash = ?, offered_until = ?
           WHERE id = ? AND status = 'waiting'`,
          hold,
          hash,
          nowMs + OFFER_HOLD_MS,
          w.id,
        );
        if (changed !== 1) continue;
        const heldUntil = new Date(nowMs + OFFER_HOLD_MS).toISOString();
        offers.push({
          entryId: w.id,
          slug,
          count: hold,
          name: w.name,
          email: w.email,
          token,
          heldUntil,
          locale: w.locale,
        });
        left -= hold;
      }
    }
    const toWaitlist = n - left;
    if (left > 0)
      this.db.run(
        'UPDATE share_stock SET remaining = remaining + ? WHERE share_id = ? AND slug = ?',
        left,
        shareId,
        slug,
      );
    return { slug, toWaitlist, toStock: left, offers };
  }

  /**
   * Offers not taken up in time move on: the plants they held are released again, to the next
   * household on the list or back on offer. Answers the new offers made, for their e-mails.
   */
  expireOffers(nowMs: number): { shareId: string; offers: WaitlistOfferMade[] }[] {
    const stale = this.db.all<WaitlistRow>(
      `SELECT * FROM share_waitlist WHERE status = 'offered' AND offered_until <= ? ORDER BY seq`,
      nowMs,
    );
    return stale.flatMap((w) => {
      if (this.db.run(`UPDATE share_waitlist SET status = 'expired' WHERE id = ? AND status = 'offered'`, w.id) !== 1)
        return [];
      return [{ shareId: w.share_id, offers: this.release(w.share_id, w.slug, w.held, nowMs).offers }];
    });
  }

  /** Adds a stock row for a species not yet on offer (0 plants), so moves can find it. */
  ensureStockRow(shareId: string, slug: string): void {
    const exists = this.db.get<{ n: number }>(
      'SELECT COUNT(*) AS n FROM share_stock WHERE share_id = ? AND slug = ?',
      shareId,
      slug,
    );
    if (exists && exists.n > 0) return;
    const pos = this.db.get<{ p: number | null }>(
      'SELECT MAX(position) AS p FROM share_stock WHERE share_id = ?',
      shareId,
    );
    this.db.run(
      'INSERT INTO share_stock (id, share_id, slug, offered, remaining, position) VALUES (?, ?, ?, 0, 0, ?)',
      randomUUID(),
      shareId,
      slug,
      (pos?.p ?? -1) + 1,
    );
  }
}
