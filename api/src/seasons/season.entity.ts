import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { SowingMethod } from '@homeground/shared';

/** A group's growing season: its dates and seed-list settings. One per group and year. */
@Entity({ name: 'seasons' })
@Index('uq_seasons_group_year', ['groupId', 'year'], { unique: true })
export class SeasonRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', name: 'group_id' })
  groupId: string;

  @Column({ type: 'integer' })
  year: number;

  /** Average last spring frost, ISO date. */
  @Column({ type: 'text', name: 'last_frost' })
  lastFrost: string;

  /** The plant share, ISO date. */
  @Column({ type: 'text', name: 'plant_share_date' })
  plantShareDate: string;

  @Column({ type: 'simple-json' })
  methods: SowingMethod[];

  /** Share of the plants that are native milkweeds, 0–1. */
  @Column({ type: 'real', name: 'milkweed_share' })
  milkweedShare: number;

  @Column({ type: 'real', name: 'loss_factor' })
  lossFactor: number;

  @Column({ type: 'integer', name: 'seeds_per_packet' })
  seedsPerPacket: number;

  @CreateDateColumn({ name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at' })
  updatedAt: Date;
}
