import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { Species } from '@homeground/shared';

/** A catalogue species: the full shared record as JSON, plus the columns that constraints need. */
@Entity({ name: 'species' })
export class SpeciesRow {
  @PrimaryColumn({ type: 'text' })
  slug: string;

  @Column({ type: 'text', name: 'scientific_name', unique: true })
  scientificName: string;

  @Column({ type: 'text', name: 'usda_symbol', unique: true })
  usdaSymbol: string;

  @Column({ type: 'text' })
  family: string;

  @Column({ type: 'text', name: 'growth_form' })
  growthForm: string;

  @Column({ type: 'real', name: 'height_max_cm' })
  heightMaxCm: number;

  @Column({ type: 'boolean', name: 'monarch_host' })
  monarchHost: boolean;

  @Column({ type: 'simple-json' })
  record: Species;

  /** Hash of the species-data file this row was loaded from; null once a curator has edited it. */
  @Column({ type: 'text', name: 'seed_hash', nullable: true })
  seedHash: string | null;

  @Column({ type: 'text', name: 'edited_by', nullable: true })
  editedBy: string | null;

  @UpdateDateColumn({ name: 'updated_at' })
  updatedAt: Date;
}
