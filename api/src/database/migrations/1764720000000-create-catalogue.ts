import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/**
 * The species catalogue: one row per species holding the full record as JSON (the shared schema),
 * with the columns that filters and sorting need, plus names (for search), native states,
 * EPA Level III ecoregions, counties and the county → ecoregion crosswalk, and species photos.
 */
export class CreateCatalogue1764720000000 implements MigrationInterface {
  name = 'CreateCatalogue1764720000000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "species" (
      "slug" text PRIMARY KEY NOT NULL,
      "scientific_name" text NOT NULL UNIQUE,
      "usda_symbol" text NOT NULL UNIQUE,
      "family" text NOT NULL,
      "growth_form" text NOT NULL,
      "height_max_cm" ${t.real} NOT NULL,
      "monarch_host" boolean NOT NULL,
      "record" text NOT NULL,
      "seed_hash" text,
      "edited_by" text REFERENCES "users" ("id") ON DELETE SET NULL,
      "updated_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE TABLE "species_names" (
      "slug" text NOT NULL REFERENCES "species" ("slug") ON DELETE CASCADE ON UPDATE CASCADE,
      "name" text NOT NULL,
      "kind" text NOT NULL CHECK ("kind" IN ('scientific', 'common', 'synonym')),
      PRIMARY KEY ("slug", "name", "kind")
    )`);
    await q.query(`CREATE TABLE "species_states" (
      "slug" text NOT NULL REFERENCES "species" ("slug") ON DELETE CASCADE ON UPDATE CASCADE,
      "state" text NOT NULL,
      PRIMARY KEY ("slug", "state")
    )`);
    await q.query(`CREATE INDEX "ix_species_states_state" ON "species_states" ("state")`);
    await q.query(`CREATE TABLE "ecoregions" (
      "code" text PRIMARY KEY NOT NULL,
      "name" text NOT NULL,
      "level2_code" text NOT NULL,
      "level1_code" text NOT NULL,
      "record" text NOT NULL
    )`);
    await q.query(`CREATE TABLE "counties" (
      "fips" text PRIMARY KEY NOT NULL,
      "name" text NOT NULL,
      "state" text NOT NULL
    )`);
    await q.query(`CREATE TABLE "county_ecoregions" (
      "fips" text NOT NULL REFERENCES "counties" ("fips") ON DELETE CASCADE,
      "code" text NOT NULL REFERENCES "ecoregions" ("code") ON DELETE CASCADE,
      "share" ${t.real} NOT NULL CHECK ("share" > 0 AND "share" <= 1),
      PRIMARY KEY ("fips", "code")
    )`);
    await q.query(`CREATE TABLE "species_photos" (
      "slug" text PRIMARY KEY NOT NULL REFERENCES "species" ("slug") ON DELETE CASCADE ON UPDATE CASCADE,
      "file" text NOT NULL,
      "mime" text NOT NULL,
      "bytes" integer NOT NULL,
      "width" integer NOT NULL,
      "height" integer NOT NULL,
      "uploaded_by" text REFERENCES "users" ("id") ON DELETE SET NULL,
      "uploaded_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE TABLE "catalogue_meta" ("key" text PRIMARY KEY NOT NULL, "value" text NOT NULL)`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of [
      'catalogue_meta',
      'species_photos',
      'county_ecoregions',
      'counties',
      'ecoregions',
      'species_states',
      'species_names',
      'species',
    ]) {
      await q.query(`DROP TABLE "${t}"`);
    }
  }
}
