import { randomUUID } from 'node:crypto';
import { ConflictException, ForbiddenException, GoneException, Injectable, NotFoundException } from '@nestjs/common';
import {
  type ChangeReservationRequest,
  checkHouseholdLimits,
  type ClaimOfferRequest,
  type Group,
  isNativeMilkweed,
  type ParsedReservationRequest,
  type PlantLine,
  type PublicPlantShare,
  rankForYard,
  type ReservationCreated,
  type ShareFitQuery,
  type RegionContext,
  type ShareSpecies,
  type ShareYard,
  type StateCode,
  type TakerReservation,
  type WaitlistJoined,
  type WaitlistOfferView,
  wildlifeSummary,
  wordsFor,
  type WordLocale,
} from '@homeground/shared';
import { badRequest, type FieldProblem } from '../common/validation/bad-request.js';
import { apiWords } from '../common/i18n/api-i18n.js';
import { EcoregionsService } from '../ecoregions/ecoregions.service.js';
import { MixContextService } from '../mix-context/mix-context.service.js';
import { PlacesService } from '../places/places.service.js';
import { SavedMixesService } from '../saved-mixes/saved-mixes.service.js';
import { Clock } from './clock.js';
import { ShareMailQueue } from './share-mail-queue.js';
import { type Released, ShareLedger } from './share-ledger.js';
import { reservationEmail } from './share-emails.js';
import type { LineRow, ReservationRow, ShareRow, SlotRow, StockRow, WaitlistRow } from './share-rows.js';
import { hashToken, newToken, TokenSupply } from './share-tokens.js';
import { type ShareWork, ShareTxRunner, tx } from './share-tx.js';
import { ShareViews } from './share-views.js';

/** General words under the list of plants, in the reader's language: the usual cautions, and local rules first. */
function shareNotes(locale: WordLocale): string[] {
  const say = apiWords(locale);
  return [say('share.notes.cautions'), say('share.notes.dig')];
}

/** The taker's side: the public page, reservations by private link, and the waitlist. */
@Injectable()
export class ReservationsService {
  constructor(
    private readonly runner: ShareTxRunner,
    private readonly ledger: ShareLedger,
    private readonly views: ShareViews,
    private readonly ctx: MixContextService,
    private readonly mail: ShareMailQueue,
    private readonly clock: Clock,
    private readonly places: PlacesService,
    private readonly mixes: SavedMixesService,
    private readonly ecoregions: EcoregionsService,
  ) {}

  /** The group's share as anyone sees it; with a yard, ranked by how well each plant fits it. */
  async publicShare(slug: string, yard: ShareFitQuery, locale: WordLocale = 'en'): Promise<PublicPlantShare> {
    const group = await this.views.group(slug);
    const views = this.views;
    const { share, stock, slots } = await views.read(function* () {
      const share = yield* views.requireShare(group);
      return {
        share,
        stock: (yield* views.stock(share.id)).filter((s) => s.offered > 0),
        slots: yield* views.slots(share.id),
      };
    });
    const nowMs = this.clock.now().getTime();
    const records = stock.flatMap((s) => {
      const r = this.ctx.get(s.slug);
      return r ? [{ stock: s, record: r }] : [];
    });
    const site = await this.yardOf(group, yard);
    const fits = site
      ? rankForYard(
          records.map((r) => r.record),
          { sun: site.yard.sun, moisture: site.yard.moisture },
          site.region,
        )
      : null;
    const species: ShareSpecies[] = records.map(({ stock: s, record }) => {
      const w = wildlifeSummary(record);
      return {
        slug: s.slug,
        commonName: record.commonNames[0],
        scientificName: record.scientificName,
        growthForm: record.growthForm,
        heightCm: { min: record.heightCm.min, max: record.heightCm.max },
        bloomMonths: record.bloomMonths,
        bloomWords: wordsFor(locale).bloomWords(record.bloomMonths),
        flowerColours: record.flowerColours,
        sun: record.sun,
        moisture: record.moisture,
        isMilkweed: isNativeMilkweed(record),
        remaining: s.remaining,
        wildlife: { caterpillars: w.caterpillars, bees: w.bees, monarchs: w.monarchs, birds: w.birds },
        cautions: record.cautions.map((c) => ({
          kind: c.kind,
          title: wordsFor(locale).caution[c.kind].title,
          text: c.text,
        })),
        fit: fits?.get(s.slug) ?? null,
      };
    });
    if (fits) species.sort((a, b) => a.fit!.rank - b.fit!.rank);
    return {
      groupSlug: group.slug,
      groupName: group.name,
      town: group.town,
      state: group.state,
      date: share.share_date,
      place: this.views.place(share),
      status: share.status,
      limits: { perSpecies: share.per_species_limit, total: share.total_limit },
      slots: slots.map((s) => ({
        id: s.id,
        start: s.starts_at,
        end: s.ends_at,
        left: s.capacity - s.booked,
        past: s.starts_at_ms <= nowMs,
      })),
      species,
      yard: site?.yard ?? null,
      notes: shareNotes(locale),
      whatToBring: share.what_to_bring,
    };
  }

