import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import {
  batchesToIcs,
  firstName,
  type GerminationBatch,
  logEntryProblems,
  logTotals,
  logTotalsAfter,
  type LogEntryAnswer,
  type LogKind,
  type LogTotals,
  proposeBatchSplit,
  sowMoreNudge,
  supplyList,
  unitsFor,
  UNIT_OF,
  type Batch,
  type BatchSplitProposalAnswer,
  type BatchSplitRequest,
  type GrowerSetupRequest,
  type LogEntryRequest,
  type ReadyCount,
  type SeasonBatches,
  type SeasonGrower,
  type SeasonProgress,
  type SplitProposalRequest,
  type SowingMethod,
  type WordLocale,
  wordsFor,
} from '@homeground/shared';
import { DataSource, In, Repository, type EntityManager } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { runSql } from '../common/database/dialect.js';
import { apiWords } from '../common/i18n/api-i18n.js';
import { badRequest, badRequestIn, type FieldProblem, pleaseCheck } from '../common/validation/bad-request.js';
import { GroupsService } from '../groups/groups.service.js';
import { MixContextService } from '../mix-context/mix-context.service.js';
import { SeasonsService, type SeasonContext } from '../seasons/seasons.service.js';
import { BatchLogEntryRow } from './batch-log-entry.entity.js';
import { toBatch, toLogEntry } from './batch-view.js';
import { BatchRow } from './batch.entity.js';
import { SeasonGrowerRow } from './season-grower.entity.js';
import { seasonProgress } from './season-progress.js';

type People = Map<string, { displayName: string; role: SeasonGrower['role'] }>;

/**
 * Growers' methods and capacity, the season's batches and their logs. Organisers (and admins) see
 * and split everything; a grower sees and logs only their own batches; members see none. Each write
 * is one transaction, after every check; bad input writes nothing.
 */
@Injectable()
export class BatchesService {
  constructor(
    @InjectRepository(SeasonGrowerRow) private readonly growerRows: Repository<SeasonGrowerRow>,
    @InjectRepository(BatchRow) private readonly batchRows: Repository<BatchRow>,
    @InjectRepository(BatchLogEntryRow) private readonly logRows: Repository<BatchLogEntryRow>,
    @InjectDataSource() private readonly db: DataSource,
    private readonly seasons: SeasonsService,
    private readonly groups: GroupsService,
    private readonly ctx: MixContextService,
  ) {}

  /** Organisers: every grower of the season; a grower: themself. */
  async growers(slug: string, user: AuthenticatedUser, locale: WordLocale = 'en'): Promise<SeasonGrower[]> {
    const c = await this.growerOrOrganiser(slug, user, locale);
    const all = await this.growerList(slug, user, c);
    return c.role === 'organiser' ? all : all.filter((g) => g.userId === user.id);
  }

  /** States a grower's methods and capacity: the grower for themself, or an organiser for anyone growing. */
  async setGrower(
    slug: string,
    user: AuthenticatedUser,
    userId: string,
    req: GrowerSetupRequest,
    locale: WordLocale = 'en',
  ): Promise<SeasonGrower> {
    const say = apiWords(locale);
    const c = await this.growerOrOrganiser(slug, user, locale);
    if (c.role !== 'organiser' && userId !== user.id) throw new ForbiddenException(say('refusals.batches.ownMethods'));
    const people = await this.people(slug, user);
    const person = people.get(userId);
    if (!person || person.role === 'member') throw new NotFoundException(say('refusals.batches.notAGrower'));
    // Capacity may not drop below what the batches already take.
    const used = await this.unitsUsed(c.season.id);
    const problems: FieldProblem[] = [];
    req.methods.forEach((m, i) => {
      const taken = used.get(`${userId}|${m.method}`) ?? 0;
      if (m.capacity < taken) {
        const unit = say(`refusals.batches.units.${UNIT_OF[m.method]}`);
        problems.push({
          field: `methods.${i}.capacity`,
          message: say('refusals.batches.capacityBelowUsed', { taken, unit }),
        });
      }
    });
    for (const [key, taken] of used) {
      const [id, method] = key.split('|');
      if (id === userId && taken > 0 && !req.methods.some((m) => m.method === method))
        problems.push({
          field: 'methods',
          // The method as growers read it ("outdoor pots over winter"), never its code.
          message: say('refusals.batches.keepMethod', {
            method: wordsFor(locale).sowingMethod[method as SowingMethod].phrase,
          }),
        });
    }
    if (problems.length) throw badRequest(problems, pleaseCheck(problems, locale));
    await this.db.transaction(async (tx) => {
      const existing = await tx.findOne(SeasonGrowerRow, { where: { seasonId: c.season.id, userId } });
      await tx.save(
        SeasonGrowerRow,
        existing
          ? { ...existing, methods: req.methods }
          : tx.create(SeasonGrowerRow, { seasonId: c.season.id, userId, methods: req.methods }),
      );
    });
    return (await this.growerList(slug, user, c)).find((g) => g.userId === userId)!;
  }

