import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { GroupRole } from '@homeground/shared';

/** An e-mailed invitation to join a group. Only a hash of the link's secret is stored. */
@Entity({ name: 'group_invitations' })
@Index('uq_group_invitations_token', ['tokenHash'], { unique: true })
export class InvitationRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text', name: 'group_id' })
  groupId: string;

  @Column({ type: 'text' })
  email: string;

  @Column({ type: 'text' })
  role: GroupRole;

  /** SHA-256 of the link's secret, hex. */
  @Column({ type: 'text', name: 'token_hash' })
  tokenHash: string;

  @Column({ type: 'text', name: 'invited_by' })
  invitedBy: string;

  @Column({ type: 'datetime', name: 'expires_at' })
  expiresAt: Date;

  @Column({ type: 'datetime', name: 'accepted_at', nullable: true })
  acceptedAt: Date | null;

  @CreateDateColumn({ name: 'created_at' })
  createdAt: Date;
}