  /**
   * The yard to rank for and the region to rank it in: the taker's answers in the group's region; with
   * a ZIP, in the place the ZIP resolves to (the same lookup as "your ground"); or a saved mix's own
   * site and region. An unknown ZIP or mix is a 400 naming it.
   */
  private async yardOf(group: Group, q: ShareFitQuery): Promise<{ yard: ShareYard; region: RegionContext } | null> {
    if (q.mix) {
      const mix = await this.mixes.get(q.mix).catch((e: unknown) => {
        if (e instanceof NotFoundException)
          throw badRequest([{ field: 'mix', message: 'is not a saved mix we keep (it may have been deleted)' }]);
        throw e;
      });
      const { site, region } = mix.request;
      return {
        yard: {
          sun: site.sun,
          moisture: site.moisture,
          from: 'mix',
          place: this.placeWords(null, region.state, region.ecoregionCode),
          mixName: mix.name,
        },
        region: { state: region.state, ...(region.ecoregionCode ? { ecoregionCode: region.ecoregionCode } : {}) },
      };
    }
    if (!q.sun || !q.moisture) return null;
    if (q.zip) {
      const place = this.places.lookup({ zip: q.zip });
      return {
        yard: {
          sun: q.sun,
          moisture: q.moisture,
          from: 'zip',
          place: this.placeWords(place.zip?.city ?? null, place.state, place.ecoregion.code),
          mixName: null,
        },
        region: { state: place.state, ecoregionCode: place.ecoregion.code },
      };
    }
    return {
      yard: {
        sun: q.sun,
        moisture: q.moisture,
        from: 'answers',
        place: this.placeWords(group.town, group.state, group.ecoregionCode ?? undefined),
        mixName: null,
      },
      region: {
        state: group.state as StateCode,
        ...(group.ecoregionCode ? { ecoregionCode: group.ecoregionCode } : {}),
      },
    };
  }

  /** "Viroqua, WI, in the Driftless Area (EPA Level III ecoregion 52)". */
  private placeWords(town: string | null, state: string, ecoregionCode: string | undefined): string {
    const where = town ? `${town}, ${state}` : state;
    const e = ecoregionCode ? this.ecoregions.find(ecoregionCode) : undefined;
    return e ? `${where}, in the ${e.name} (EPA Level III ecoregion ${e.code})` : where;
  }

