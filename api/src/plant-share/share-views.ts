import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import {
  careSheetFor,
  type CareSheetEntry,
  type Group,
  type PickupHousehold,
  type PickupSlot,
  type PlantShare,
  type ReservationLine,
  RESERVATION_STATUSES,
  type ReservationStatus,
  type ShareStockLine,
  type ShareWaitlist,
  type TakerReservation,
  type WordLocale,
} from '@homeground/shared';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { GroupsService } from '../groups/groups.service.js';
import { ShareMailQueue } from './share-mail-queue.js';
import { MixContextService } from '../mix-context/mix-context.service.js';
import { type ShareWork, ShareTxRunner, tx } from './share-tx.js';
import { waitlistOfferEmail } from './share-emails.js';
import type { WaitlistOfferMade } from './share-ledger.js';
import {
  type LineRow,
  type ReservationRow,
  SHARE_COLUMNS,
  type ShareRow,
  type SlotRow,
  type StockRow,
  type WaitlistRow,
} from './share-rows.js';

/** Adds `days` to an ISO date (UTC calendar arithmetic). */
export function addDays(date: string, days: number): string {
  return new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
}

/**
 * Reads a share and turns rows into the shared answer shapes; sends the waitlist offers that moves
 * made. Names and e-mails leave here only in the organiser's pickup list and the taker's own view.
 */
/** How long a looked-up group is reused. */
const GROUP_CACHE_MS = 5000;

