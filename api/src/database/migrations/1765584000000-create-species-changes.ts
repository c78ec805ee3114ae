import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/**
 * The history of every change to a species: who, when, how (edit, import, revert), and both versions
 * of the record, so a change can be read field by field and undone.
 */
export class CreateSpeciesChanges1765584000000 implements MigrationInterface {
  name = 'CreateSpeciesChanges1765584000000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "species_changes" (
      "id" ${t.uuidKey},
      "slug" text NOT NULL,
      "kind" text NOT NULL,
      "changed_at" ${t.datetime} NOT NULL,
      "changed_by" text REFERENCES "users" ("id") ON DELETE SET NULL,
      "file_name" text,
      "revert_of" text,
      "before_record" text,
      "after_record" text NOT NULL,
      "changes" text NOT NULL
    )`);
    await q.query(`CREATE INDEX "ix_species_changes_slug" ON "species_changes" ("slug", "changed_at")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "species_changes"`);
  }
}