  /**
   * Takes a reservation: the slot and every line in one transaction of conditional decrements, so
   * concurrent requests can never take more plants or places than there are. Anything short answers
   * 409 and writes nothing.
   */
  async reserve(slug: string, req: ParsedReservationRequest, locale: WordLocale = 'en'): Promise<ReservationCreated> {
    const group = await this.views.group(slug);
    const now = this.clock.now();
    const { share, slot } = await this.runner.read(() => this.checkReservation(group, req, now.getTime()));
    const { token, hash } = newToken();
    const id = randomUUID();
    const stamp = now.toISOString();
    await this.runner.atomically(() =>
      function* (this: ReservationsService) {
        yield* tx.lockShare(share.id);
        assertOpen(yield* this.views.shareById(share.id));
        if (yield* this.hasReservation(share.id, req.email)) throw alreadyReserved(req.email);
        yield* this.bookOrExplain(slot, now.getTime(), 'slotId');
        yield* this.takeOrExplain(share, group, req.lines);
        yield* tx.run(
          `INSERT INTO share_reservations (id, share_id, slot_id, token_hash, status, name, email, zip, created_at, updated_at, locale)
         VALUES (?, ?, ?, ?, 'confirmed', ?, ?, ?, ?, ?, ?)`,
          id,
          share.id,
          slot.id,
          hash,
          req.name,
          req.email,
          req.zip,
          stamp,
          stamp,
          locale,
        );
        yield* this.insertLines(id, req.lines);
      }.call(this),
    );
    const { row, view } = await this.runner.read(() => this.viewOf(group, share, id, now.getTime()));
    const manageUrl = this.manageUrl(token);
    await this.sendConfirmation(group, view, manageUrl, false, row);
    return { ...view, manageUrl };
  }

  /**
   * What a reservation is checked against before its unit of work: the share open, the lines on
   * offer and within the limits, the slot this share's and not started, and (refuseEarly) the answer
   * for what is plainly gone.
   */
  private *checkReservation(
    group: Group,
    req: ParsedReservationRequest,
    nowMs: number,
  ): ShareWork<{ share: ShareRow; slot: SlotRow }> {
    const share = yield* this.views.requireShare(group);
    assertOpen(share);
    const stock = yield* this.checkLines(share, req.lines);
    const slot = yield* this.slotOf(share, req.slotId, nowMs, 'slotId');
    yield* this.refuseEarly(share, group, slot, stock, req);
    return { share, slot };
  }

  /** A reservation row and its taker's view, read after the unit that wrote it. */
  private *viewOf(
    group: Group,
    share: ShareRow,
    id: string,
    nowMs: number,
    locale?: WordLocale,
  ): ShareWork<{ row: ReservationRow; view: TakerReservation }> {
    const row = (yield* tx.get<ReservationRow>('SELECT * FROM share_reservations WHERE id = ?', id))!;
    return { row, view: yield* this.views.takerView(group, share, row, nowMs, locale) };
  }

  /** The reservation a private link opens, its care sheet in `locale` (else the language it was made in). */
  async byToken(token: string, locale?: WordLocale): Promise<TakerReservation> {
    const { group, share, row } = await this.open(token);
    const nowMs = this.clock.now().getTime();
    return this.runner.read(() => this.views.takerView(group, share, row, nowMs, locale));
  }