@Injectable()
export class ShareViews {
  private readonly groupCache = new Map<string, { group: Group; until: number }>();
  constructor(
    private readonly runner: ShareTxRunner,
    private readonly ctx: MixContextService,
    private readonly mail: ShareMailQueue,
    private readonly groups: GroupsService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /**
   * The group by slug, remembered for a few seconds: a burst of reservations the moment a share opens
   * would otherwise look the same group up hundreds of times. A renamed group shows within seconds.
   */
  async group(slug: string): Promise<Group> {
    const now = Date.now();
    const hit = this.groupCache.get(slug);
    if (hit && hit.until > now) return hit.group;
    const group = await this.groups.getDto(slug);
    this.groupCache.set(slug, { group, until: now + GROUP_CACHE_MS });
    return group;
  }

  /** The group by id, through the same cache. */
  async groupById(id: string): Promise<Group> {
    for (const hit of this.groupCache.values()) if (hit.group.id === id && hit.until > Date.now()) return hit.group;
    const group = await this.groups.getDtoById(id);
    this.groupCache.set(group.slug, { group, until: Date.now() + GROUP_CACHE_MS });
    return group;
  }

  /** Runs read-only steps outside a transaction (see ShareTxRunner.read). */
  read<T>(work: () => ShareWork<T>): Promise<T> {
    return this.runner.read(work);
  }

  /** The group's share for its newest season, or null. */
  *shareOf(groupId: string): ShareWork<ShareRow | null> {
    return (
      (yield* tx.get<ShareRow>(
        `SELECT ${SHARE_COLUMNS} FROM plant_shares WHERE group_id = ? ORDER BY share_date DESC LIMIT 1`,
        groupId,
      )) ?? null
    );
  }

  *requireShare(group: Group): ShareWork<ShareRow> {
    const share = yield* this.shareOf(group.id);
    if (!share) throw new NotFoundException(`${group.name} has no plant share yet.`);
    return share;
  }

  *shareById(id: string): ShareWork<ShareRow> {
    return (yield* tx.get<ShareRow>(`SELECT ${SHARE_COLUMNS} FROM plant_shares WHERE id = ?`, id))!;
  }

  *slots(shareId: string): ShareWork<SlotRow[]> {
    return yield* tx.all<SlotRow>('SELECT * FROM share_slots WHERE share_id = ? ORDER BY starts_at_ms, id', shareId);
  }

  *stock(shareId: string): ShareWork<StockRow[]> {
    return yield* tx.all<StockRow>('SELECT * FROM share_stock WHERE share_id = ? ORDER BY position', shareId);
  }

  *linesOf(reservationIds: readonly string[]): ShareWork<Map<string, LineRow[]>> {
    const out = new Map<string, LineRow[]>();
    if (reservationIds.length === 0) return out;
    // Chunks keep the statement under SQLite's 999-parameter limit.
    for (let i = 0; i < reservationIds.length; i += 500) {
      const chunk = reservationIds.slice(i, i + 500);
      const rows = yield* tx.all<LineRow>(
        `SELECT reservation_id, slug, count FROM share_reservation_lines WHERE reservation_id IN (${chunk.map(() => '?').join(',')}) ORDER BY position`,
        ...chunk,
      );
      for (const r of rows) out.set(r.reservation_id, [...(out.get(r.reservation_id) ?? []), r]);
    }
    return out;
  }

  names(slug: string): { commonName: string; scientificName: string } {
    const s = this.ctx.get(slug);
    return s
      ? { commonName: s.commonNames[0], scientificName: s.scientificName }
      : { commonName: slug, scientificName: slug };
  }

  line(l: { slug: string; count: number }): ReservationLine {
    return { speciesSlug: l.slug, ...this.names(l.slug), count: l.count };
  }

  careSheet(slugs: readonly string[], locale: WordLocale = 'en'): CareSheetEntry[] {
    return slugs.flatMap((slug) => {
      const s = this.ctx.get(slug);
      return s ? [careSheetFor(s, locale)] : [];
    });
  }

  slot(s: SlotRow): PickupSlot {
    return {
      id: s.id,
      start: s.starts_at,
      end: s.ends_at,
      capacity: s.capacity,
      booked: s.booked,
      left: s.capacity - s.booked,
    };
  }

  /** The share as its organisers see it. */
  *organiserView(group: Group, share: ShareRow): ShareWork<PlantShare> {
    const season = yield* tx.get<{ year: number }>('SELECT year FROM seasons WHERE id = ?', share.season_id);
    const counts = yield* tx.all<{ status: ReservationStatus; n: number }>(
      'SELECT status, COUNT(*) AS n FROM share_reservations WHERE share_id = ? GROUP BY status',
      share.id,
    );
    const households = Object.fromEntries(RESERVATION_STATUSES.map((s) => [s, 0])) as Record<ReservationStatus, number>;
    for (const c of counts) households[c.status] = Number(c.n);
    const reserved = yield* this.sumBySlug(
      `SELECT l.slug, SUM(l.count) AS n FROM share_reservation_lines l JOIN share_reservations r ON r.id = l.reservation_id
       WHERE r.share_id = ? AND r.status = 'confirmed' GROUP BY l.slug`,
      share.id,
    );
    const given = yield* this.givenBySlug(share.id);
    const waitlisted = yield* this.sumBySlug(
      `SELECT slug, SUM(count) AS n FROM share_waitlist WHERE share_id = ? AND status = 'waiting' GROUP BY slug`,
      share.id,
    );
    const stock: ShareStockLine[] = (yield* this.stock(share.id)).map((s) => ({
      speciesSlug: s.slug,
      ...this.names(s.slug),
      offered: s.offered,
      remaining: s.remaining,
      reserved: reserved.get(s.slug) ?? 0,
      given: given.get(s.slug) ?? 0,
      waitlisted: waitlisted.get(s.slug) ?? 0,
    }));
    const walkUps = yield* tx.get<{ n: number }>(
      'SELECT COUNT(*) AS n FROM share_walk_ups WHERE share_id = ?',
      share.id,
    );
    const slots = yield* this.slots(share.id);
    return {
      id: share.id,
      groupSlug: group.slug,
      groupName: group.name,
      seasonYear: season?.year ?? Number(share.share_date.slice(0, 4)),
      date: share.share_date,
      place: this.place(share),
      status: share.status,
      limits: { perSpecies: share.per_species_limit, total: share.total_limit },
      retentionDays: share.retention_days,
      personalDataKeptUntil: addDays(share.share_date, share.retention_days),
      slots: slots.map((s) => this.slot(s)),
      stock,
      households,
      walkUps: Number(walkUps?.n ?? 0),
      whatToBring: share.what_to_bring,
    };
  }

  /**
   * The waitlist per species in the order plants are offered (the order households joined), for the
   * group's organisers: names and e-mails included, as on the pickup list, until the retention ends.
   */
  *waitlist(share: ShareRow): ShareWork<ShareWaitlist> {
    const rows = yield* tx.all<WaitlistRow & { created_at: string }>(
      `SELECT id, slug, count, held, status, offered_until, name, email, seq, created_at FROM share_waitlist
       WHERE share_id = ? ORDER BY seq`,
      share.id,
    );
    const stock = yield* this.stock(share.id);
    const order = [...stock.map((s) => s.slug), ...rows.map((r) => r.slug)];
    const slugs = [...new Set(order)].filter((slug) => rows.some((r) => r.slug === slug));
    return {
      species: slugs.map((slug) => {
        // Position counts only households still in line; those served or passed over keep no place.
        let position = 0;
        return {
          speciesSlug: slug,
          ...this.names(slug),
          remaining: stock.find((s) => s.slug === slug)?.remaining ?? 0,
          entries: rows
            .filter((r) => r.slug === slug)
            .map((r) => ({
              position: r.status === 'waiting' || r.status === 'offered' ? ++position : 0,
              name: r.name,
              email: r.email,
              count: r.count,
              status: r.status,
              held: r.held,
              heldUntil:
                r.status === 'offered' && r.offered_until !== null ? new Date(r.offered_until).toISOString() : null,
              joinedAt: r.created_at,
            })),
        };
      }),
    };
  }

  /** Plants handed over by species: picked-up reservations and walk-ups. */
  *givenBySlug(shareId: string): ShareWork<Map<string, number>> {
    const picked = yield* this.sumBySlug(
      `SELECT l.slug, SUM(l.count) AS n FROM share_reservation_lines l JOIN share_reservations r ON r.id = l.reservation_id
       WHERE r.share_id = ? AND r.status = 'picked-up' GROUP BY l.slug`,
      shareId,
    );
    const walked = yield* this.sumBySlug(
      `SELECT l.slug, SUM(l.count) AS n FROM share_walk_up_lines l JOIN share_walk_ups w ON w.id = l.walk_up_id
       WHERE w.share_id = ? GROUP BY l.slug`,
      shareId,
    );
    for (const [slug, n] of walked) picked.set(slug, (picked.get(slug) ?? 0) + n);
    return picked;
  }

  private *sumBySlug(sql: string, shareId: string): ShareWork<Map<string, number>> {
    const rows = yield* tx.all<{ slug: string; n: number }>(sql, shareId);
    return new Map(rows.map((r) => [r.slug, Number(r.n)]));
  }

  place(share: ShareRow) {
    return {
      name: share.place_name,
      address: share.place_address,
      ...(share.place_directions ? { directions: share.place_directions } : {}),
    };
  }

  household(r: ReservationRow, lines: readonly LineRow[]): PickupHousehold {
    return {
      reservationId: r.id,
      name: r.name,
      email: r.email,
      zip: r.zip,
      status: r.status,
      plants: lines.reduce((n, l) => n + l.count, 0),
      lines: lines.map((l) => this.line(l)),
    };
  }

  /** A taker's reservation; its care sheet in `locale`, else in the language the reservation was made in. */
  *takerView(
    group: Group,
    share: ShareRow,
    r: ReservationRow,
    nowMs: number,
    locale?: WordLocale,
  ): ShareWork<TakerReservation> {
    const slot = (yield* tx.get<SlotRow>('SELECT * FROM share_slots WHERE id = ?', r.slot_id))!;
    const lines = (yield* this.linesOf([r.id])).get(r.id) ?? [];
    return {
      id: r.id,
      status: r.status,
      name: r.name ?? '',
      email: r.email ?? '',
      zip: r.zip,
      slot: { id: slot.id, start: slot.starts_at, end: slot.ends_at },
      lines: lines.map((l) => this.line(l)),
      share: {
        groupSlug: group.slug,
        groupName: group.name,
        date: share.share_date,
        place: this.place(share),
        status: share.status,
        whatToBring: share.what_to_bring,
      },
      canChange: r.status === 'confirmed' && share.status === 'open' && slot.starts_at_ms > nowMs,
      careSheet: this.careSheet(
        lines.map((l) => l.slug),
        locale ?? r.locale,
      ),
    };
  }

  /** E-mails each household a waitlist offer was made to; a failed send is logged, the hold stands. */
  async sendOffers(group: Group, share: ShareRow, offers: readonly WaitlistOfferMade[]): Promise<void> {
    for (const o of offers) {
      if (!o.email) continue;
      const input = {
        locale: o.locale,
        name: o.name ?? '',
        groupName: group.name,
        commonName: this.names(o.slug).commonName,
        count: o.count,
        heldUntil: o.heldUntil,
        place: this.place(share),
        link: `${this.config.publicUrl}/plant-share/offers/${o.token}`,
      };
      const to = o.email;
      this.mail.send(() => ({
        to,
        ...waitlistOfferEmail(input),
        kind: 'plant-share-waitlist-offer',
        groupId: group.id,
      }));
    }
  }

  publicUrl(): string {
    return this.config.publicUrl;
  }
}
