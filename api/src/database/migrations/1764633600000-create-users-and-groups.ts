import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Users with global roles, community groups, and each person's role in a group. */
export class CreateUsersAndGroups1764633600000 implements MigrationInterface {
  name = 'CreateUsersAndGroups1764633600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "users" (
      "id" varchar PRIMARY KEY NOT NULL,
      "email" text NOT NULL UNIQUE,
      "display_name" text NOT NULL,
      "password_hash" text NOT NULL,
      "role" text NOT NULL DEFAULT ('member') CHECK ("role" IN ('member', 'curator', 'admin')),
      "is_demo" boolean NOT NULL DEFAULT (0),
      "created_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE TABLE "groups" (
      "id" varchar PRIMARY KEY NOT NULL,
      "slug" text NOT NULL UNIQUE,
      "name" text NOT NULL,
      "town" text NOT NULL,
      "state" text NOT NULL,
      "ecoregion_code" text,
      "created_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE TABLE "group_memberships" (
      "id" varchar PRIMARY KEY NOT NULL,
      "user_id" text NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
      "group_id" text NOT NULL REFERENCES "groups" ("id") ON DELETE CASCADE,
      "role" text NOT NULL CHECK ("role" IN ('organiser', 'grower')),
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
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
