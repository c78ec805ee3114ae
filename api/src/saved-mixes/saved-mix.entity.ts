import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm';
import type { PaletteRequest } from '@homeground/shared';
// Type-only, with the relation named by entity, so saved mixes need no users code at run time.
import type { User } from '../users/user.entity.js';

/** A mix a signed-in person saved; anyone with its id (an unguessable UUID) can open it by link. */
@Entity({ name: 'saved_mixes' })
export class SavedMixRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', name: 'owner_id' })
  ownerId: string;

  @Column({ type: 'text' })
  name: string;

  @Column({ type: 'simple-json' })
  request: PaletteRequest;

  @Column({ type: 'simple-json' })
  chosen: string[];

  @CreateDateColumn({ name: 'created_at' })
  createdAt: Date;

  @ManyToOne('User', { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'owner_id' })
  owner: Relation<User>;
}
