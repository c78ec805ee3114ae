import type { MigrationInterface, QueryRunner } from 'typeorm';
import { schemaWords } from '../../common/database/dialect.js';

/** The local outbox: messages the built-in SMTP server received when no real mail server is set. */
export class CreateOutbox1764979200000 implements MigrationInterface {
  name = 'CreateOutbox1764979200000';

  async up(q: QueryRunner): Promise<void> {
    const t = schemaWords(q);
    await q.query(`CREATE TABLE "outbox_messages" (
      "id" ${t.uuidKey},
      "message_id" text,
      "from" text NOT NULL,
      "to" text NOT NULL,
      "subject" text NOT NULL,
      "text" text NOT NULL,
      "html" text,
      "kind" text NOT NULL,
      "group_id" text,
      "received_at" ${t.datetime} NOT NULL DEFAULT ${t.now}
    )`);
    await q.query(`CREATE INDEX "ix_outbox_messages_group" ON "outbox_messages" ("group_id")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "outbox_messages"`);
  }
}
