import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { UsersService } from '../users/users.service.js';
import type { AuthenticatedUser, JwtPayload } from './authenticated-user.js';

/** Validates `Authorization: Bearer <jwt>` and reloads the user, so role changes and deletions apply at once. */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(
    private readonly users: UsersService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    jwt: JwtService,
  ) {
    const previous = config.jwtPreviousSecret;
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      ignoreExpiration: false,
      algorithms: ['HS256'],
      // During a rotation a token signed with the previous secret is still verified (with it); every new
      // token is signed with the current one, so the previous secret can go once the old tokens expire.
      secretOrKeyProvider: (_req: unknown, raw: string, done: (err: unknown, key?: string) => void) => {
        if (!previous) return done(null, config.jwtSecret);
        try {
          jwt.verify(raw, { secret: config.jwtSecret, algorithms: ['HS256'], ignoreExpiration: true });
          done(null, config.jwtSecret);
        } catch {
          done(null, previous);
        }
      },
    });
  }

  async validate(payload: JwtPayload): Promise<AuthenticatedUser | null> {
    const user = await this.users.findById(payload.sub);
    // A switched-off account's tokens stop working on the next request, not when they expire.
    if (!user || user.disabled || (user.isDemo && this.config.isProduction)) return null;
    return { id: user.id, email: user.email, role: user.role };
  }
}
