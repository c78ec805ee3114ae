import { createHash, randomBytes } from 'node:crypto';
import { ConflictException, GoneException, Inject, Injectable, Logger, NotFoundException } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import {
  type AuthResponse,
  type ConfirmRegistrationRequest,
  type RegisterAccepted,
  type RegisterRequest,
  REGISTRATION_HOURS,
  type WordLocale,
} from '@homeground/shared';
import { DataSource, LessThan, Repository } from 'typeorm';
import { apiWords } from '../common/i18n/api-i18n.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { MailService } from '../mail/mail.service.js';
import { UsersService } from '../users/users.service.js';
import { AuthService } from './auth.service.js';
import { hashPassword } from './password.js';
import { assertStrongPassword } from './password-strength.js';
import { PendingRegistrationRow } from './pending-registration.entity.js';
import { alreadyRegisteredEmail, confirmRegistrationEmail } from './registration-email.js';

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

/**
 * Sign-up in two steps, so the form never says whether an address has an account (OWASP Authentication
 * Cheat Sheet, "account enumeration"): register always answers "check your e-mail"; a new address gets a
 * link that makes the account, a known one gets a note saying it already has one.
 */
@Injectable()
export class RegistrationService {
  private readonly logger = new Logger('Registration');

  constructor(
    @InjectRepository(PendingRegistrationRow) private readonly pending: Repository<PendingRegistrationRow>,
    @InjectDataSource() private readonly db: DataSource,
    private readonly users: UsersService,
    private readonly auth: AuthService,
    private readonly mail: MailService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** `locale` is the sign-up page's language: its errors and the e-mail sent are in it; nothing stores it. */
  async register(dto: RegisterRequest, now = new Date(), locale: WordLocale = 'en'): Promise<RegisterAccepted> {
    assertStrongPassword(dto.password, dto, 'password', locale);
    const email = dto.email.toLowerCase();
    // Hashed on both paths, so a known address takes as long to answer as a new one.
    const passwordHash = await hashPassword(dto.password);
    // Expired sign-ups hold a name, an address and a password hash: keep them no longer than the link works.
    await this.pending.delete({ expiresAt: LessThan(now) });
    if (await this.users.findByEmail(email)) {
      const message = alreadyRegisteredEmail({ signInLink: `${this.config.publicUrl}/sign-in`, locale });
      await this.mail.send({ to: email, ...message, kind: 'registration' });
    } else {
      const token = randomBytes(32).toString('base64url');
      await this.db.transaction(async (tx) => {
        // A newer sign-up for the same address replaces the older one (its link stops working).
        await tx.delete(PendingRegistrationRow, { email });
        await tx.insert(PendingRegistrationRow, {
          email,
          displayName: dto.displayName,
          passwordHash,
          tokenHash: hashToken(token),
          returnPath: dto.next ?? null,
          expiresAt: new Date(now.getTime() + REGISTRATION_HOURS * 3_600_000),
          createdAt: now,
        });
      });
      const link = `${this.config.publicUrl}/register/confirm/${token}`;
      const message = confirmRegistrationEmail({
        displayName: dto.displayName,
        link,
        hours: REGISTRATION_HOURS,
        locale,
      });
      await this.mail.send({ to: email, ...message, kind: 'registration' });
      if (this.mail.isLocal && !this.config.isProduction) {
        // Development only: the local outbox is for admins, so a person trying the app finds their link here.
        this.logger.log(`Sign-up link for ${email} (local mail, development): ${link}`);
      }
    }
    return { status: 'check-your-email', email, expiresInHours: REGISTRATION_HOURS };
  }

  /** Opens the e-mailed link: makes the account, forgets the pending row, signs the person in. */
  async confirm(
    req: ConfirmRegistrationRequest,
    now = new Date(),
    locale: WordLocale = 'en',
  ): Promise<AuthResponse & { next: string | null }> {
    const say = apiWords(locale);
    const row = await this.pending.findOne({ where: { tokenHash: hashToken(req.token) } });
    if (!row) throw new NotFoundException(say('auth.linkUnknown'));
    if (row.expiresAt.getTime() <= now.getTime()) {
      await this.pending.delete({ id: row.id });
      throw new GoneException(say('auth.linkOld', { hours: REGISTRATION_HOURS }));
    }
    if (await this.users.findByEmail(row.email)) {
      // Someone joined with this address another way (an invitation) since the link was sent.
      await this.pending.delete({ id: row.id });
      throw new ConflictException(say('auth.alreadyHasAccount'));
    }
    const user = await this.users.create(
      { email: row.email, displayName: row.displayName, passwordHash: row.passwordHash },
      locale,
    );
    await this.pending.delete({ id: row.id });
    return { ...(await this.auth.tokenFor(user.id)), next: row.returnPath };
  }
}
