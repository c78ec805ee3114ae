import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { FieldChange, Species, SpeciesChangeKind } from '@homeground/shared';
import { User } from '../users/user.entity.js';

/** One change to a species record, with both versions kept so it can be undone. */
@Entity({ name: 'species_changes' })
export class SpeciesChangeRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** The record's slug after the change. */
  @Column({ type: 'text' })
  slug: string;

  @Column({ type: 'text' })
  kind: SpeciesChangeKind;

  @Column({ type: 'datetime', name: 'changed_at' })
  changedAt: Date;

  @Column({ type: 'text', name: 'changed_by', nullable: true })
  changedById: string | null;

  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'changed_by' })
  changedBy: Relation<User> | null;

  @Column({ type: 'text', name: 'file_name', nullable: true })
  fileName: string | null;

  @Column({ type: 'text', name: 'revert_of', nullable: true })
  revertOf: string | null;

  @Column({ type: 'simple-json', name: 'before_record', nullable: true })
  beforeRecord: Species | null;

  @Column({ type: 'simple-json', name: 'after_record' })
  afterRecord: Species;

  @Column({ type: 'simple-json' })
  changes: FieldChange[];
}
