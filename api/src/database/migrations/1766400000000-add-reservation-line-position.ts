import type { MigrationInterface, QueryRunner } from 'typeorm';
import { dialectOf } from '../../common/database/dialect.js';

/**
 * The order of a reservation's lines (the order the taker listed the plants in), kept in a column: on
 * SQLite it used to be the row's rowid, which PostgreSQL has no stable counterpart of. Existing lines
 * get their place from the order they were written in, per database.
 */
export class AddReservationLinePosition1766400000000 implements MigrationInterface {
  name = 'AddReservationLinePosition1766400000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "share_reservation_lines" ADD COLUMN "position" integer NOT NULL DEFAULT 0`);
    if (dialectOf(q.connection) === 'postgres')
      await q.query(`UPDATE "share_reservation_lines" l SET "position" = n.rn
        FROM (SELECT "id", ROW_NUMBER() OVER (PARTITION BY "reservation_id" ORDER BY ctid) - 1 AS rn
              FROM "share_reservation_lines") n
        WHERE n."id" = l."id"`);
    else await q.query(`UPDATE "share_reservation_lines" SET "position" = rowid`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "share_reservation_lines" DROP COLUMN "position"`);
  }
}
