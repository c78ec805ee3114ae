import { Column, Entity, PrimaryColumn } from 'typeorm';

/** Failed sign-ins for one e-mail address; the address is kept only as a SHA-256 key. */
@Entity({ name: 'sign_in_failures' })
export class SignInFailureRow {
  @PrimaryColumn({ type: 'text', name: 'email_key' })
  emailKey: string;

  @Column({ type: 'integer', default: 0 })
  failures: number;

  @Column({ type: 'datetime', name: 'last_failure_at' })
  lastFailureAt: Date;

  @Column({ type: 'datetime', name: 'locked_until', nullable: true })
  lockedUntil: Date | null;
}
