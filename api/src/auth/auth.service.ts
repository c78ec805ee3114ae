import { ForbiddenException, Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { AuthResponse, LoginRequest, WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { UsersService } from '../users/users.service.js';
import type { JwtPayload } from './authenticated-user.js';
import { SignInBackoffService } from './sign-in-backoff.service.js';
import { DUMMY_HASH_PROMISE, verifyPassword } from './password.js';

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly jwt: JwtService,
    private readonly backoff: SignInBackoffService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** Signs in; refusals are said in `locale`. */
  async login(dto: LoginRequest, locale: WordLocale = 'en'): Promise<AuthResponse> {
    const say = apiWords(locale);
    await this.backoff.assertAllowed(dto.email, new Date(), locale);
    const user = await this.users.findByEmail(dto.email);
    // Verify against a dummy hash for unknown e-mails so timing does not reveal who has an account.
    const ok = await verifyPassword(dto.password, user?.passwordHash ?? (await DUMMY_HASH_PROMISE));
    const demoBlocked = user?.isDemo && this.config.isProduction;
    if (!user || !ok || demoBlocked) {
      await this.backoff.recordFailure(dto.email);
      throw new UnauthorizedException(say('auth.wrongPassword'));
    }
    await this.backoff.recordSuccess(dto.email);
    // Said only to someone who knows the password, so it tells a stranger nothing.
    if (user.disabled) throw new ForbiddenException(say('auth.switchedOff'));
    await this.users.recordSignIn(user.id);
    return this.issueToken(user.id);
  }

  /** A fresh sign-in for someone who just proved who they are another way (an accepted invitation). */
  tokenFor(userId: string): Promise<AuthResponse> {
    return this.issueToken(userId);
  }

  private async issueToken(userId: string): Promise<AuthResponse> {
    const payload: JwtPayload = { sub: userId };
    const accessToken = await this.jwt.signAsync(payload);
    return { accessToken, expiresIn: this.config.jwtExpiresInSeconds, user: await this.users.getDto(userId) };
  }
}