  /** Changes the slot, the plants or both; all of it or nothing. */
  async change(token: string, req: ChangeReservationRequest, locale: WordLocale = 'en'): Promise<TakerReservation> {
    const { group, share, row } = await this.open(token);
    assertOpen(share);
    const now = this.clock.now();
    const next = await this.runner.read(() =>
      function* (this: ReservationsService) {
        const current = (yield* tx.get<SlotRow>('SELECT * FROM share_slots WHERE id = ?', row.slot_id))!;
        if (row.status !== 'confirmed')
          throw new ConflictException(`This reservation is ${row.status}: it can no longer change.`);
        if (current.starts_at_ms <= now.getTime())
          throw new ConflictException('Your pickup slot has started: ask the volunteers at the share.');
        if (req.lines) yield* this.checkLines(share, req.lines);
        return req.slotId && req.slotId !== row.slot_id
          ? yield* this.slotOf(share, req.slotId, now.getTime(), 'slotId')
          : null;
      }.call(this),
    );
    const tokens = new TokenSupply();
    const released = await this.runner.atomically(() =>
      function* (this: ReservationsService) {
        tokens.rewind();
        yield* tx.lockShare(share.id);
        const again = (yield* tx.get<ReservationRow>('SELECT status FROM share_reservations WHERE id = ?', row.id))!;
        if (again.status !== 'confirmed')
          throw new ConflictException(`This reservation is ${again.status}: it can no longer change.`);
        if (next) {
          yield* this.bookOrExplain(next, now.getTime(), 'slotId');
          yield* this.ledger.freeSlot(row.slot_id);
        }
        const out: Released[] = [];
        if (req.lines) {
          const old = new Map((yield* this.linesOf(row.id)).map((l) => [l.slug, l.count]));
          const want = new Map(req.lines.map((l) => [l.speciesSlug, l.count]));
          // Take the extra plants first: if any is short, nothing has been given back yet.
          const more = req.lines
            .map((l, i) => ({ ...l, index: i, count: l.count - (old.get(l.speciesSlug) ?? 0) }))
            .filter((l) => l.count > 0);
          yield* this.takeOrExplain(share, group, more, (_l, i) => `lines.${more[i].index}.count`);
          for (const [slug, had] of old) {
            const fewer = had - (want.get(slug) ?? 0);
            if (fewer > 0) out.push(yield* this.ledger.release(share.id, slug, fewer, now.getTime(), tokens));
          }
          yield* tx.run('DELETE FROM share_reservation_lines WHERE reservation_id = ?', row.id);
          yield* this.insertLines(row.id, req.lines);
        }
        // The change e-mail goes out in the language the taker changed it in, and later ones too.
        yield* tx.run(
          'UPDATE share_reservations SET slot_id = ?, updated_at = ?, locale = ? WHERE id = ?',
          next?.id ?? row.slot_id,
          now.toISOString(),
          locale,
          row.id,
        );
        return out;
      }.call(this),
    );
    await this.views.sendOffers(
      group,
      share,
      released.flatMap((r) => r.offers),
    );
    const { row: fresh, view } = await this.runner.read(() => this.viewOf(group, share, row.id, now.getTime()));
    await this.sendConfirmation(group, view, this.manageUrl(token), true, fresh);
    return view;
  }

  /** Cancels: the place in the slot comes free and the plants go to the waitlist, else back on offer. */
  async cancel(token: string): Promise<TakerReservation> {
    const { group, share, row } = await this.open(token);
    const now = this.clock.now();
    const tokens = new TokenSupply();
    const released = await this.runner.atomically(() =>
      function* (this: ReservationsService) {
        tokens.rewind();
        yield* tx.lockShare(share.id);
        const changed = yield* tx.run(
          `UPDATE share_reservations SET status = 'cancelled', updated_at = ? WHERE id = ? AND status = 'confirmed'`,
          now.toISOString(),
          row.id,
        );
        if (changed !== 1)
          throw new ConflictException(`This reservation is ${row.status}: there is nothing to cancel.`);
        yield* this.ledger.freeSlot(row.slot_id);
        const out: Released[] = [];
        for (const l of yield* this.linesOf(row.id))
          out.push(yield* this.ledger.release(share.id, l.slug, l.count, now.getTime(), tokens));
        return out;
      }.call(this),
    );
    await this.views.sendOffers(
      group,
      share,
      released.flatMap((r) => r.offers),
    );
    return (await this.runner.read(() => this.viewOf(group, share, row.id, now.getTime()))).view;
  }

