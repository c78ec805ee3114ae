import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One target of a season: plants wanted of a species, with the organiser's own germination rate. */
@Entity({ name: 'season_targets' })
@Index('uq_season_targets_species', ['seasonId', 'slug'], { unique: true })
export class SeasonTargetRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', name: 'season_id' })
  seasonId: string;

  /** Catalogue slug; kept as text so a curator's rename shows as unknown rather than deleting the target. */
  @Column({ type: 'text' })
  slug: string;

  @Column({ type: 'integer', name: 'target_plants' })
  targetPlants: number;

  @Column({ type: 'real', name: 'germination_rate_pct', nullable: true })
  germinationRatePct: number | null;

  /** The organiser's order. */
  @Column({ type: 'integer' })
  position: number;
}