  /** Proposes a split of the targets over the growers' stated capacity; writes nothing. */
  async propose(
    slug: string,
    user: AuthenticatedUser,
    req: SplitProposalRequest,
    locale: WordLocale = 'en',
  ): Promise<BatchSplitProposalAnswer> {
    const c = await this.organiser(slug, user, locale);
    const growers = (await this.growerList(slug, user, c)).filter(
      (g) => g.methods.length > 0 && (!req.growerIds || req.growerIds.includes(g.userId)),
    );
    const targets = c.targets.flatMap((t) => {
      const species = this.ctx.get(t.slug);
      return species ? [{ species, targetPlants: t.targetPlants }] : [];
    });
    const split = proposeBatchSplit(
      targets,
      growers.map((g) => ({ growerId: g.userId, methods: g.methods })),
    );
    const nameOf = (id: string) => growers.find((g) => g.userId === id)?.displayName ?? '';
    const commonName = (s: string) => this.ctx.get(s)?.commonNames[0] ?? s;
    return {
      batches: split.batches.map((b) => ({ ...b, growerName: nameOf(b.growerId), commonName: commonName(b.slug) })),
      unassigned: split.unassigned.map((u) => ({ ...u, commonName: commonName(u.slug) })),
    };
  }

  /** Replaces the season's split. Batches with log entries must stay (listed by id). */
  async setSplit(
    slug: string,
    user: AuthenticatedUser,
    req: BatchSplitRequest,
    today: string,
    locale: WordLocale = 'en',
  ): Promise<SeasonBatches> {
    const say = apiWords(locale);
    const c = await this.organiser(slug, user, locale);
    const existing = await this.batchRows.find({ where: { seasonId: c.season.id } });
    const growers = new Map((await this.growerList(slug, user, c)).map((g) => [g.userId, g]));
    const targets = new Set(c.targets.map((t) => t.slug));
    const problems: FieldProblem[] = [];
    const used = new Map<string, number>();
    req.batches.forEach((b, i) => {
      const at = `batches.${i}`;
      if (b.id && !existing.some((e) => e.id === b.id))
        problems.push({ field: `${at}.id`, message: say('refusals.batches.notThisSeason') });
      if (!targets.has(b.slug))
        problems.push({ field: `${at}.slug`, message: say('refusals.batches.notOnTargets', { slug: b.slug }) });
      const grower = growers.get(b.growerId);
      const stated = grower?.methods.find((m) => m.method === b.method);
      if (!grower) problems.push({ field: `${at}.growerId`, message: say('refusals.batches.notAGrowerField') });
      else if (!stated)
        problems.push({
          field: `${at}.method`,
          message: say('refusals.batches.methodNotUsed', { name: grower.displayName }),
        });
      else {
        const key = `${b.growerId}|${b.method}`;
        const total = (used.get(key) ?? 0) + unitsFor(b.method, b.plants);
        used.set(key, total);
        if (total > stated.capacity) {
          const unit = say(`refusals.batches.units.${UNIT_OF[b.method]}`);
          problems.push({
            field: `${at}.plants`,
            message: say('refusals.batches.overCapacity', {
              name: grower.displayName,
              total,
              unit,
              capacity: stated.capacity,
            }),
          });
        }
      }
    });
    const kept = new Set(req.batches.flatMap((b) => (b.id ? [b.id] : [])));
    const dropped = existing.filter((e) => !kept.has(e.id)).map((e) => e.id);
    if (dropped.length) {
      const logged = await this.logRows.count({ where: { batchId: In(dropped) } });
      if (logged > 0)
        problems.push({
          field: 'batches',
          message: say('refusals.batches.keepLogged'),
        });
    }
    if (problems.length) throw badRequest(problems, pleaseCheck(problems, locale));
    await this.db.transaction(async (tx) => {
      if (dropped.length) await tx.delete(BatchRow, { id: In(dropped) });
      for (const [position, b] of req.batches.entries()) {
        const fields = {
          growerId: b.growerId,
          slug: b.slug,
          method: b.method,
          plants: b.plants,
          sowDate: b.sowDate ?? null,
          position,
        };
        if (b.id) await tx.update(BatchRow, { id: b.id }, fields);
        else await tx.save(BatchRow, tx.create(BatchRow, { seasonId: c.season.id, ...fields }));
      }
    });
    return this.list(slug, user, today);
  }