  /** Joins the waitlist of species that ran out; each line keeps its place in the order joined. */
  async joinWaitlist(
    slug: string,
    req: { name: string; email: string; zip: string; lines: PlantLine[] },
    locale: WordLocale = 'en',
  ): Promise<WaitlistJoined> {
    const group = await this.views.group(slug);
    const share = await this.runner.read(() =>
      function* (this: ReservationsService) {
        const share = yield* this.views.requireShare(group);
        if (share.status === 'closed') throw new ConflictException('This plant share is closed.');
        yield* this.checkLines(share, req.lines);
        return share;
      }.call(this),
    );
    const stamp = this.clock.now().toISOString();
    const ids = req.lines.map(() => randomUUID());
    const entries = await this.runner.atomically(() =>
      function* (this: ReservationsService) {
        yield* tx.lockShare(share.id);
        const out: WaitlistJoined['entries'] = [];
        for (const [i, l] of req.lines.entries()) {
          const seq = (yield* tx.get<{ s: number | null }>(
            'SELECT MAX(seq) AS s FROM share_waitlist WHERE share_id = ?',
            share.id,
          ))!;
          yield* tx.run(
            `INSERT INTO share_waitlist (id, share_id, slug, count, held, status, token_hash, name, email, zip, seq, created_at, locale)
           VALUES (?, ?, ?, ?, 0, 'waiting', NULL, ?, ?, ?, ?, ?, ?)`,
            ids[i],
            share.id,
            l.speciesSlug,
            l.count,
            req.name,
            req.email,
            req.zip,
            (seq.s ?? 0) + 1,
            stamp,
            locale,
          );
          const ahead = (yield* tx.get<{ n: number }>(
            `SELECT COUNT(*) AS n FROM share_waitlist WHERE share_id = ? AND slug = ? AND status = 'waiting'`,
            share.id,
            l.speciesSlug,
          ))!;
          out.push({
            speciesSlug: l.speciesSlug,
            commonName: this.views.names(l.speciesSlug).commonName,
            count: l.count,
            position: Number(ahead.n),
          });
        }
        return out;
      }.call(this),
    );
    return { entries };
  }

  /** What a waitlist offer's link shows: the plants held for the household and the slots left. */
  async offer(token: string): Promise<WaitlistOfferView> {
    const { entry, share, joins, slots } = await this.runner.read(() =>
      function* (this: ReservationsService) {
        const entry = yield* this.offerEntry(token);
        const share = yield* this.views.shareById(entry.share_id);
        const joins = Boolean(entry.email && (yield* this.hasReservation(share.id, entry.email)));
        return { entry, share, joins, slots: yield* this.views.slots(share.id) };
      }.call(this),
    );
    const group = await this.views.groupById(share.group_id);
    const nowMs = this.clock.now().getTime();
    return {
      speciesSlug: entry.slug,
      ...this.views.names(entry.slug),
      count: entry.held,
      status:
        entry.status === 'offered' && (entry.offered_until ?? 0) <= nowMs
          ? 'expired'
          : entry.status === 'waiting'
            ? 'offered'
            : entry.status,
      heldUntil: entry.offered_until === null ? null : new Date(entry.offered_until).toISOString(),
      joinsReservation: joins,
      share: {
        groupSlug: group.slug,
        groupName: group.name,
        date: share.share_date,
        place: this.views.place(share),
        status: share.status,
      },
      slots: slots.map((s) => ({
        id: s.id,
        start: s.starts_at,
        end: s.ends_at,
        left: s.capacity - s.booked,
        past: s.starts_at_ms <= nowMs,
      })),
    };
  }

  /** The waitlist entry a private offer link opens; an unknown link is refused as forged. */
  private *offerEntry(token: string): ShareWork<WaitlistRow> {
    const entry = yield* tx.get<WaitlistRow>('SELECT * FROM share_waitlist WHERE token_hash = ?', hashToken(token));
    if (!entry) throw new ForbiddenException('This link is not one we sent.');
    if (!entry.email || !entry.name) throw new GoneException('This offer was kept no longer than the share allows.');
    return entry;
  }

