import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/** Users with global roles, community groups, and each person's role in a group. */
export class CreateUsersAndGroups1764633600000 implements MigrationInterface {
  name = 'CreateUsersAndGroups1764633600000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "users" (
      "id" ${t.uuidKey},
      "email" text NOT NULL UNIQUE,
      "display_name" text NOT NULL,
      "password_hash" text NOT NULL,
      "role" text NOT NULL DEFAULT ('member') CHECK ("role" IN ('member', 'curator', 'admin')),
      "is_demo" boolean NOT NULL DEFAULT ${t.false},
      "created_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE TABLE "groups" (
      "id" ${t.uuidKey},
      "slug" text NOT NULL UNIQUE,
      "name" text NOT NULL,
      "town" text NOT NULL,
      "state" text NOT NULL,
      "ecoregion_code" text,
      "created_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE TABLE "group_memberships" (
      "id" ${t.uuidKey},
      "user_id" text NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
      "group_id" text NOT NULL REFERENCES "groups" ("id") ON DELETE CASCADE,
      "role" text NOT NULL CHECK ("role" IN ('organiser', 'grower')),
      "created_at" ${t.datetime} NOT NULL DEFAULT ${t.now},
      CONSTRAINT "uq_group_memberships_user_group" UNIQUE ("user_id", "group_id")
    )`);
    await q.query(`CREATE INDEX "ix_group_memberships_group" ON "group_memberships" ("group_id")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "group_memberships"`);
    await q.query(`DROP TABLE "groups"`);
    await q.query(`DROP TABLE "users"`);
  }
}
