import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Group seasons (dates, seed-list settings) and their targets. */
export class CreateSeasons1765152000000 implements MigrationInterface {
  name = 'CreateSeasons1765152000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "seasons" (
      "id" varchar PRIMARY KEY NOT NULL,
      "group_id" text NOT NULL REFERENCES "groups" ("id") ON DELETE CASCADE,
      "year" integer NOT NULL,
      "last_frost" text NOT NULL,
      "plant_share_date" text NOT NULL,
      "methods" text NOT NULL,
      "milkweed_share" real NOT NULL,
      "loss_factor" real NOT NULL,
      "seeds_per_packet" integer NOT NULL,
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
      "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_seasons_group_year" ON "seasons" ("group_id", "year")`);
    await q.query(`CREATE TABLE "season_targets" (
      "id" varchar PRIMARY KEY NOT NULL,
      "season_id" text NOT NULL REFERENCES "seasons" ("id") ON DELETE CASCADE,
      "slug" text NOT NULL,
      "target_plants" integer NOT NULL CHECK ("target_plants" BETWEEN 1 AND 5000),
      "germination_rate_pct" real CHECK ("germination_rate_pct" IS NULL OR "germination_rate_pct" BETWEEN 1 AND 100),
      "position" integer NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_season_targets_species" ON "season_targets" ("season_id", "slug")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "season_targets"`);
    await q.query(`DROP TABLE "seasons"`);
  }
}
