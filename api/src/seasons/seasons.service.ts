import { ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import {
  DEFAULT_LOSS_FACTOR,
  DEFAULT_MILKWEED_SHARE,
  DEFAULT_SEASON_METHODS,
  DEFAULT_SEEDS_PER_PACKET,
  pastSeasonDateFields,
  reachedGerminationPct,
  proposeShareList,
  seedList,
  seedListToCsv,
  type Season,
  type SeasonRequest,
  type SeedList,
  type ShareList,
  type ShareListRequest,
  type StateCode,
  type TargetsRequest,
  type Group,
  type GroupRole,
  type WordLocale,
} from '@homeground/shared';
import { DataSource, Repository } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { runSql } from '../common/database/dialect.js';
import { apiWords } from '../common/i18n/api-i18n.js';
import { badRequestIn } from '../common/validation/bad-request.js';
import { GroupsService } from '../groups/groups.service.js';
import { MixContextService } from '../mix-context/mix-context.service.js';
import { SeasonTargetRow } from './season-target.entity.js';
import { SeasonRow } from './season.entity.js';
import { toSeason } from './season.mapper.js';

/** Species a share list proposes when the organiser does not say: a dozen makes a plant share worth the trip. */
const DEFAULT_SHARE_LIST_COUNT = 12;

/** A season's plan as other modules read it: its id, year, share date and targets. */
export interface SeasonPlan {
  id: string;
  year: number;
  plantShareDate: string;
  targets: { slug: string; targetPlants: number }[];
}

/** A season as other modules see it (plain values, never the entity), with the caller's role in its group. */
export interface SeasonContext {
  group: Group;
  /** The caller's role in the group; admins act as organisers. */
  role: GroupRole;
  season: { id: string; year: number; lastFrost: string; plantShareDate: string; lossFactor: number };
  targets: { slug: string; targetPlants: number; germinationRatePct: number | null }[];
}

/** A seed list with the season it belongs to. */
export type SeasonSeedList = SeedList & { groupSlug: string; year: number };

/**
 * A group's season plan. Organisers of the group (and admins) write it; every member, grower and
 * organiser of the group reads it. Each write is one transaction; bad input writes nothing.
 */
@Injectable()
export class SeasonsService {
  constructor(
    @InjectRepository(SeasonRow) private readonly seasons: Repository<SeasonRow>,
    @InjectRepository(SeasonTargetRow) private readonly targets: Repository<SeasonTargetRow>,
    @InjectDataSource() private readonly db: DataSource,
    private readonly groups: GroupsService,
    private readonly ctx: MixContextService,
  ) {}

  async get(slug: string, user: AuthenticatedUser, locale: WordLocale = 'en'): Promise<Season> {
    const group = await this.readable(slug, user, locale);
    const season = await this.latest(group, locale);
    return this.toDto(group, season, await this.targetsOf(season));
  }

  /** Sets the season's dates and settings (creates the season for that year if new). `today` is the server's date. */
  async put(
    slug: string,
    user: AuthenticatedUser,
    req: SeasonRequest,
    today: string,
    locale: WordLocale = 'en',
  ): Promise<Season> {
    const group = await this.managed(slug, user, locale);
    const past = pastSeasonDateFields(req, today);
    if (past.length) throw badRequestIn(locale, past);
    const saved = await this.db.transaction(async (tx) => {
      const existing = await tx.findOne(SeasonRow, { where: { groupId: group.id, year: req.year } });
      const row =
        existing ??
        tx.create(SeasonRow, {
          groupId: group.id,
          year: req.year,
          methods: [...DEFAULT_SEASON_METHODS],
          milkweedShare: DEFAULT_MILKWEED_SHARE,
          lossFactor: DEFAULT_LOSS_FACTOR,
          seedsPerPacket: DEFAULT_SEEDS_PER_PACKET,
        });
      // Settings left out keep their value: an organiser moving the date does not reset the milkweed share.
      Object.assign(row, {
        lastFrost: req.lastFrost,
        plantShareDate: req.plantShareDate,
        ...(req.methods && { methods: req.methods }),
        ...(req.milkweedShare !== undefined && { milkweedShare: req.milkweedShare }),
        ...(req.lossFactor !== undefined && { lossFactor: req.lossFactor }),
        ...(req.seedsPerPacket !== undefined && { seedsPerPacket: req.seedsPerPacket }),
      });
      return tx.save(SeasonRow, row);
    });
    return this.toDto(group, saved, await this.targetsOf(saved));
  }

  /** Proposes a share list for the group's ecoregion; writes nothing. */
  async propose(
    slug: string,
    user: AuthenticatedUser,
    req: ShareListRequest,
    locale: WordLocale = 'en',
  ): Promise<ShareList> {
    const group = await this.managed(slug, user, locale);
    if (!group.ecoregionCode) throw new ConflictException(apiWords(locale)('refusals.seasons.noEcoregion'));
    const season = await this.seasons.findOne({ where: { groupId: group.id }, order: { year: 'DESC' } });
    return proposeShareList({
      species: this.ctx.species(),
      ecoregionCode: group.ecoregionCode,
      state: group.state as StateCode,
      methods: req.methods ?? season?.methods ?? DEFAULT_SEASON_METHODS,
      milkweedShare: req.milkweedShare ?? season?.milkweedShare ?? DEFAULT_MILKWEED_SHARE,
      count: req.count ?? DEFAULT_SHARE_LIST_COUNT,
      totalPlants: req.totalPlants,
    });
  }

  /** Replaces the season's targets with the list given, in its order. */
  async setTargets(
    slug: string,
    user: AuthenticatedUser,
    req: TargetsRequest,
    locale: WordLocale = 'en',
  ): Promise<Season> {
    const group = await this.managed(slug, user, locale);
    const season = await this.latest(group, locale);
    this.ctx.assertKnown(
      req.targets.map((t, i) => ({ field: `targets.${i}.slug`, slug: t.slug })),
      locale,
    );
    const reached = await this.reachedGermination(group.id, season.year);
    const rows = await this.db.transaction(async (tx) => {
      await tx.delete(SeasonTargetRow, { seasonId: season.id });
      const fresh = req.targets.map((t, position) =>
        tx.create(SeasonTargetRow, {
          seasonId: season.id,
          slug: t.slug,
          targetPlants: t.targetPlants,
          // The organiser's own rate wins; otherwise what the group really reached in past seasons.
          germinationRatePct: t.germinationRatePct ?? reached.get(t.slug) ?? null,
          position,
        }),
      );
      const saved = await tx.save(SeasonTargetRow, fresh);
      // The season's updatedAt tells readers the plan changed.
      await tx.update(SeasonRow, { id: season.id }, { updatedAt: new Date() });
      return saved;
    });
    return this.toDto(group, await this.seasons.findOneByOrFail({ id: season.id }), rows);
  }

  /**
   * Germination the group really reached per species in seasons before `year`, from the batch logs
   * (seedlings come up over seeds sown). Read with SQL on the batches tables rather than through the
   * batches module, which builds on this one.
   */
  private async reachedGermination(groupId: string, year: number): Promise<Map<string, number>> {
    // Only batches whose grower logged what came up count: a batch with seeds sown and nothing logged
    // since says nothing about germination.
    const rows = await runSql<{ slug: string; sown: number; germinated: number }>(
      this.db,
      `SELECT slug, SUM(sown) AS sown, SUM(germinated) AS germinated
         FROM (SELECT b.slug AS slug,
                      SUM(CASE WHEN e.kind = 'sown' THEN e.count ELSE 0 END) AS sown,
                      SUM(CASE WHEN e.kind = 'germinated' THEN e.count ELSE 0 END) AS germinated
                 FROM batch_log_entries e
                 JOIN batches b ON b.id = e.batch_id
                 JOIN seasons s ON s.id = b.season_id
                WHERE s.group_id = ? AND s.year < ?
                GROUP BY b.id, b.slug
               HAVING SUM(CASE WHEN e.kind = 'germinated' THEN e.count ELSE 0 END) > 0) AS per_batch
        GROUP BY slug`,
      [groupId, year],
    );
    const out = new Map<string, number>();
    for (const r of rows) {
      const pct = reachedGerminationPct({ sown: Number(r.sown), germinated: Number(r.germinated) });
      if (pct !== null) out.set(r.slug, pct);
    }
    return out;
  }

  /** The seed list; its cautions and collecting notes in `locale`. */
  async seedList(slug: string, user: AuthenticatedUser, locale: WordLocale = 'en'): Promise<SeasonSeedList> {
    const group = await this.readable(slug, user, locale);
    const season = await this.latest(group, locale);
    const targets = (await this.targetsOf(season)).flatMap((t) => {
      const species = this.ctx.get(t.slug);
      // A target renamed away in the catalogue has no record to count from; the season page still lists it.
      return species
        ? [{ species, targetPlants: t.targetPlants, germinationRatePct: t.germinationRatePct ?? undefined }]
        : [];
    });
    const list = seedList(targets, {
      state: group.state as StateCode,
      lossFactor: season.lossFactor,
      seedsPerPacket: season.seedsPerPacket,
      locale,
    });
    return { groupSlug: group.slug, year: season.year, ...list };
  }

  /**
   * The group's newest season for another module (batches), when the caller has a role in the group;
   * 403 otherwise, 404 when the group or its season does not exist.
   */
  async context(slug: string, user: AuthenticatedUser, locale: WordLocale = 'en'): Promise<SeasonContext> {
    const group = await this.groups.getDto(slug, locale);
    const role = await this.groups.roleOf(user, group.id);
    if (!role) throw new ForbiddenException(apiWords(locale)('refusals.seasons.seasonMembersOnly'));
    const season = await this.latest(group, locale);
    const targets = await this.targetsOf(season);
    return {
      group,
      role,
      season: {
        id: season.id,
        year: season.year,
        lastFrost: season.lastFrost,
        plantShareDate: season.plantShareDate,
        lossFactor: season.lossFactor,
      },
      targets: targets.map((t) => ({
        slug: t.slug,
        targetPlants: t.targetPlants,
        germinationRatePct: t.germinationRatePct,
      })),
    };
  }

  /** The same, by season id (for the plant share's stock); null when there is no such season. */
  async contextById(seasonId: string): Promise<Omit<SeasonContext, 'group' | 'role'> | null> {
    const season = await this.seasons.findOne({ where: { id: seasonId } });
    if (!season) return null;
    const targets = await this.targetsOf(season);
    return {
      season: {
        id: season.id,
        year: season.year,
        lastFrost: season.lastFrost,
        plantShareDate: season.plantShareDate,
        lossFactor: season.lossFactor,
      },
      targets: targets.map((t) => ({
        slug: t.slug,
        targetPlants: t.targetPlants,
        germinationRatePct: t.germinationRatePct,
      })),
    };
  }

  async seedListCsv(slug: string, user: AuthenticatedUser, locale: WordLocale = 'en'): Promise<string> {
    return seedListToCsv(await this.seedList(slug, user, locale), locale);
  }

  /**
   * The group's newest season as a plain object with its targets, for modules that build on the plan
   * (the plant share); null when the group has none. No access check: the caller has made its own.
   */
  async latestPlan(groupId: string): Promise<SeasonPlan | null> {
    const season = await this.seasons.findOne({ where: { groupId }, order: { year: 'DESC' } });
    if (!season) return null;
    const targets = await this.targetsOf(season);
    return {
      id: season.id,
      year: season.year,
      plantShareDate: season.plantShareDate,
      targets: targets.map((t) => ({ slug: t.slug, targetPlants: t.targetPlants })),
    };
  }

  /** The group, when the caller has any role in it (member, grower, organiser; admins act as organisers). */
  private async readable(slug: string, user: AuthenticatedUser, locale: WordLocale): Promise<Group> {
    const group = await this.groups.getDto(slug, locale);
    if (!(await this.groups.roleOf(user, group.id)))
      throw new ForbiddenException(apiWords(locale)('refusals.seasons.planMembersOnly'));
    return group;
  }

  private async managed(slug: string, user: AuthenticatedUser, locale: WordLocale): Promise<Group> {
    const group = await this.groups.getDto(slug, locale);
    if ((await this.groups.roleOf(user, group.id)) !== 'organiser') {
      throw new ForbiddenException(apiWords(locale)('refusals.seasons.organiserChanges'));
    }
    return group;
  }

  /** The group's newest season. */
  private async latest(group: Group, locale: WordLocale): Promise<SeasonRow> {
    const season = await this.seasons.findOne({ where: { groupId: group.id }, order: { year: 'DESC' } });
    if (!season) throw new NotFoundException(apiWords(locale)('refusals.seasons.noPlan', { group: group.name }));
    return season;
  }

  private targetsOf(season: SeasonRow): Promise<SeasonTargetRow[]> {
    return this.targets.find({ where: { seasonId: season.id }, order: { position: 'ASC' } });
  }

  private toDto(group: Group, season: SeasonRow, targets: readonly SeasonTargetRow[]): Season {
    return toSeason(group, season, targets, (slug) => {
      const s = this.ctx.get(slug);
      return s && { commonName: s.commonNames[0], scientificName: s.scientificName };
    });
  }
}