  /** The season's batches with supplies: all for organisers, their own for a grower. */
  async list(slug: string, user: AuthenticatedUser, today: string, locale: WordLocale = 'en'): Promise<SeasonBatches> {
    const c = await this.growerOrOrganiser(slug, user, locale);
    const growerId = c.role === 'organiser' ? undefined : user.id;
    const batches = await this.batchesOf(slug, user, c, today, growerId, undefined, locale);
    const byGrower = new Map<string, Batch[]>();
    for (const b of batches) byGrower.set(b.growerId, [...(byGrower.get(b.growerId) ?? []), b]);
    const supplies = (list: Batch[]) =>
      supplyList(
        list.map((b) => ({
          method: b.method,
          plants: b.plants,
          units: b.units,
          fridge: b.treatments.some((t) => t.where === 'refrigerator'),
        })),
        locale,
      );
    return {
      groupSlug: c.group.slug,
      year: c.season.year,
      plantShareDate: c.season.plantShareDate,
      batches,
      supplies: {
        byGrower: [...byGrower].map(([growerId, list]) => ({
          growerId,
          growerName: list[0].growerName,
          list: supplies(list),
        })),
        group: c.role === 'organiser' ? supplies(batches) : null,
      },
    };
  }

  /** The caller's own batches as iCalendar (a grower's, or an organiser's who also grows). */
  /** The caller's batches as iCalendar, steps and warnings in the reader's language. */
  async myBatchesIcs(slug: string, user: AuthenticatedUser, today: string, locale: WordLocale = 'en'): Promise<string> {
    const c = await this.growerOrOrganiser(slug, user, locale);
    const mine = await this.batchesOf(slug, user, c, today, user.id, undefined, locale);
    return batchesToIcs(mine, { today, planId: `batches-${c.season.year}`, locale });
  }

  async get(
    slug: string,
    user: AuthenticatedUser,
    id: string,
    today: string,
    locale: WordLocale = 'en',
  ): Promise<Batch> {
    const say = apiWords(locale);
    const c = await this.growerOrOrganiser(slug, user, locale);
    const row = await this.batchRows.findOne({ where: { id, seasonId: c.season.id } });
    if (!row) throw new NotFoundException(say('refusals.batches.noBatch'));
    if (c.role !== 'organiser' && row.growerId !== user.id)
      throw new ForbiddenException(say('refusals.batches.anotherGrower'));
    return (await this.batchesOf(slug, user, c, today, undefined, [row], locale))[0];
  }

