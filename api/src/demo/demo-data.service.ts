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

/** Loads the invented Larkfield group, people and season at start (idempotent); never in production. */
@Injectable()
export class DemoDataService implements OnApplicationBootstrap {
  private readonly logger = new Logger('DemoData');

  constructor(
    @InjectDataSource() private readonly db: DataSource,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
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
    return this.db.transaction(async (tx) => {
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
  }
}
