import { Column, CreateDateColumn, Entity, OneToMany, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { GlobalRole } from '@homeground/shared';
// Type-only, with the relation named by entity: users and groups must not import each other at run time.
import type { GroupMembership } from '../groups/group-membership.entity.js';

@Entity({ name: 'users' })
export class User {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Stored lower-cased; unique. */
  @Column({ type: 'text', unique: true })
  email: string;

  @Column({ type: 'text', name: 'display_name' })
  displayName: string;

  /** `scrypt$N$r$p$salt$hash`, see auth/password.ts. */
  @Column({ type: 'text', name: 'password_hash' })
  passwordHash: string;

  @Column({ type: 'text', default: 'member' })
  role: GlobalRole;

  /** Demo people from the invented scenario; they can never sign in when NODE_ENV=production. */
  @Column({ type: 'boolean', name: 'is_demo', default: false })
  isDemo: boolean;

  /** When an admin switched the account off; null while it works. */
  @Column({ type: 'datetime', name: 'disabled_at', nullable: true })
  disabledAt: Date | null;

  /** The last successful sign-in, for the admin's people page. */
  @Column({ type: 'datetime', name: 'last_sign_in_at', nullable: true })
  lastSignInAt: Date | null;

  @CreateDateColumn({ name: 'created_at' })
  createdAt: Date;

  @OneToMany('GroupMembership', (m: GroupMembership) => m.user)
  memberships: Relation<GroupMembership[]>;
}
