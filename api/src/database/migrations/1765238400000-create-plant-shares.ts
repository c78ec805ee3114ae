import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/**
 * The plant share: one per group season, its pickup slots, the stock per species, reservations and
 * their lines, waitlist entries and walk-up gifts. CHECK constraints keep stock and slot bookings
 * between zero and their limits, so even a bug cannot oversell; the service's conditional updates
 * are what answers "all taken".
 */
export class CreatePlantShares1765238400000 implements MigrationInterface {
  name = 'CreatePlantShares1765238400000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "plant_shares" (
      "id" ${t.uuidKey},
      "group_id" text NOT NULL REFERENCES "groups" ("id") ON DELETE CASCADE,
      "season_id" text NOT NULL REFERENCES "seasons" ("id") ON DELETE CASCADE,
      "share_date" text NOT NULL,
      "place_name" text NOT NULL,
      "place_address" text NOT NULL,
      "place_directions" text,
      "status" text NOT NULL CHECK ("status" IN ('open', 'paused', 'closed')),
      "per_species_limit" integer NOT NULL CHECK ("per_species_limit" >= 1),
      "total_limit" integer NOT NULL CHECK ("total_limit" >= 1),
      "retention_days" integer NOT NULL CHECK ("retention_days" BETWEEN 1 AND 365),
      "personal_data_purged_at" ${t.datetime},
      "created_at" ${t.datetime} NOT NULL DEFAULT ${t.now},
      "updated_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_plant_shares_season" ON "plant_shares" ("season_id")`);
    await q.query(`CREATE INDEX "ix_plant_shares_group" ON "plant_shares" ("group_id")`);
    await q.query(`CREATE TABLE "share_slots" (
      "id" ${t.uuidKey},
      "share_id" text NOT NULL REFERENCES "plant_shares" ("id") ON DELETE CASCADE,
      "starts_at" text NOT NULL,
      "ends_at" text NOT NULL,
      "starts_at_ms" ${t.epochMs} NOT NULL,
      "ends_at_ms" ${t.epochMs} NOT NULL,
      "capacity" integer NOT NULL CHECK ("capacity" >= 1),
      "booked" integer NOT NULL DEFAULT 0 CHECK ("booked" >= 0 AND "booked" <= "capacity")
    )`);
    await q.query(`CREATE INDEX "ix_share_slots_share" ON "share_slots" ("share_id", "starts_at_ms")`);
    await q.query(`CREATE TABLE "share_stock" (
      "id" ${t.uuidKey},
      "share_id" text NOT NULL REFERENCES "plant_shares" ("id") ON DELETE CASCADE,
      "slug" text NOT NULL,
      "offered" integer NOT NULL CHECK ("offered" >= 0),
      "remaining" integer NOT NULL CHECK ("remaining" >= 0),
      "position" integer NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_share_stock_species" ON "share_stock" ("share_id", "slug")`);
    await q.query(`CREATE TABLE "share_reservations" (
      "id" ${t.uuidKey},
      "share_id" text NOT NULL REFERENCES "plant_shares" ("id") ON DELETE CASCADE,
      "slot_id" text NOT NULL REFERENCES "share_slots" ("id"),
      "token_hash" text NOT NULL,
      "status" text NOT NULL CHECK ("status" IN ('confirmed', 'picked-up', 'no-show', 'cancelled')),
      "name" text,
      "email" text,
      "zip" text NOT NULL,
      "created_at" text NOT NULL,
      "updated_at" text NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_share_reservations_token" ON "share_reservations" ("token_hash")`);
    await q.query(`CREATE INDEX "ix_share_reservations_slot" ON "share_reservations" ("slot_id", "status")`);
    // One confirmed reservation per household (e-mail) and share: the household limits hold across reservations.
    await q.query(`CREATE UNIQUE INDEX "uq_share_reservations_household" ON "share_reservations" ("share_id", "email")
      WHERE "status" = 'confirmed' AND "email" IS NOT NULL`);
    await q.query(`CREATE TABLE "share_reservation_lines" (
      "id" ${t.uuidKey},
      "reservation_id" text NOT NULL REFERENCES "share_reservations" ("id") ON DELETE CASCADE,
      "slug" text NOT NULL,
      "count" integer NOT NULL CHECK ("count" >= 1)
    )`);
    await q.query(
      `CREATE INDEX "ix_share_reservation_lines_reservation" ON "share_reservation_lines" ("reservation_id")`,
    );
    await q.query(`CREATE TABLE "share_waitlist" (
      "id" ${t.uuidKey},
      "share_id" text NOT NULL REFERENCES "plant_shares" ("id") ON DELETE CASCADE,
      "slug" text NOT NULL,
      "count" integer NOT NULL CHECK ("count" >= 1),
      "held" integer NOT NULL DEFAULT 0 CHECK ("held" >= 0 AND "held" <= "count"),
      "status" text NOT NULL CHECK ("status" IN ('waiting', 'offered', 'claimed', 'expired')),
      "offered_until" ${t.epochMs},
      "token_hash" text,
      "name" text,
      "email" text,
      "zip" text NOT NULL,
      "seq" integer NOT NULL,
      "created_at" text NOT NULL
    )`);
    await q.query(`CREATE INDEX "ix_share_waitlist_order" ON "share_waitlist" ("share_id", "slug", "status", "seq")`);
    await q.query(`CREATE UNIQUE INDEX "uq_share_waitlist_token" ON "share_waitlist" ("token_hash")`);
    await q.query(`CREATE TABLE "share_walk_ups" (
      "id" ${t.uuidKey},
      "share_id" text NOT NULL REFERENCES "plant_shares" ("id") ON DELETE CASCADE,
      "zip_area" text,
      "given_at" text NOT NULL
    )`);
    await q.query(`CREATE TABLE "share_walk_up_lines" (
      "id" ${t.uuidKey},
      "walk_up_id" text NOT NULL REFERENCES "share_walk_ups" ("id") ON DELETE CASCADE,
      "slug" text NOT NULL,
      "count" integer NOT NULL CHECK ("count" >= 1)
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of [
      'share_walk_up_lines',
      'share_walk_ups',
      'share_waitlist',
      'share_reservation_lines',
      'share_reservations',
      'share_stock',
      'share_slots',
      'plant_shares',
    ])
      await q.query(`DROP TABLE "${t}"`);
  }
}
