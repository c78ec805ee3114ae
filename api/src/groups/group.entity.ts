import { Column, CreateDateColumn, Entity, OneToMany, PrimaryGeneratedColumn, type Relation } from 'typeorm';
// Type-only, with the relation named by entity, so the two entities never import each other at run time.
import type { GroupMembership } from './group-membership.entity.js';

/** A community growing group; seasons and plant shares hang off it. */
@Entity({ name: 'groups' })
export class Group {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', unique: true })
  slug: string;

  @Column({ type: 'text' })
  name: string;

  @Column({ type: 'text' })
  town: string;

  /** USPS state code. */
  @Column({ type: 'text' })
  state: string;

  /** EPA Level III ecoregion code the group grows for. */
  @Column({ type: 'text', name: 'ecoregion_code', nullable: true })
  ecoregionCode: string | null;

  @CreateDateColumn({ name: 'created_at' })
  createdAt: Date;

  @OneToMany('GroupMembership', (m: GroupMembership) => m.group)
  memberships: Relation<GroupMembership[]>;
}
