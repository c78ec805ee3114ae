import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/** Mixes that signed-in people save and share by link. */
export class CreateSavedMixes1764892800000 implements MigrationInterface {
  name = 'CreateSavedMixes1764892800000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "saved_mixes" (
      "id" ${t.uuidKey},
      "owner_id" text NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
      "name" text NOT NULL,
      "request" text NOT NULL,
      "chosen" text NOT NULL,
      "created_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE INDEX "ix_saved_mixes_owner" ON "saved_mixes" ("owner_id")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "saved_mixes"`);
  }
}
