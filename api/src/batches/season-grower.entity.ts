import { Column, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { GrowerCapacity } from '@homeground/shared';

/** A grower's methods and capacity for one season. */
@Entity({ name: 'season_growers' })
@Index('uq_season_growers_user', ['seasonId', 'userId'], { unique: true })
export class SeasonGrowerRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', name: 'season_id' })
  seasonId: string;

  @Column({ type: 'text', name: 'user_id' })
  userId: string;

  @Column({ type: 'simple-json' })
  methods: GrowerCapacity[];

  @UpdateDateColumn({ name: 'updated_at' })
  updatedAt: Date;
}
