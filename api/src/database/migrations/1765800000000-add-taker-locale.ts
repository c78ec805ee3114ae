import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The language a plant-share taker used (en or es), kept with the reservation and the waitlist place
 * so the confirmation, change and waitlist-offer e-mails are written in it. Rows from before say English.
 */
export class AddTakerLocale1765800000000 implements MigrationInterface {
  name = 'AddTakerLocale1765800000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `ALTER TABLE "share_reservations" ADD COLUMN "locale" varchar(2) NOT NULL DEFAULT 'en' CHECK ("locale" IN ('en', 'es'))`,
    );
    await q.query(
      `ALTER TABLE "share_waitlist" ADD COLUMN "locale" varchar(2) NOT NULL DEFAULT 'en' CHECK ("locale" IN ('en', 'es'))`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "share_waitlist" DROP COLUMN "locale"`);
    await q.query(`ALTER TABLE "share_reservations" DROP COLUMN "locale"`);
  }
}
