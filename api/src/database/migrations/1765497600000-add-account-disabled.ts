import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Admins can switch an account off (and on again) without deleting it or its group history. */
export class AddAccountDisabled1765497600000 implements MigrationInterface {
  name = 'AddAccountDisabled1765497600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "users" ADD COLUMN "disabled_at" datetime`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "users" DROP COLUMN "disabled_at"`);
  }
}
