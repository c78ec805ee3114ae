import type { MigrationInterface, QueryRunner } from 'typeorm';

/** A plant share says what takers should bring to pickup (older shares say nothing). */
export class AddShareWhatToBring1766000000000 implements MigrationInterface {
  name = 'AddShareWhatToBring1766000000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "plant_shares" ADD COLUMN "what_to_bring" text`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "plant_shares" DROP COLUMN "what_to_bring"`);
  }
}
