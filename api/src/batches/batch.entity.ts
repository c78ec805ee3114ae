import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { GrowerMethod } from '@homeground/shared';

/** One batch: a grower raises plants of a species by a method in a season. */
@Entity({ name: 'batches' })
@Index('ix_batches_season', ['seasonId'])
export class BatchRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', name: 'season_id' })
  seasonId: string;

  @Column({ type: 'text', name: 'grower_id' })
  growerId: string;

  @Column({ type: 'text' })
  slug: string;

  @Column({ type: 'text' })
  method: GrowerMethod;

  @Column({ type: 'integer' })
  plants: number;

  /** A sowing date the organiser chose; null means the sowing calendar's (or the first sowing logged). */
  @Column({ type: 'text', name: 'sow_date', nullable: true })
  sowDate: string | null;

  /** The organiser's order. */
  @Column({ type: 'integer' })
  position: number;

  @CreateDateColumn({ name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at' })
  updatedAt: Date;
}
