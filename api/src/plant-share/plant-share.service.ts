import { randomUUID } from 'node:crypto';
import { ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import {
  type AddStockRequest,
  type CheckInRequest,
  type CheckInResult,
  DEFAULT_RETENTION_DAYS,
  type EditShareRequest,
  germinationReport,
  type Group,
  type OpenShareRequest,
  type PickupList,
  type PickupSlotRequest,
  type PlantShare,
  type SetStockRequest,
  type SharePlace,
  seasonReport,
  type ShareReport,
  shareReportToCsv,
  type ShareStatusRequest,
  type ShareWaitlist,
  type Species,
  type StockLine,
  type WalkUpGift,
  type PlantLine,
} from '@homeground/shared';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { badRequest, type FieldProblem } from '../common/validation/bad-request.js';
import { GroupsService } from '../groups/groups.service.js';
import { MixContextService } from '../mix-context/mix-context.service.js';
import { BatchesService } from '../batches/batches.service.js';
import { type SeasonPlan, SeasonsService } from '../seasons/seasons.service.js';
import { Clock } from './clock.js';
import { pickupChangeEmail, type PickupChange } from './share-emails.js';
import { ShareMailQueue } from './share-mail-queue.js';
import { TokenSupply } from './share-tokens.js';
import { pgErrorCode, type ShareWork, ShareTxRunner, tx } from './share-tx.js';
import { type Released, ShareLedger, type WaitlistOfferMade } from './share-ledger.js';
import type { LineRow, ReservationRow, SlotRow } from './share-rows.js';
import { ShareViews } from './share-views.js';

/** The organiser's side of the plant share: open it, slots, stock, status, pickup day and the report. */
@Injectable()
export class PlantShareService {
  constructor(
    private readonly runner: ShareTxRunner,
    private readonly ledger: ShareLedger,
    private readonly views: ShareViews,
    private readonly groups: GroupsService,
    private readonly seasons: SeasonsService,
    private readonly ctx: MixContextService,
    private readonly clock: Clock,
    private readonly batches: BatchesService,
    private readonly mail: ShareMailQueue,
  ) {}

  /**
   * The stock a new share starts with: the plants growers have logged ready, per species
   * (BatchesService.readyCountsBySpecies). Until any batch has logged a ready plant (a group that does
   * not track batches, or a share opened early) it is the season's targets, for the organiser to edit.
   */
  async initialStockFor(season: SeasonPlan): Promise<StockLine[]> {
    const ready = await this.batches.readyCountsBySpecies(season.id);
    if (ready.some((r) => r.readyPlants > 0)) return ready.map((r) => ({ speciesSlug: r.slug, count: r.readyPlants }));
    return season.targets.map((t) => ({ speciesSlug: t.slug, count: t.targetPlants }));
  }

  async open(slug: string, user: AuthenticatedUser, req: OpenShareRequest): Promise<PlantShare> {
    const group = await this.managed(slug, user);
    const season = await this.seasons.latestPlan(group.id);
    if (!season) throw new NotFoundException(`${group.name} has no season plan yet: set the season's dates first.`);
    const now = this.clock.now();
    const problems: FieldProblem[] = [];
    if (req.date < now.toISOString().slice(0, 10)) problems.push({ field: 'date', message: 'is in the past' });
    req.slots.forEach((s, i) => problems.push(...slotProblems(s, req.date, now, `slots.${i}`)));
    const stock = req.stock ?? (await this.initialStockFor(season));
    if (req.stock)
      this.ctx.assertKnown(req.stock.map((l, i) => ({ field: `stock.${i}.speciesSlug`, slug: l.speciesSlug })));
    if (problems.length) throw badRequest(problems);
    const id = randomUUID();
    const openAlready = () =>
      new ConflictException(`${group.name}'s ${season.year} plant share is open already: change it instead.`);
    await this.runner
      .atomically(() =>
        function* (this: PlantShareService) {
          if (yield* tx.get('SELECT id FROM plant_shares WHERE season_id = ?', season.id)) throw openAlready();
          yield* tx.run(
            `INSERT INTO plant_shares (id, group_id, season_id, share_date, place_name, place_address, place_directions, status,
           per_species_limit, total_limit, retention_days, what_to_bring) VALUES (?, ?, ?, ?, ?, ?, ?, 'open', ?, ?, ?, ?)`,
            id,
            group.id,
            season.id,
            req.date,
            req.place.name,
            req.place.address,
            req.place.directions ?? null,
            req.limits.perSpecies,
            req.limits.total,
            req.retentionDays ?? DEFAULT_RETENTION_DAYS,
            req.whatToBring || null,
          );
          for (const s of req.slots) yield* this.insertSlot(id, s);
          for (const [position, l] of stock.entries())
            yield* tx.run(
              'INSERT INTO share_stock (id, share_id, slug, offered, remaining, position) VALUES (?, ?, ?, ?, ?, ?)',
              randomUUID(),
              id,
              l.speciesSlug,
              l.count,
              l.count,
              position,
            );
        }.call(this),
      )
      .catch((e: unknown) => {
        // A new share has no row to lock yet: two opened at the same moment on two instances both pass the
        // check above, and the unique season index refuses the second (PostgreSQL's unique violation).
        throw pgErrorCode(e) === '23505' ? openAlready() : e;
      });
    return this.organiserViewOf(group, id);
  }

  async get(slug: string, user: AuthenticatedUser): Promise<PlantShare> {
    const group = await this.managed(slug, user);
    const views = this.views;
    return views.read(function* () {
      return yield* views.organiserView(group, yield* views.requireShare(group));
    });
  }

  /** The organiser's view of a share as it is now (read after the unit that changed it). */
  private organiserViewOf(group: Group, shareId: string): Promise<PlantShare> {
    const views = this.views;
    return views.read(function* () {
      return yield* views.organiserView(group, yield* views.shareById(shareId));
    });
  }

  /** The group's share, or 404. */
  private shareOf(group: Group) {
    const views = this.views;
    return views.read(() => views.requireShare(group));
  }

  /**
   * Changes the day, place, limits, retention or what to bring of a share, open or not. Never below
   * what is promised: limits not under what a household has reserved already (400 naming the limit),
   * and the day not moved once households have booked a slot on it (409), since they planned for it.
   * A new day moves every slot to the same times on that day, in the same transaction.
   */
  async edit(slug: string, user: AuthenticatedUser, req: EditShareRequest): Promise<PlantShare> {
    const group = await this.managed(slug, user);
    const share = await this.shareOf(group);
    const now = this.clock.now();
    const moving = req.date !== undefined && req.date !== share.share_date;
    const problems: FieldProblem[] = [];
    if (moving && req.date! < now.toISOString().slice(0, 10))
      problems.push({ field: 'date', message: 'is in the past' });
    if (req.limits) {
      const most = await this.runner.read(() =>
        tx.get<{ line: number | null; household: number | null }>(
          `SELECT MAX(l.count) AS line, MAX(t.n) AS household FROM share_reservation_lines l
           JOIN share_reservations r ON r.id = l.reservation_id
           JOIN (SELECT reservation_id, SUM(count) AS n FROM share_reservation_lines GROUP BY reservation_id) t
             ON t.reservation_id = r.id
         WHERE r.share_id = ? AND r.status = 'confirmed'`,
          share.id,
        ),
      );
      const line = Number(most?.line ?? 0);
      const household = Number(most?.household ?? 0);
      if (req.limits.perSpecies < line)
        problems.push({
          field: 'limits.perSpecies',
          message: `must be at least ${line}: a household has reserved ${line} plants of one species already`,
        });
      if (req.limits.total < household)
        problems.push({
          field: 'limits.total',
          message: `must be at least ${household}: a household has reserved ${household} plants in all already`,
        });
    }
    if (problems.length) throw badRequest(problems);
    if (moving) {
      const slots = await this.runner.read(() => this.views.slots(share.id));
      const started = slots.filter((s) => s.starts_at_ms <= now.getTime());
      if (started.length)
        throw badRequest([{ field: 'date', message: 'cannot move: a pickup slot on the old day has started' }]);
    }
    // What every taker with a live reservation is told of: a new day or place (limits and the rest are not theirs).
    const before = this.views.place(share);
    const change: PickupChange = {
      ...(moving && { day: { before: share.share_date, now: req.date! } }),
      ...(req.place &&
        !samePlace(before, req.place) && {
          place: { before, now: req.place },
        }),
    };
    const tokens = new TokenSupply();
    const told = await this.runner.atomically(() =>
      function* (this: PlantShareService) {
        tokens.rewind();
        yield* tx.lockShare(share.id);
        if (moving) {
          const booked = (yield* tx.get<{ n: number }>(
            `SELECT COUNT(*) AS n FROM share_reservations WHERE share_id = ? AND status = 'confirmed'`,
            share.id,
          ))!;
          if (Number(booked.n) > 0)
            throw new ConflictException({
              message: `${Number(booked.n)} ${Number(booked.n) === 1 ? 'household has' : 'households have'} booked a pickup slot on ${share.share_date}: the day cannot move under them. Pause the share and write to them first, or keep the day.`,
              fields: [{ field: 'date', message: 'households have booked on the current day' }],
            });
          // The same clock times and offsets on the new day: "Saturday 9:00" stays 9:00. The slots are read
          // again behind the lock: one added since the check above moves too.
          for (const s of yield* this.views.slots(share.id)) {
            const start = `${req.date}${s.starts_at.slice(10)}`;
            const end = `${req.date}${s.ends_at.slice(10)}`;
            yield* tx.run(
              'UPDATE share_slots SET starts_at = ?, ends_at = ?, starts_at_ms = ?, ends_at_ms = ? WHERE id = ?',
              start,
              end,
              Date.parse(start),
              Date.parse(end),
              s.id,
            );
          }
        }
        yield* tx.run(
          `UPDATE plant_shares SET share_date = ?, place_name = ?, place_address = ?, place_directions = ?,
           per_species_limit = ?, total_limit = ?, retention_days = ?, what_to_bring = ?, updated_at = ? WHERE id = ?`,
          req.date ?? share.share_date,
          req.place?.name ?? share.place_name,
          req.place?.address ?? share.place_address,
          req.place ? (req.place.directions ?? null) : share.place_directions,
          req.limits?.perSpecies ?? share.per_species_limit,
          req.limits?.total ?? share.total_limit,
          req.retentionDays ?? share.retention_days,
          req.whatToBring === undefined ? share.what_to_bring : req.whatToBring || null,
          now.toISOString(),
          share.id,
        );
        return change.day || change.place ? yield* this.newLinks(share.id, null, tokens) : [];
      }.call(this),
    );
    await this.mailChange(group, told, change);
    return this.organiserViewOf(group, share.id);
  }

  /** The waitlist per species, in the order plants are offered; names and e-mails for organisers only. */
  async waitlist(slug: string, user: AuthenticatedUser): Promise<ShareWaitlist> {
    const group = await this.managed(slug, user);
    const views = this.views;
    return views.read(function* () {
      return yield* views.waitlist(yield* views.requireShare(group));
    });
  }

  async addSlot(slug: string, user: AuthenticatedUser, req: PickupSlotRequest): Promise<PlantShare> {
    const group = await this.managed(slug, user);
    const share = await this.shareOf(group);
    const problems = slotProblems(req, share.share_date, this.clock.now(), '');
    if (problems.length) throw badRequest(problems);
    await this.runner.atomically(() =>
      function* (this: PlantShareService) {
        yield* tx.lockShare(share.id);
        const n = (yield* tx.get<{ n: number }>('SELECT COUNT(*) AS n FROM share_slots WHERE share_id = ?', share.id))!;
        if (Number(n.n) >= 60) throw new ConflictException('This share has 60 pickup slots, the most it can have.');
        yield* this.insertSlot(share.id, req);
      }.call(this),
    );
    return this.organiserViewOf(group, share.id);
  }

  async editSlot(slug: string, user: AuthenticatedUser, slotId: string, req: PickupSlotRequest): Promise<PlantShare> {
    const group = await this.managed(slug, user);
    const share = await this.shareOf(group);
    const problems = slotProblems(req, share.share_date, this.clock.now(), '');
    if (problems.length) throw badRequest(problems);
    const tokens = new TokenSupply();
    const { slot, told } = await this.runner.atomically(() =>
      function* (this: PlantShareService) {
        tokens.rewind();
        yield* tx.lockShare(share.id);
        const slot = yield* tx.get<SlotRow>(
          'SELECT * FROM share_slots WHERE id = ? AND share_id = ?',
          slotId,
          share.id,
        );
        if (!slot) throw new NotFoundException('No such pickup slot in this share.');
        // Never below the households already booked: they were promised their place.
        const changed = yield* tx.run(
          `UPDATE share_slots SET starts_at = ?, ends_at = ?, starts_at_ms = ?, ends_at_ms = ?, capacity = ?
         WHERE id = ? AND booked <= ?`,
          req.start,
          req.end,
          Date.parse(req.start),
          Date.parse(req.end),
          req.capacity,
          slotId,
          req.capacity,
        );
        if (changed !== 1)
          throw badRequest([
            {
              field: 'capacity',
              message: `must be at least ${slot.booked}: that many households are booked in this slot`,
            },
          ]);
        const moved = Date.parse(req.start) !== slot.starts_at_ms || Date.parse(req.end) !== slot.ends_at_ms;
        return { slot, told: moved ? yield* this.newLinks(share.id, slotId, tokens) : [] };
      }.call(this),
    );
    await this.mailChange(group, told, {
      slot: { before: { start: slot.starts_at, end: slot.ends_at }, now: { start: req.start, end: req.end } },
    });
    return this.organiserViewOf(group, share.id);
  }

  /**
   * Deletes a pickup slot nobody has reserved in. A slot with reservations (live, picked up or
   * cancelled) stays: households were promised it and the report counts it (409 saying how many).
   */
  async deleteSlot(slug: string, user: AuthenticatedUser, slotId: string): Promise<PlantShare> {
    const group = await this.managed(slug, user);
    const share = await this.shareOf(group);
    await this.runner.atomically(function* () {
      yield* tx.lockShare(share.id);
      const slot = yield* tx.get<SlotRow>('SELECT * FROM share_slots WHERE id = ? AND share_id = ?', slotId, share.id);
      if (!slot) throw new NotFoundException('No such pickup slot in this share.');
      const held = (yield* tx.get<{ n: number; live: number }>(
        `SELECT COUNT(*) AS n, COALESCE(SUM(CASE WHEN status = 'confirmed' THEN 1 ELSE 0 END), 0) AS live
         FROM share_reservations WHERE slot_id = ?`,
        slotId,
      ))!;
      const n = Number(held.n);
      if (n > 0)
        throw new ConflictException({
          message:
            `This pickup slot has ${n} ${n === 1 ? 'reservation' : 'reservations'} (${Number(held.live)} still to pick up), ` +
            'so it cannot be deleted: households were promised it. Change its times or households instead.',
          fields: [{ field: 'slotId', message: 'has reservations' }],
        });
      yield* tx.run('DELETE FROM share_slots WHERE id = ?', slotId);
    });
    return this.organiserViewOf(group, share.id);
  }

  /**
   * Gives each live reservation of the share (or of one slot) a new private link, inside the caller's
   * transaction: only a hash of a link is kept, so a change e-mail can carry a working link only by
   * making a new one (the e-mail says it replaces the earlier one). The secrets come from `tokens`,
   * made outside the unit (it may run again).
   */
  private *newLinks(
    shareId: string,
    slotId: string | null,
    tokens: TokenSupply,
  ): ShareWork<{ row: ReservationRow; token: string }[]> {
    const rows = yield* tx.all<ReservationRow>(
      `SELECT * FROM share_reservations WHERE share_id = ? AND status = 'confirmed'${slotId ? ' AND slot_id = ?' : ''}`,
      ...(slotId ? [shareId, slotId] : [shareId]),
    );
    const told: { row: ReservationRow; token: string }[] = [];
    for (const row of rows) {
      const { token, hash } = tokens.take();
      yield* tx.run('UPDATE share_reservations SET token_hash = ? WHERE id = ?', hash, row.id);
      told.push({ row, token });
    }
    return told;
  }

  /** Queues the change e-mail to each taker told, in their own language, after the change is written. */
  private async mailChange(
    group: Group,
    told: { row: ReservationRow; token: string }[],
    change: PickupChange,
  ): Promise<void> {
    const live = told.filter(({ row }) => row.email && row.name); // names and e-mails already purged after the share
    // Each taker's plants are read now, after the change is written; the e-mail is rendered when it is sent.
    const lines = await this.runner.read(() => this.views.linesOf(live.map(({ row }) => row.id)));
    for (const { row, token } of live) {
      const email = row.email!;
      const name = row.name!;
      const plants = lines.get(row.id) ?? [];
      this.mail.send(() => ({
        to: email,
        ...pickupChangeEmail({
          locale: row.locale,
          name,
          groupName: group.name,
          change,
          lines: plants.map((l) => ({ commonName: this.ctx.get(l.slug)?.commonNames[0] ?? l.slug, count: l.count })),
          link: `${this.views.publicUrl()}/plant-share/reservations/${token}`,
        }),
        kind: 'plant-share-change',
        groupId: group.id,
      }));
    }
  }

  /** Sets the plants still on offer of each species listed; an increase goes to the waitlist first. */
  async setStock(slug: string, user: AuthenticatedUser, req: SetStockRequest): Promise<PlantShare> {
    const group = await this.managed(slug, user);
    const share = await this.shareOf(group);
    this.ctx.assertKnown(req.stock.map((l, i) => ({ field: `stock.${i}.speciesSlug`, slug: l.speciesSlug })));
    const nowMs = this.clock.now().getTime();
    const tokens = new TokenSupply();
    const offers = await this.runner.atomically(() =>
      function* (this: PlantShareService) {
        tokens.rewind();
        yield* tx.lockShare(share.id);
        const made: WaitlistOfferMade[] = [];
        for (const l of req.stock) {
          yield* this.ledger.ensureStockRow(share.id, l.speciesSlug);
          const row = (yield* tx.get<{ remaining: number }>(
            'SELECT remaining FROM share_stock WHERE share_id = ? AND slug = ?',
            share.id,
            l.speciesSlug,
          ))!;
          const delta = l.count - row.remaining;
          if (delta > 0) {
            yield* tx.run(
              'UPDATE share_stock SET offered = offered + ? WHERE share_id = ? AND slug = ?',
              delta,
              share.id,
              l.speciesSlug,
            );
            made.push(...(yield* this.ledger.release(share.id, l.speciesSlug, delta, nowMs, tokens)).offers);
          } else if (delta < 0) {
            yield* tx.run(
              'UPDATE share_stock SET offered = offered + ?, remaining = ? WHERE share_id = ? AND slug = ?',
              delta,
              l.count,
              share.id,
              l.speciesSlug,
            );
          }
        }
        return made;
      }.call(this),
    );
    await this.views.sendOffers(group, share, offers);
    return this.organiserViewOf(group, share.id);
  }

  /** Adds plants that became ready; the waitlist is offered them first, in order. */
  async addStock(slug: string, user: AuthenticatedUser, req: AddStockRequest): Promise<PlantShare> {
    const group = await this.managed(slug, user);
    const share = await this.shareOf(group);
    this.ctx.assertKnown(req.lines.map((l, i) => ({ field: `lines.${i}.speciesSlug`, slug: l.speciesSlug })));
    const nowMs = this.clock.now().getTime();
    const tokens = new TokenSupply();
    const offers = await this.runner.atomically(() =>
      function* (this: PlantShareService) {
        tokens.rewind();
        yield* tx.lockShare(share.id);
        const made: WaitlistOfferMade[] = [];
        for (const l of req.lines) {
          yield* this.ledger.ensureStockRow(share.id, l.speciesSlug);
          yield* tx.run(
            'UPDATE share_stock SET offered = offered + ? WHERE share_id = ? AND slug = ?',
            l.count,
            share.id,
            l.speciesSlug,
          );
          made.push(...(yield* this.ledger.release(share.id, l.speciesSlug, l.count, nowMs, tokens)).offers);
        }
        return made;
      }.call(this),
    );
    await this.views.sendOffers(group, share, offers);
    return this.organiserViewOf(group, share.id);
  }

  async setStatus(slug: string, user: AuthenticatedUser, req: ShareStatusRequest): Promise<PlantShare> {
    const group = await this.managed(slug, user);
    const share = await this.shareOf(group);
    const stamp = this.clock.now().toISOString();
    await this.runner.atomically(function* () {
      yield* tx.lockShare(share.id);
      yield* tx.run(`UPDATE plant_shares SET status = ?, updated_at = ? WHERE id = ?`, req.status, stamp, share.id);
    });
    return this.organiserViewOf(group, share.id);
  }

  /** The printable list of one slot: households, their plants, and check boxes (the web prints it). */
  async pickupList(slug: string, user: AuthenticatedUser, slotId: string): Promise<PickupList> {
    const group = await this.managed(slug, user);
    const views = this.views;
    const { slot, rows, lines } = await views.read(function* () {
      const share = yield* views.requireShare(group);
      const slot = yield* tx.get<SlotRow>('SELECT * FROM share_slots WHERE id = ? AND share_id = ?', slotId, share.id);
      if (!slot) throw new NotFoundException('No such pickup slot in this share.');
      // LOWER rather than SQLite's NOCASE: the same A–Z folding on both databases.
      const rows = yield* tx.all<ReservationRow>(
        `SELECT * FROM share_reservations WHERE slot_id = ? AND status != 'cancelled' ORDER BY LOWER(name), created_at`,
        slotId,
      );
      return { slot, rows, lines: yield* views.linesOf(rows.map((r) => r.id)) };
    });
    const households = rows.map((r) => this.views.household(r, lines.get(r.id) ?? []));
    const bySpecies = new Map<string, number>();
    for (const h of households)
      if (h.status !== 'no-show')
        for (const l of h.lines) bySpecies.set(l.speciesSlug, (bySpecies.get(l.speciesSlug) ?? 0) + l.count);
    return {
      slot: this.views.slot(slot),
      households,
      totals: {
        households: households.filter((h) => h.status !== 'no-show').length,
        plants: [...bySpecies.values()].reduce((n, c) => n + c, 0),
        bySpecies: [...bySpecies].map(([s, count]) => ({
          speciesSlug: s,
          commonName: this.views.names(s).commonName,
          count,
        })),
      },
    };
  }

  /** Pickup day: the household came, or did not (their plants go to the waitlist, else back on offer). */
  async checkIn(
    slug: string,
    user: AuthenticatedUser,
    reservationId: string,
    req: CheckInRequest,
  ): Promise<CheckInResult> {
    const group = await this.managed(slug, user);
    const share = await this.shareOf(group);
    const now = this.clock.now();
    const nowMs = now.getTime();
    const tokens = new TokenSupply();
    const { row, released } = await this.runner.atomically(() =>
      function* (this: PlantShareService) {
        tokens.rewind();
        yield* tx.lockShare(share.id);
        const r = yield* tx.get<ReservationRow>(
          'SELECT * FROM share_reservations WHERE id = ? AND share_id = ?',
          reservationId,
          share.id,
        );
        if (!r) throw new NotFoundException('No such reservation in this share.');
        const changed = yield* tx.run(
          `UPDATE share_reservations SET status = ?, updated_at = ? WHERE id = ? AND status = 'confirmed'`,
          req.outcome,
          now.toISOString(),
          r.id,
        );
        if (changed !== 1) throw new ConflictException(`This reservation is ${r.status} already.`);
        const out: Released[] = [];
        if (req.outcome === 'no-show') {
          yield* this.ledger.freeSlot(r.slot_id);
          for (const l of yield* this.linesOfOne(r.id))
            out.push(yield* this.ledger.release(share.id, l.slug, l.count, nowMs, tokens));
        }
        return { row: { ...r, status: req.outcome }, released: out };
      }.call(this),
    );
    await this.views.sendOffers(
      group,
      share,
      released.flatMap((r) => r.offers),
    );
    const lines = await this.runner.read(() => this.linesOfOne(row.id));
    return {
      household: this.views.household(row, lines),
      released: released.map((r) => ({ speciesSlug: r.slug, toWaitlist: r.toWaitlist, toStock: r.toStock })),
    };
  }

  /** Records plants given without a reservation; they come off the stock the same way. */
  async walkUp(slug: string, user: AuthenticatedUser, req: { lines: PlantLine[]; zip?: string }): Promise<WalkUpGift> {
    const group = await this.managed(slug, user);
    const share = await this.shareOf(group);
    const id = randomUUID();
    const givenAt = this.clock.now().toISOString();
    await this.runner.atomically(() =>
      function* (this: PlantShareService) {
        yield* tx.lockShare(share.id);
        const short: FieldProblem[] = [];
        for (const [i, l] of req.lines.entries()) {
          if (!(yield* this.ledger.takeStock(share.id, l.speciesSlug, l.count))) {
            const left = yield* tx.get<{ remaining: number }>(
              'SELECT remaining FROM share_stock WHERE share_id = ? AND slug = ?',
              share.id,
              l.speciesSlug,
            );
            short.push({
              field: `lines.${i}.count`,
              message: left ? `only ${left.remaining} left on offer` : 'is not a species on offer at this share',
            });
          }
        }
        if (short.length)
          throw new ConflictException({ message: 'Not enough plants left for this walk-up.', fields: short });
        yield* tx.run(
          'INSERT INTO share_walk_ups (id, share_id, zip_area, given_at) VALUES (?, ?, ?, ?)',
          id,
          share.id,
          req.zip ? req.zip.slice(0, 3) : null,
          givenAt,
        );
        for (const l of req.lines)
          yield* tx.run(
            'INSERT INTO share_walk_up_lines (id, walk_up_id, slug, count) VALUES (?, ?, ?, ?)',
            randomUUID(),
            id,
            l.speciesSlug,
            l.count,
          );
      }.call(this),
    );
    return { id, lines: req.lines.map((l) => this.views.line({ slug: l.speciesSlug, count: l.count })), givenAt };
  }

  async report(slug: string, user: AuthenticatedUser): Promise<ShareReport> {
    const group = await this.managed(slug, user);
    const share = await this.shareOf(group);
    const season = await this.seasons.latestPlan(group.id);
    const views = this.views;
    const { givenBySlug, picked, walkUps } = await views.read(function* () {
      return {
        givenBySlug: yield* views.givenBySlug(share.id),
        picked: yield* tx.all<{ zip: string }>(
          `SELECT zip FROM share_reservations WHERE share_id = ? AND status = 'picked-up'`,
          share.id,
        ),
        walkUps: yield* tx.all<{ zip_area: string | null }>(
          'SELECT zip_area FROM share_walk_ups WHERE share_id = ?',
          share.id,
        ),
      };
    });
    const given = [...givenBySlug].map(([speciesSlug, count]) => ({ speciesSlug, count }));
    const targets = season && season.id === share.season_id ? season.targets : [];
    const slugs = new Set([...given.map((g) => g.speciesSlug), ...targets.map((t) => t.slug)]);
    const species = new Map<string, Species>();
    for (const s of slugs) {
      const record = this.ctx.get(s);
      if (record) species.set(s, record);
    }
    return seasonReport({
      groupSlug: group.slug,
      groupName: group.name,
      seasonYear: season?.year ?? Number(share.share_date.slice(0, 4)),
      shareDate: share.share_date,
      given,
      reservedHouseholds: picked.length,
      walkUps: walkUps.length,
      zips: [...picked.map((p) => p.zip), ...walkUps.flatMap((w) => (w.zip_area ? [w.zip_area] : []))],
      targets: targets.map((t) => ({ speciesSlug: t.slug, targetPlants: t.targetPlants })),
      species,
      // From the growers' batch logs for the share's season: sown, up and ready by method and grower.
      germination: germinationReport(await this.batches.germinationBatches(share.season_id)),
    });
  }

  async reportCsv(slug: string, user: AuthenticatedUser): Promise<string> {
    return shareReportToCsv(await this.report(slug, user));
  }

  private *linesOfOne(reservationId: string): ShareWork<LineRow[]> {
    return (yield* this.views.linesOf([reservationId])).get(reservationId) ?? [];
  }

  private *insertSlot(shareId: string, s: PickupSlotRequest): ShareWork<void> {
    yield* tx.run(
      `INSERT INTO share_slots (id, share_id, starts_at, ends_at, starts_at_ms, ends_at_ms, capacity, booked)
       VALUES (?, ?, ?, ?, ?, ?, ?, 0)`,
      randomUUID(),
      shareId,
      s.start,
      s.end,
      Date.parse(s.start),
      Date.parse(s.end),
      s.capacity,
    );
  }

  /** The group, when the caller organises it (admins act as organisers). */
  private async managed(slug: string, user: AuthenticatedUser): Promise<Group> {
    const group = await this.groups.getDto(slug);
    if ((await this.groups.roleOf(user, group.id)) !== 'organiser')
      throw new ForbiddenException('Only an organiser of this group can run its plant share and see its takers.');
    return group;
  }
}

/** Whether a place edit changes what a taker needs to know (name, address or directions). */
function samePlace(a: SharePlace, b: SharePlace): boolean {
  return a.name === b.name && a.address === b.address && (a.directions ?? '') === (b.directions ?? '');
}

/** A slot must be on the share's day (by the organiser's own clock) and not have started. */
function slotProblems(s: PickupSlotRequest, shareDate: string, now: Date, prefix: string): FieldProblem[] {
  const field = (f: string) => (prefix ? `${prefix}.${f}` : f);
  const problems: FieldProblem[] = [];
  if (s.start.slice(0, 10) !== shareDate)
    problems.push({ field: field('start'), message: `must be on the share day, ${shareDate}` });
  if (Date.parse(s.start) <= now.getTime()) problems.push({ field: field('start'), message: 'is in the past' });
  return problems;
}