  /**
   * Adds a log entry to the grower's own batch; an entry sent again with the same clientId is kept
   * once. A write reads only what the new entry needs, never the log itself: the clientId through its
   * unique index and the totals as one SUM per kind, so its cost does not grow with the log's length
   * in JavaScript, and the answer is the entry and the totals, not the whole batch.
   */
  async log(
    slug: string,
    user: AuthenticatedUser,
    id: string,
    req: LogEntryRequest,
    today: string,
    locale: WordLocale = 'en',
  ): Promise<LogEntryAnswer> {
    const say = apiWords(locale);
    const c = await this.growerOrOrganiser(slug, user, locale);
    const row = await this.batchRows.findOne({ where: { id, seasonId: c.season.id } });
    if (!row) throw new NotFoundException(say('refusals.batches.noBatch'));
    if (row.growerId !== user.id) throw new ForbiddenException(say('refusals.batches.ownLog'));
    return this.db.transaction(async (tx) => {
      const sent = req.clientId
        ? await tx.findOne(BatchLogEntryRow, { where: { batchId: id, clientId: req.clientId } })
        : null;
      if (sent) return { batchId: id, entry: toLogEntry(sent), totals: await this.totalsOf(tx, id) };
      const before = await this.totalsOf(tx, id);
      const problems = logEntryProblems(before, req, today);
      if (problems.length) throw badRequestIn(locale, problems);
      const saved = await tx.save(
        BatchLogEntryRow,
        tx.create(BatchLogEntryRow, {
          batchId: id,
          kind: req.kind,
          count: req.count,
          date: req.date,
          reason: req.reason ?? null,
          note: req.note ?? null,
          clientId: req.clientId ?? null,
          createdBy: user.id,
        }),
      );
      return { batchId: id, entry: toLogEntry(saved), totals: logTotalsAfter(before, req) };
    });
  }

  /** A batch's totals from one aggregate per kind (the entries themselves are not loaded). */
  private async totalsOf(tx: EntityManager, batchId: string): Promise<LogTotals> {
    const sums = await tx
      .createQueryBuilder(BatchLogEntryRow, 'e')
      .select('e.kind', 'kind')
      .addSelect('SUM(e.count)', 'count')
      .where('e.batchId = :batchId', { batchId })
      .groupBy('e.kind')
      .getRawMany<{ kind: LogKind; count: number | string }>();
    return logTotals(sums.map((s) => ({ kind: s.kind, count: Number(s.count) })));
  }

  /** The organiser's progress and ready forecast per species and grower. */
  async progress(
    slug: string,
    user: AuthenticatedUser,
    today: string,
    locale: WordLocale = 'en',
  ): Promise<SeasonProgress> {
    const c = await this.organiser(slug, user, locale);
    const batches = await this.batchesOf(slug, user, c, today);
    return seasonProgress(
      c,
      batches,
      (s) => ({
        commonName: this.ctx.get(s)?.commonNames[0] ?? s,
        scientificName: this.ctx.get(s)?.scientificName ?? '',
      }),
      today,
      (slug, row) => {
        const species = this.ctx.get(slug);
        const first = batches.find((b) => b.slug === slug);
        if (!species || !first) return null;
        return sowMoreNudge({
          species,
          method: first.method,
          ...row,
          germinationRatePct: first.germinationRatePct,
          lossFactor: c.season.lossFactor,
          lastFrost: c.season.lastFrost,
          plantShareDate: c.season.plantShareDate,
          today,
          locale,
        });
      },
    );
  }

  /**
   * Plants logged ready per species for a season: the plant share's starting stock. Counts are the
   * sum of every batch's "ready" entries (plants fit to give); species with none logged answer 0,
   * targets first in the organiser's order, then any other species with batches. No access check:
   * callers are other services that have checked the caller's role. An unknown season answers [].
   */
  async readyCountsBySpecies(seasonId: string): Promise<ReadyCount[]> {
    const c = await this.seasons.contextById(seasonId);
    if (!c) return [];
    const rows = await this.batchRows.find({ where: { seasonId }, order: { position: 'ASC' } });
    const log = rows.length
      ? await this.logRows.find({ where: { batchId: In(rows.map((r) => r.id)), kind: 'ready' } })
      : [];
    const ready = new Map<string, number>();
    for (const r of rows) {
      const n = log.filter((e) => e.batchId === r.id).reduce((a, e) => a + e.count, 0);
      ready.set(r.slug, (ready.get(r.slug) ?? 0) + n);
    }
    const slugs = [...new Set([...c.targets.map((t) => t.slug), ...rows.map((r) => r.slug)])];
    return slugs.map((s) => {
      const species = this.ctx.get(s);
      return {
        slug: s,
        commonName: species?.commonNames[0] ?? s,
        scientificName: species?.scientificName ?? '',
        readyPlants: ready.get(s) ?? 0,
      };
    });
  }