  /**
   * Takes the plants a waitlist offer holds: added to the household's reservation if it has one, else
   * a new reservation in the slot chosen (booked the same conditional way).
   */
  async claimOffer(token: string, req: ClaimOfferRequest, locale: WordLocale = 'en'): Promise<ReservationCreated> {
    const before = this.clock.now().getTime();
    const { entry, share } = await this.runner.read(() =>
      function* (this: ReservationsService) {
        const entry = yield* this.offerEntry(token);
        if (entry.status === 'claimed') throw new GoneException('These plants have been claimed already.');
        if (entry.status !== 'offered' || (entry.offered_until ?? 0) <= before)
          throw new GoneException('This offer has passed: the plants went to the next household on the list.');
        return { entry, share: yield* this.views.shareById(entry.share_id) };
      }.call(this),
    );
    const group = await this.views.groupById(share.group_id);
    assertOpen(share);
    const now = this.clock.now();
    const fresh = newToken();
    const newId = randomUUID();
    // The household's reservation is looked up inside the unit, behind the share's lock: one it made
    // a moment ago on another instance is joined, not doubled.
    const { reservationId, joined } = await this.runner.atomically(() =>
      function* (this: ReservationsService) {
        yield* tx.lockShare(share.id);
        const existing = yield* tx.get<ReservationRow>(
          `SELECT * FROM share_reservations WHERE share_id = ? AND email = ? AND status = 'confirmed'`,
          share.id,
          entry.email,
        );
        const slot = existing ? null : yield* this.slotOf(share, req.slotId, now.getTime(), 'slotId');
        if (
          (yield* tx.run(
            `UPDATE share_waitlist SET status = 'claimed' WHERE id = ? AND status = 'offered'`,
            entry.id,
          )) !== 1
        )
          throw new GoneException('These plants have been claimed already.');
        if (existing) {
          const had = yield* tx.get<{ count: number }>(
            'SELECT count FROM share_reservation_lines WHERE reservation_id = ? AND slug = ?',
            existing.id,
            entry.slug,
          );
          if (had)
            yield* tx.run(
              'UPDATE share_reservation_lines SET count = count + ? WHERE reservation_id = ? AND slug = ?',
              entry.held,
              existing.id,
              entry.slug,
            );
          else yield* this.insertLines(existing.id, [{ speciesSlug: entry.slug, count: entry.held }]);
          // A new link for the household: the old one still works, this one is the one the e-mail carries.
          yield* tx.run(
            'UPDATE share_reservations SET token_hash = ?, updated_at = ? WHERE id = ?',
            fresh.hash,
            now.toISOString(),
            existing.id,
          );
          return { reservationId: existing.id, joined: true };
        }
        yield* this.bookOrExplain(slot!, now.getTime(), 'slotId');
        const id = newId;
        yield* tx.run(
          `INSERT INTO share_reservations (id, share_id, slot_id, token_hash, status, name, email, zip, created_at, updated_at, locale)
         VALUES (?, ?, ?, ?, 'confirmed', ?, ?, ?, ?, ?, ?)`,
          id,
          share.id,
          slot!.id,
          fresh.hash,
          entry.name,
          entry.email,
          entry.zip,
          now.toISOString(),
          now.toISOString(),
          locale,
        );
        yield* this.insertLines(id, [{ speciesSlug: entry.slug, count: entry.held }]);
        return { reservationId: id, joined: false };
      }.call(this),
    );
    const { row, view } = await this.runner.read(() => this.viewOf(group, share, reservationId, now.getTime()));
    const manageUrl = this.manageUrl(fresh.token);
    await this.sendConfirmation(group, view, manageUrl, joined, row);
    return { ...view, manageUrl };
  }

  private manageUrl(token: string): string {
    return `${this.views.publicUrl()}/plant-share/reservations/${token}`;
  }

