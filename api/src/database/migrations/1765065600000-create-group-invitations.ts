import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/** E-mailed invitations to join a group; the link's secret is stored only as a hash. */
export class CreateGroupInvitations1765065600000 implements MigrationInterface {
  name = 'CreateGroupInvitations1765065600000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "group_invitations" (
      "id" ${t.uuidKey},
      "group_id" text NOT NULL REFERENCES "groups" ("id") ON DELETE CASCADE,
      "email" text NOT NULL,
      "role" text NOT NULL,
      "token_hash" text NOT NULL,
      "invited_by" text NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
      "expires_at" ${t.datetime} NOT NULL,
      "accepted_at" ${t.datetime},
      "created_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_group_invitations_token" ON "group_invitations" ("token_hash")`);
    await q.query(`CREATE INDEX "ix_group_invitations_group" ON "group_invitations" ("group_id")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "group_invitations"`);
  }
}
