import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/**
 * Sign-in activity: failed attempts per e-mail address (kept whether or not an account exists, so the
 * back-off says nothing about who has one, and in the database so every API instance sees the same
 * count) and each account's last successful sign-in.
 */
export class AddSignInActivity1765411200000 implements MigrationInterface {
  name = 'AddSignInActivity1765411200000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "sign_in_failures" (
      "email_key" text PRIMARY KEY NOT NULL,
      "failures" integer NOT NULL DEFAULT 0,
      "last_failure_at" ${t.datetime} NOT NULL,
      "locked_until" ${t.datetime}
    )`);
    await q.query(`ALTER TABLE "users" ADD COLUMN "last_sign_in_at" ${t.datetime}`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "sign_in_failures"`);
    await q.query(`ALTER TABLE "users" DROP COLUMN "last_sign_in_at"`);
  }
}