  private async sendConfirmation(
    group: Group,
    view: TakerReservation,
    link: string,
    changed: boolean,
    row: Pick<ReservationRow, 'locale'>,
  ): Promise<void> {
    // Rendered when the queue sends it, so a burst of reservations does not wait on the e-mail's words.
    this.mail.send(() => ({
      to: view.email,
      ...reservationEmail({
        locale: row.locale,
        name: view.name,
        groupName: group.name,
        place: view.share.place,
        whatToBring: view.share.whatToBring,
        slot: view.slot,
        lines: view.lines,
        careSheet: this.views.careSheet(
          view.lines.map((l) => l.speciesSlug),
          row.locale,
        ),
        link,
        changed,
      }),
      kind: 'plant-share-reservation',
      groupId: group.id,
    }));
  }

  /** The reservation a private link opens; an unknown link is refused as forged. */
  private async open(token: string): Promise<{ group: Group; share: ShareRow; row: ReservationRow }> {
    const views = this.views;
    const { row, share } = await this.runner.read(function* () {
      const row = yield* tx.get<ReservationRow>(
        'SELECT * FROM share_reservations WHERE token_hash = ?',
        hashToken(token),
      );
      if (!row) throw new ForbiddenException('This link is not one we sent: use the link in your confirmation e-mail.');
      return { row, share: yield* views.shareById(row.share_id) };
    });
    if (row.name === null) throw new GoneException('This reservation was kept no longer than the share allows.');
    const group = await this.views.groupById(share.group_id);
    return { group, share, row };
  }

  /**
   * Each species must be on offer here, and the lines within the household limits (400 naming the line).
   * Answers the share's stock rows as read, by species.
   */
  private *checkLines(share: ShareRow, lines: readonly PlantLine[]): ShareWork<Map<string, StockRow>> {
    const stock = new Map((yield* this.views.stock(share.id)).filter((s) => s.offered > 0).map((s) => [s.slug, s]));
    const problems: FieldProblem[] = lines.flatMap((l, i) =>
      stock.has(l.speciesSlug) ? [] : [{ field: `lines.${i}.speciesSlug`, message: 'is not offered at this share' }],
    );
    problems.push(...checkHouseholdLimits(lines, { perSpecies: share.per_species_limit, total: share.total_limit }));
    if (problems.length) throw badRequest(problems);
    return stock;
  }

  private *hasReservation(shareId: string, email: string): ShareWork<boolean> {
    return Boolean(
      yield* tx.get(
        `SELECT id FROM share_reservations WHERE share_id = ? AND email = ? AND status = 'confirmed'`,
        shareId,
        email,
      ),
    );
  }

  /**
   * Once the plants have run out, most of a burst asks for what is gone: those get their answer from
   * what was just read, before a link is made or a transaction begins, in the same order and words
   * the transaction would give. Passing here proves nothing: the transaction checks all of it again.
   */
  private *refuseEarly(
    share: ShareRow,
    group: Group,
    slot: SlotRow,
    stock: ReadonlyMap<string, StockRow>,
    req: ParsedReservationRequest,
  ): ShareWork<void> {
    if (yield* this.hasReservation(share.id, req.email)) throw alreadyReserved(req.email);
    if (slot.booked >= slot.capacity) throw slotFull('slotId');
    const short = req.lines.flatMap((l, i) => {
      const left = stock.get(l.speciesSlug)?.remaining ?? 0;
      return left >= l.count ? [] : [{ field: `lines.${i}.count`, slug: l.speciesSlug, left }];
    });
    if (short.length) throw this.allTaken(group, short);
  }

  private *slotOf(share: ShareRow, slotId: string, nowMs: number, field: string): ShareWork<SlotRow> {
    const slot = yield* tx.get<SlotRow>('SELECT * FROM share_slots WHERE id = ? AND share_id = ?', slotId, share.id);
    if (!slot) throw badRequest([{ field, message: 'is not a pickup slot of this share' }]);
    if (slot.starts_at_ms <= nowMs) throw badRequest([{ field, message: 'is in the past: choose a later slot' }]);
    return slot;
  }

