import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, Unique } from 'typeorm';

/**
 * One weekly summary sent: to whom, for which group and ISO week. The unique key is what makes a
 * week impossible to send twice, even when the API restarts or two instances run the job.
 */
@Entity('weekly_summaries_sent')
@Unique(['groupId', 'userId', 'week'])
export class WeeklySummarySentRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'group_id', type: 'text' })
  groupId: string;

  @Column({ name: 'user_id', type: 'text' })
  userId: string;

  /** ISO 8601 week, e.g. "2027-W11". */
  @Column({ type: 'text' })
  week: string;

  @CreateDateColumn({ name: 'sent_at', type: 'datetime' })
  sentAt: Date;
}
