import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A sign-up waiting for its e-mail to be confirmed. The account is made only when the link is opened,
 * so register can answer the same for a new address and a known one. Only a hash of the link's secret
 * is kept, and the row (a name, an address and a password hash) is deleted once used or expired.
 */
@Entity({ name: 'pending_registrations' })
@Index('uq_pending_registrations_token', ['tokenHash'], { unique: true })
export class PendingRegistrationRow {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text' })
  email: string;

  @Column({ type: 'text', name: 'display_name' })
  displayName: string;

  @Column({ type: 'text', name: 'password_hash' })
  passwordHash: string;

  /** SHA-256 of the link's secret, hex. */
  @Column({ type: 'text', name: 'token_hash' })
  tokenHash: string;

  /** Where the confirmation link returns the person to (a path on this site), if the form had one. */
  @Column({ type: 'text', name: 'return_path', nullable: true })
  returnPath: string | null;

  @Column({ type: 'datetime', name: 'expires_at' })
  expiresAt: Date;

  @Column({ type: 'datetime', name: 'created_at' })
  createdAt: Date;
}
