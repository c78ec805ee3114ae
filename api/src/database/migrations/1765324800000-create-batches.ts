import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/** Growers' methods and capacity per season, batches, and batch logs. */
export class CreateBatches1765324800000 implements MigrationInterface {
  name = 'CreateBatches1765324800000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "season_growers" (
      "id" ${t.uuidKey},
      "season_id" text NOT NULL REFERENCES "seasons" ("id") ON DELETE CASCADE,
      "user_id" text NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
      "methods" text NOT NULL,
      "updated_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_season_growers_user" ON "season_growers" ("season_id", "user_id")`);
    await q.query(`CREATE TABLE "batches" (
      "id" ${t.uuidKey},
      "season_id" text NOT NULL REFERENCES "seasons" ("id") ON DELETE CASCADE,
      "grower_id" text NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
      "slug" text NOT NULL,
      "method" text NOT NULL CHECK ("method" IN ('outdoor-pot-winter', 'winter-sowing', 'indoor-lights', 'soil-blocks')),
      "plants" integer NOT NULL CHECK ("plants" BETWEEN 1 AND 5000),
      "sow_date" text,
      "position" integer NOT NULL,
      "created_at" ${t.datetime} NOT NULL DEFAULT ${t.now},
      "updated_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE INDEX "ix_batches_season" ON "batches" ("season_id")`);
    await q.query(`CREATE TABLE "batch_log_entries" (
      "id" ${t.uuidKey},
      "batch_id" text NOT NULL REFERENCES "batches" ("id") ON DELETE CASCADE,
      "kind" text NOT NULL CHECK ("kind" IN ('sown', 'germinated', 'potted-up', 'lost', 'ready')),
      "count" integer NOT NULL CHECK ("count" >= 0),
      "date" text NOT NULL,
      "reason" text,
      "note" text,
      "client_id" text,
      "created_by" text NOT NULL,
      "created_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE INDEX "ix_batch_log_entries_batch" ON "batch_log_entries" ("batch_id")`);
    await q.query(
      `CREATE UNIQUE INDEX "uq_batch_log_entries_client" ON "batch_log_entries" ("batch_id", "client_id") WHERE "client_id" IS NOT NULL`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "batch_log_entries"`);
    await q.query(`DROP TABLE "batches"`);
    await q.query(`DROP TABLE "season_growers"`);
  }
}
