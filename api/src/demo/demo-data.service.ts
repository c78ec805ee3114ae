import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { hashPassword } from '../auth/password.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { GroupMembership } from '../groups/group-membership.entity.js';
import { Group } from '../groups/group.entity.js';
import { SeasonTargetRow } from '../seasons/season-target.entity.js';
import { SeasonRow } from '../seasons/season.entity.js';
import { User } from '../users/user.entity.js';
import { DEMO_GROUP, DEMO_PEOPLE } from './demo-people.js';
import { DEMO_SEASON, DEMO_TARGETS } from './demo-season.js';
import { loadDemoShare } from './demo-share.js';
import { DEMO_GROWER_CAPACITY, DEMO_LOG } from './demo-batches.js';
import { BatchLogEntryRow } from '../batches/batch-log-entry.entity.js';
import { BatchRow } from '../batches/batch.entity.js';
import { SeasonGrowerRow } from '../batches/season-grower.entity.js';
import { MixContextService } from '../mix-context/mix-context.service.js';
import { proposeBatchSplit } from '@homeground/shared';

/** Loads the invented Larkfield group, people and season at start (idempotent); never in production. */
@Injectable()
export class DemoDataService implements OnApplicationBootstrap {
  private readonly logger = new Logger('DemoData');

  constructor(
    @InjectDataSource() private readonly db: DataSource,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly ctx: MixContextService,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (!this.config.demoData) return;
    const created = await this.load();
    if (created > 0) this.logger.log(`Loaded ${created} demo people into ${DEMO_GROUP.name}`);
  }

  /** Returns how many demo people were created (0 when they were there already). */
  async load(): Promise<number> {
    // Hash outside the transaction: scrypt is slow by design and SQLite allows one writer.
    const users = this.db.getRepository(User);
    const missing: typeof DEMO_PEOPLE = [];
    for (const p of DEMO_PEOPLE) if (!(await users.exists({ where: { email: p.email } }))) missing.push(p);
    const hashes = await Promise.all(missing.map((p) => hashPassword(p.password)));
    let seasonId: string | null = null;
    const created = await this.db.transaction(async (tx) => {
      let group = await tx.findOne(Group, { where: { slug: DEMO_GROUP.slug } });
      group ??= await tx.save(Group, tx.create(Group, DEMO_GROUP));
      for (const [i, p] of missing.entries()) {
        const user = await tx.save(
          User,
          tx.create(User, {
            email: p.email,
            displayName: p.displayName,
            passwordHash: hashes[i],
            role: p.role,
            isDemo: true,
          }),
        );
        if (p.groupRole)
          await tx.save(
            GroupMembership,
            tx.create(GroupMembership, { userId: user.id, groupId: group.id, role: p.groupRole }),
          );
      }
      // The season in progress, so the season pages show a living plan; an organiser's edits are kept.
      if (!(await tx.exists(SeasonRow, { where: { groupId: group.id, year: DEMO_SEASON.year } }))) {
        const season = await tx.save(SeasonRow, tx.create(SeasonRow, { groupId: group.id, ...DEMO_SEASON }));
        seasonId = season.id;
        await tx.save(
          SeasonTargetRow,
          DEMO_TARGETS.map((t, position) =>
            tx.create(SeasonTargetRow, {
              seasonId: season.id,
              slug: t.slug,
              targetPlants: t.targetPlants,
              germinationRatePct: t.germinationRatePct ?? null,
              position,
            }),
          ),
        );
      }
      // The season's plant share, open with slots and a few reservations, so the share pages have something to show.
      const season = await tx.findOneOrFail(SeasonRow, { where: { groupId: group.id, year: DEMO_SEASON.year } });
      await loadDemoShare(tx, group.id, season.id);
      return missing.length;
    });
    // A new demo season gets its growers, batches and log (in its own transaction: the split reads the catalogue).
    if (seasonId) await this.loadBatches(seasonId);
    return created;
  }

  /** The growers' capacity, the split Homeground proposes over it, and a few log entries. */
  private async loadBatches(seasonId: string): Promise<void> {
    await this.db.transaction(async (tx) => {
      const idOf = new Map<string, string>();
      for (const email of Object.keys(DEMO_GROWER_CAPACITY)) {
        const user = await tx.findOne(User, { where: { email } });
        if (user) idOf.set(email, user.id);
      }
      const growers = [...idOf].map(([email, growerId]) => ({ growerId, methods: DEMO_GROWER_CAPACITY[email] }));
      for (const g of growers)
        await tx.save(
          SeasonGrowerRow,
          tx.create(SeasonGrowerRow, { seasonId, userId: g.growerId, methods: g.methods }),
        );
      const targets = DEMO_TARGETS.flatMap((t) => {
        const species = this.ctx.get(t.slug);
        return species ? [{ species, targetPlants: t.targetPlants }] : [];
      });
      const split = proposeBatchSplit(targets, growers);
      const rows = await tx.save(
        BatchRow,
        split.batches.map((b, position) =>
          tx.create(BatchRow, {
            seasonId,
            growerId: b.growerId,
            slug: b.slug,
            method: b.method,
            plants: b.plants,
            sowDate: null,
            position,
          }),
        ),
      );
      for (const l of DEMO_LOG) {
        const batch = rows.find((r) => r.growerId === idOf.get(l.email) && r.slug === l.slug);
        if (!batch) continue;
        for (const e of l.entries)
          await tx.save(
            BatchLogEntryRow,
            tx.create(BatchLogEntryRow, {
              batchId: batch.id,
              kind: e.kind,
              count: e.count,
              date: e.date,
              reason: e.reason ?? null,
              note: e.note ?? null,
              clientId: null,
              createdBy: batch.growerId,
            }),
          );
      }
    });
  }
}
