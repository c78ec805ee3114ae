import { type CanActivate, type ExecutionContext, ForbiddenException, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { type GlobalRole, type WordLocale, wordsFor } from '@homeground/shared';
import { apiWords } from '../i18n/api-i18n.js';
import { negotiateLocale } from '../i18n/negotiate-locale.js';
import type { AuthenticatedUser } from '../../auth/authenticated-user.js';
import { ROLES_KEY } from '../decorators/roles.decorator.js';

/** Checks `@Roles()` after the JWT guard has put the user on the request. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const roles = this.reflector.getAllAndOverride<GlobalRole[] | undefined>(ROLES_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!roles || roles.length === 0) return true;
    const request = context
      .switchToHttp()
      .getRequest<{ user?: AuthenticatedUser; headers: Record<string, string | string[] | undefined> }>();
    const user = request.user;
    if (user && (user.role === 'admin' || roles.includes(user.role))) return true;
    throw new ForbiddenException(needsRole(roles, negotiateLocale(request.headers['accept-language'])));
  }
}

/** "This needs the curator role." in the reader's language: English keeps the role codes, others their titles. */
function needsRole(roles: readonly GlobalRole[], locale: WordLocale): string {
  const say = apiWords(locale);
  const names = locale === 'en' ? roles : roles.map((r) => wordsFor(locale).globalRole[r].title);
  return say('refusals.roles.needs', { roles: names.join(say('refusals.roles.or')) });
}
