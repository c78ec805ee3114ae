import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/** Admins can switch an account off (and on again) without deleting it or its group history. */
export class AddAccountDisabled1765497600000 implements MigrationInterface {
  name = 'AddAccountDisabled1765497600000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`ALTER TABLE "users" ADD COLUMN "disabled_at" ${t.datetime}`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "users" DROP COLUMN "disabled_at"`);
  }
}