  /**
   * The season's batches with each grower's first name and the batch's log, for the season report's
   * germination by method and grower (the report keeps counts and first names only).
   */
  async germinationBatches(seasonId: string): Promise<GerminationBatch[]> {
    const rows = await this.batchRows.find({ where: { seasonId }, order: { position: 'ASC' } });
    if (rows.length === 0) return [];
    const log = await this.logRows.find({ where: { batchId: In(rows.map((r) => r.id)) } });
    const growerIds = [...new Set(rows.map((r) => r.growerId))];
    const people = await runSql<{ id: string; display_name: string }>(
      this.db,
      `SELECT id, display_name FROM users WHERE id IN (${growerIds.map(() => '?').join(', ')})`,
      growerIds,
    );
    const nameOf = new Map(people.map((p) => [p.id, firstName(p.display_name)]));
    return rows.map((r) => ({
      method: r.method,
      grower: nameOf.get(r.growerId) ?? 'A former grower',
      entries: log.filter((e) => e.batchId === r.id).map((e) => ({ kind: e.kind, count: e.count })),
    }));
  }

  /** The season and the caller's role, for organisers only. */
  async organiser(slug: string, user: AuthenticatedUser, locale: WordLocale = 'en'): Promise<SeasonContext> {
    const c = await this.seasons.context(slug, user, locale);
    if (c.role !== 'organiser') throw new ForbiddenException(apiWords(locale)('refusals.batches.organiserOnly'));
    return c;
  }

  private async growerOrOrganiser(slug: string, user: AuthenticatedUser, locale: WordLocale): Promise<SeasonContext> {
    const c = await this.seasons.context(slug, user, locale);
    if (c.role === 'member') throw new ForbiddenException(apiWords(locale)('refusals.batches.growersOnly'));
    return c;
  }

  /** Batches as answers; `growerId` narrows to one grower's, `only` to the rows given. */
  async batchesOf(
    slug: string,
    user: AuthenticatedUser,
    c: SeasonContext,
    today: string,
    growerId?: string,
    only?: BatchRow[],
    locale: WordLocale = 'en',
  ): Promise<Batch[]> {
    const rows =
      only ??
      (await this.batchRows.find({
        where: { seasonId: c.season.id, ...(growerId && { growerId }) },
        order: { position: 'ASC' },
      }));
    if (rows.length === 0) return [];
    const log = await this.logRows.find({ where: { batchId: In(rows.map((r) => r.id)) } });
    const people = await this.people(slug, user);
    return rows.map((row) =>
      toBatch(
        row,
        log.filter((e) => e.batchId === row.id),
        {
          species: this.ctx.get(row.slug),
          growerName: people.get(row.growerId)?.displayName ?? apiWords(locale)('refusals.batches.formerGrower'),
          season: c.season,
          targetGerminationPct: c.targets.find((t) => t.slug === row.slug)?.germinationRatePct ?? null,
          today,
          locale,
        },
      ),
    );
  }

  /** Everyone in the group by id, with display name and role (no e-mail). */
  private async people(slug: string, user: AuthenticatedUser): Promise<People> {
    const members = await this.groups.members(slug, user);
    return new Map(members.map((m) => [m.userId, { displayName: m.displayName, role: m.role }]));
  }

  private async unitsUsed(seasonId: string): Promise<Map<string, number>> {
    const used = new Map<string, number>();
    for (const b of await this.batchRows.find({ where: { seasonId } })) {
      const key = `${b.growerId}|${b.method}`;
      used.set(key, (used.get(key) ?? 0) + unitsFor(b.method, b.plants));
    }
    return used;
  }

  /** Growers of the season: members with the grower role, and anyone who has stated methods. */
  private async growerList(slug: string, user: AuthenticatedUser, c: SeasonContext): Promise<SeasonGrower[]> {
    const [people, rows, used] = await Promise.all([
      this.people(slug, user),
      this.growerRows.find({ where: { seasonId: c.season.id } }),
      this.unitsUsed(c.season.id),
    ]);
    const stated = new Map(rows.map((r) => [r.userId, r.methods]));
    return [...people]
      .filter(([id, p]) => p.role === 'grower' || (p.role === 'organiser' && stated.has(id)))
      .map(([userId, p]) => {
        const methods = stated.get(userId) ?? [];
        return {
          userId,
          displayName: p.displayName,
          role: p.role,
          methods,
          used: methods.map((m) => ({ method: m.method, units: used.get(`${userId}|${m.method}`) ?? 0 })),
        };
      });
  }
}
