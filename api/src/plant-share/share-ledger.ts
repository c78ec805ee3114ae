import type { WordLocale } from '@homeground/shared';
import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import type { WaitlistRow } from './share-rows.js';
import type { TokenSupply } from './share-tokens.js';
import { type ShareWork, tx } from './share-tx.js';

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
 * The stock and slot moves every plant-share write is made of, as steps of a unit of work
 * (share-tx.ts, used with `yield*`). Each is a conditional statement whose affected-row count says
 * whether it happened, so run inside `ShareTxRunner.atomically` (after `tx.lockShare`) two requests,
 * on one instance or several, can never both take the last plant or the last place in a slot.
 */
@Injectable()
export class ShareLedger {
  /** Takes `n` plants of a species if that many are left. */
  *takeStock(shareId: string, slug: string, n: number): ShareWork<boolean> {
    return (
      (yield* tx.run(
        'UPDATE share_stock SET remaining = remaining - ? WHERE share_id = ? AND slug = ? AND remaining >= ?',
        n,
        shareId,
        slug,
        n,
      )) === 1
    );
  }

  /** Books one household into a slot if it has room and has not started. */
  *bookSlot(slotId: string, nowMs: number): ShareWork<boolean> {
    return (
      (yield* tx.run(
        'UPDATE share_slots SET booked = booked + 1 WHERE id = ? AND booked < capacity AND starts_at_ms > ?',
        slotId,
        nowMs,
      )) === 1
    );
  }

  *freeSlot(slotId: string): ShareWork<void> {
    yield* tx.run('UPDATE share_slots SET booked = booked - 1 WHERE id = ? AND booked > 0', slotId);
  }

  /**
   * Plants come free (a cancellation, a no-show, a smaller reservation, new stock): households on the
   * species' waitlist are offered them first, in the order they joined, and the plants are held for
   * them; what is left goes back on offer. The offers' link secrets come from `tokens`, made outside
   * the unit so a run again after a deadlock writes the same ones.
   */
  *release(shareId: string, slug: string, n: number, nowMs: number, tokens: TokenSupply): ShareWork<Released> {
    const offers: WaitlistOfferMade[] = [];
    let left = n;
    if (left > 0) {
      const waiting = yield* tx.all<WaitlistRow>(
        `SELECT id, slug, count, name, email, locale FROM share_waitlist
         WHERE share_id = ? AND slug = ? AND status = 'waiting' ORDER BY seq`,
        shareId,
        slug,
      );
      for (const w of waiting) {
        if (left === 0) break;
        const hold = Math.min(left, w.count);
        const { token, hash } = tokens.take();
        const changed = yield* tx.run(
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
      yield* tx.run(
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
  *expireOffers(nowMs: number, tokens: TokenSupply): ShareWork<{ shareId: string; offers: WaitlistOfferMade[] }[]> {
    const stale = yield* tx.all<WaitlistRow>(
      `SELECT * FROM share_waitlist WHERE status = 'offered' AND offered_until <= ? ORDER BY share_id, seq`,
      nowMs,
    );
    const moved: { shareId: string; offers: WaitlistOfferMade[] }[] = [];
    let locked = '';
    for (const w of stale) {
      // Each share's row is locked before its waitlist moves, as every other unit on it does.
      if (w.share_id !== locked) yield* tx.lockShare((locked = w.share_id));
      const changed = yield* tx.run(
        `UPDATE share_waitlist SET status = 'expired' WHERE id = ? AND status = 'offered'`,
        w.id,
      );
      if (changed !== 1) continue;
      moved.push({
        shareId: w.share_id,
        offers: (yield* this.release(w.share_id, w.slug, w.held, nowMs, tokens)).offers,
      });
    }
    return moved;
  }

  /** Adds a stock row for a species not yet on offer (0 plants), so moves can find it. */
  *ensureStockRow(shareId: string, slug: string): ShareWork<void> {
    const exists = yield* tx.get<{ n: number }>(
      'SELECT COUNT(*) AS n FROM share_stock WHERE share_id = ? AND slug = ?',
      shareId,
      slug,
    );
    if (exists && Number(exists.n) > 0) return;
    const pos = yield* tx.get<{ p: number | null }>(
      'SELECT MAX(position) AS p FROM share_stock WHERE share_id = ?',
      shareId,
    );
    yield* tx.run(
      'INSERT INTO share_stock (id, share_id, slug, offered, remaining, position) VALUES (?, ?, ?, 0, 0, ?)',
      randomUUID(),
      shareId,
      slug,
      (pos?.p ?? -1) + 1,
    );
  }
}
