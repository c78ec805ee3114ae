import { type CanActivate, type ExecutionContext, ForbiddenException, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { GlobalRole } from '@homeground/shared';
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
    const user = context.switchToHttp().getRequest<{ user?: AuthenticatedUser }>().user;
    if (user && (user.role === 'admin' || roles.includes(user.role))) return true;
    throw new ForbiddenException(`This needs the ${roles.join(' or ')} role.`);
  }
}
