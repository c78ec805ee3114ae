import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A message the local SMTP server received. Kept only when Homeground delivers to its own server
 * (development, tests, a demo without SMTP settings), so organisers and admins can read what went out.
 */
@Entity({ name: 'outbox_messages' })
@Index('ix_outbox_messages_group', ['groupId'])
export class OutboxMessageRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', name: 'message_id', nullable: true })
  messageId: string | null;

  @Column({ type: 'text' })
  from: string;

  /** Recipients as the envelope named them, lower-cased. */
  @Column({ type: 'simple-json' })
  to: string[];

  @Column({ type: 'text' })
  subject: string;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'text', nullable: true })
  html: string | null;

  /** What the message is for (invitation, frost-warning, …), from the X-Homeground-Kind header. */
  @Column({ type: 'text' })
  kind: string;

  /** The group it concerns, from the X-Homeground-Group header; null for account mail. */
  @Column({ type: 'text', name: 'group_id', nullable: true })
  groupId: string | null;

  @CreateDateColumn({ name: 'received_at' })
  receivedAt: Date;
}
