import type { MigrationInterface, QueryRunner } from 'typeorm';
import { dialectOf } from '../../common/database/dialect.js';

/**
 * A group's people now include plain members (who reserve plants) beside growers and organisers.
 * SQLite cannot change a CHECK constraint in place, so the table is rebuilt with its rows; PostgreSQL
 * swaps the constraint (its name is the one PostgreSQL gave the column's CHECK in the first migration).
 */
export class AllowGroupMembers1765022400000 implements MigrationInterface {
  name = 'AllowGroupMembers1765022400000';

  async up(q: QueryRunner): Promise<void> {
    if (dialectOf(q.connection) === 'postgres') return replaceCheck(q, `'member', 'grower', 'organiser'`);
    await rebuild(q, `'member', 'grower', 'organiser'`, `SELECT * FROM "group_memberships"`);
  }

  async down(q: QueryRunner): Promise<void> {
    if (dialectOf(q.connection) === 'postgres') {
      await q.query(`DELETE FROM "group_memberships" WHERE "role" = 'member'`);
      return replaceCheck(q, `'organiser', 'grower'`);
    }
    await rebuild(q, `'organiser', 'grower'`, `SELECT * FROM "group_memberships" WHERE "role" <> 'member'`);
  }
}

async function rebuild(q: QueryRunner, roles: string, rows: string): Promise<void> {
  await q.query(`CREATE TABLE "group_memberships_new" (
    "id" varchar PRIMARY KEY NOT NULL,
    "user_id" text NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
    "group_id" text NOT NULL REFERENCES "groups" ("id") ON DELETE CASCADE,
    "role" text NOT NULL CHECK ("role" IN (${roles})),
    "created_at" datetime NOT NULL DEFAULT (datetime('now')),
    CONSTRAINT "uq_group_memberships_user_group" UNIQUE ("user_id", "group_id")
  )`);
  await q.query(`INSERT INTO "group_memberships_new" ("id", "user_id", "group_id", "role", "created_at")
    SELECT "id", "user_id", "group_id", "role", "created_at" FROM (${rows})`);
  await q.query(`DROP TABLE "group_memberships"`);
  await q.query(`ALTER TABLE "group_memberships_new" RENAME TO "group_memberships"`);
  await q.query(`CREATE INDEX "ix_group_memberships_group" ON "group_memberships" ("group_id")`);
}

async function replaceCheck(q: QueryRunner, roles: string): Promise<void> {
  await q.query(`ALTER TABLE "group_memberships" DROP CONSTRAINT "group_memberships_role_check"`);
  await q.query(
    `ALTER TABLE "group_memberships" ADD CONSTRAINT "group_memberships_role_check" CHECK ("role" IN (${roles}))`,
  );
}
