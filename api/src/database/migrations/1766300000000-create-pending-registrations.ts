import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/**
 * Sign-ups waiting for their e-mail to be confirmed (register answers the same whether or not an account
 * exists). Only a hash of the link's secret is stored; rows are deleted when used or expired.
 */
export class CreatePendingRegistrations1766300000000 implements MigrationInterface {
  name = 'CreatePendingRegistrations1766300000000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "pending_registrations" (
      "id" ${t.uuidKey},
      "email" text NOT NULL,
      "display_name" text NOT NULL,
      "password_hash" text NOT NULL,
      "token_hash" text NOT NULL,
      "return_path" text,
      "expires_at" ${t.datetime} NOT NULL,
      "created_at" ${t.datetime} NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_pending_registrations_token" ON "pending_registrations" ("token_hash")`);
    await q.query(`CREATE INDEX "ix_pending_registrations_email" ON "pending_registrations" ("email")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "pending_registrations"`);
  }
}
