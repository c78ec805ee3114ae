import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { LogKind, LossReason } from '@homeground/shared';

/** One line of a batch log. Entries are never edited: a correction is a new entry. */
@Entity({ name: 'batch_log_entries' })
@Index('ix_batch_log_entries_batch', ['batchId'])
export class BatchLogEntryRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', name: 'batch_id' })
  batchId: string;

  @Column({ type: 'text' })
  kind: LogKind;

  @Column({ type: 'integer' })
  count: number;

  @Column({ type: 'text' })
  date: string;

  @Column({ type: 'text', nullable: true })
  reason: LossReason | null;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  /** The device's id for the entry: the same entry sent twice is stored once. */
  @Column({ type: 'text', name: 'client_id', nullable: true })
  clientId: string | null;

  @Column({ type: 'text', name: 'created_by' })
  createdBy: string;

  @CreateDateColumn({ name: 'created_at' })
  createdAt: Date;
}