  private *bookOrExplain(slot: SlotRow, nowMs: number, field: string): ShareWork<void> {
    if (yield* this.ledger.bookSlot(slot.id, nowMs)) return;
    const now = (yield* tx.get<SlotRow>('SELECT * FROM share_slots WHERE id = ?', slot.id))!;
    if (now.starts_at_ms <= nowMs) throw badRequest([{ field, message: 'is in the past: choose a later slot' }]);
    throw slotFull(field);
  }

  /** Takes every line or none; when any ran out, 409 names each short line and offers the waitlist. */
  private *takeOrExplain(
    share: ShareRow,
    group: Group,
    lines: readonly (PlantLine & { index?: number })[],
    fieldOf: (l: PlantLine, i: number) => string = (_l, i) => `lines.${i}.count`,
  ): ShareWork<void> {
    const short: { field: string; slug: string; left: number }[] = [];
    for (const [i, l] of lines.entries()) {
      if (yield* this.ledger.takeStock(share.id, l.speciesSlug, l.count)) continue;
      const row = yield* tx.get<StockRow>(
        'SELECT * FROM share_stock WHERE share_id = ? AND slug = ?',
        share.id,
        l.speciesSlug,
      );
      short.push({ field: fieldOf(l, i), slug: l.speciesSlug, left: row?.remaining ?? 0 });
    }
    if (short.length === 0) return;
    throw this.allTaken(group, short);
  }

  /** 409 naming each short line, with the waitlist offered. */
  private allTaken(group: Group, short: readonly { field: string; slug: string; left: number }[]): ConflictException {
    const names = short.map((s) => this.views.names(s.slug).commonName);
    return new ConflictException({
      message: `All taken: ${names.join(', ')} ${short.length === 1 ? 'has' : 'have'} no plants left for this request. Join the waitlist and we will e-mail you if plants come free.`,
      fields: short.map((s) => ({ field: s.field, message: s.left === 0 ? 'all taken' : `only ${s.left} left` })),
      waitlist: { speciesSlugs: short.map((s) => s.slug), path: `/api/plant-shares/${group.slug}/waitlist` },
    });
  }

  private *linesOf(reservationId: string): ShareWork<LineRow[]> {
    return (yield* this.views.linesOf([reservationId])).get(reservationId) ?? [];
  }

  /** Adds lines after any the reservation has, in the order given (the order its views list them in). */
  private *insertLines(reservationId: string, lines: readonly PlantLine[]): ShareWork<void> {
    const last = yield* tx.get<{ p: number | null }>(
      'SELECT MAX(position) AS p FROM share_reservation_lines WHERE reservation_id = ?',
      reservationId,
    );
    let position = Number(last?.p ?? -1);
    for (const l of lines)
      yield* tx.run(
        'INSERT INTO share_reservation_lines (id, reservation_id, slug, count, position) VALUES (?, ?, ?, ?, ?)',
        randomUUID(),
        reservationId,
        l.speciesSlug,
        l.count,
        ++position,
      );
  }
}

function alreadyReserved(email: string): ConflictException {
  return new ConflictException({
    message: `${email} has a reservation at this share already: change it with the link in its e-mail.`,
    fields: [{ field: 'email', message: 'has a reservation at this share already' }],
  });
}

function slotFull(field: string): ConflictException {
  return new ConflictException({
    message: 'That pickup slot is full: choose another.',
    fields: [{ field, message: 'is full' }],
  });
}

/** Reservations are taken only while the share is open. */
function assertOpen(share: ShareRow): void {
  if (share.status === 'paused') throw new ConflictException('Reservations are paused for now: try again later.');
  if (share.status === 'closed') throw new ConflictException('This plant share is closed.');
}
