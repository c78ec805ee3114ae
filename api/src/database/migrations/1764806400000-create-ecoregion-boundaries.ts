import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/**
 * Level III boundary polygons an admin has imported (GeoJSON as the EPA publishes it). When present,
 * place lookups test the point against them instead of relying on the county crosswalk.
 */
export class CreateEcoregionBoundaries1764806400000 implements MigrationInterface {
  name = 'CreateEcoregionBoundaries1764806400000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "ecoregion_boundaries" (
      "code" text PRIMARY KEY NOT NULL REFERENCES "ecoregions" ("code") ON DELETE CASCADE,
      "name" text NOT NULL,
      "geometry" text NOT NULL,
      "vertices" integer NOT NULL,
      "imported_by" text REFERENCES "users" ("id") ON DELETE SET NULL,
      "imported_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "ecoregion_boundaries"`);
  }
}
