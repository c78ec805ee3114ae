import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/** Which grower got which week's summary, so a week is never sent twice (kept across restarts). */
export class CreateWeeklySummariesSent1765900000000 implements MigrationInterface {
  name = 'CreateWeeklySummariesSent1765900000000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "weekly_summaries_sent" (
      "id" ${t.uuidKey},
      "group_id" text NOT NULL REFERENCES "groups" ("id") ON DELETE CASCADE,
      "user_id" text NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
      "week" text NOT NULL,
      "sent_at" ${t.datetime} NOT NULL DEFAULT ${t.now},
      CONSTRAINT "UQ_weekly_summaries_sent_group_user_week" UNIQUE ("group_id", "user_id", "week")
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "weekly_summaries_sent"`);
  }
}
