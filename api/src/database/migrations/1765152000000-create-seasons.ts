import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/** Group seasons (dates, seed-list settings) and their targets. */
export class CreateSeasons1765152000000 implements MigrationInterface {
  name = 'CreateSeasons1765152000000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "seasons" (
      "id" ${t.uuidKey},
      "group_id" text NOT NULL REFERENCES "groups" ("id") ON DELETE CASCADE,
      "year" integer NOT NULL,
      "last_frost" text NOT NULL,
      "plant_share_date" text NOT NULL,
      "methods" text NOT NULL,
      "milkweed_share" ${t.real} NOT NULL,
      "loss_factor" ${t.real} NOT NULL,
      "seeds_per_packet" integer NOT NULL,
      "created_at" ${t.datetime} NOT NULL DEFAULT ${t.now},
      "updated_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_seasons_group_year" ON "seasons" ("group_id", "year")`);
    await q.query(`CREATE TABLE "season_targets" (
      "id" ${t.uuidKey},
      "season_id" text NOT NULL REFERENCES "seasons" ("id") ON DELETE CASCADE,
      "slug" text NOT NULL,
      "target_plants" integer NOT NULL CHECK ("target_plants" BETWEEN 1 AND 5000),
      "germination_rate_pct" ${t.real} CHECK ("germination_rate_pct" IS NULL OR "germination_rate_pct" BETWEEN 1 AND 100),
      "position" integer NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_season_targets_species" ON "season_targets" ("season_id", "slug")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "season_targets"`);
    await q.query(`DROP TABLE "seasons"`);
  }
}
