import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  Unique,
  type Relation,
} from 'typeorm';
import type { GroupRole } from '@homeground/shared';
// Type-only, with the relation named by entity: users and groups must not import each other at run time.
import type { User } from '../users/user.entity.js';
import { Group } from './group.entity.js';

/** A person's role in one group: organiser or grower. */
@Entity({ name: 'group_memberships' })
@Unique('uq_group_memberships_user_group', ['userId', 'groupId'])
export class GroupMembership {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', name: 'user_id' })
  userId: string;

  @Column({ type: 'text', name: 'group_id' })
  groupId: string;

  @Column({ type: 'text' })
  role: GroupRole;

  @CreateDateColumn({ name: 'created_at' })
  createdAt: Date;

  @ManyToOne('User', (u: User) => u.memberships, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user: Relation<User>;

  @ManyToOne(() => Group, (g) => g.memberships, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'group_id' })
  group: Relation<Group>;
}
