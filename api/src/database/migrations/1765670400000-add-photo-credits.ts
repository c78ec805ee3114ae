import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Every species photo names who took it, its licence and where it came from (older uploads have none). */
export class AddPhotoCredits1765670400000 implements MigrationInterface {
  name = 'AddPhotoCredits1765670400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "species_photos" ADD COLUMN "photographer" text`);
    await q.query(`ALTER TABLE "species_photos" ADD COLUMN "licence" text`);
    await q.query(`ALTER TABLE "species_photos" ADD COLUMN "source_url" text`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const c of ['photographer', 'licence', 'source_url'])
      await q.query(`ALTER TABLE "species_photos" DROP COLUMN "${c}"`);
  }
}
