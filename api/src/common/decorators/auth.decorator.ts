import { applyDecorators, UseGuards } from '@nestjs/common';
import { ApiBearerAuth, ApiForbiddenResponse, ApiUnauthorizedResponse } from '@nestjs/swagger';
import type { GlobalRole } from '@homeground/shared';
import { JwtAuthGuard } from '../guards/jwt-auth.guard.js';
import { RolesGuard } from '../guards/roles.guard.js';
import { Roles } from './roles.decorator.js';

/** Signed-in only, optionally limited to global roles: `@Auth()`, `@Auth('admin')`. */
export function Auth(...roles: GlobalRole[]) {
  return applyDecorators(
    Roles(...roles),
    UseGuards(JwtAuthGuard, RolesGuard),
    ApiBearerAuth(),
    ApiUnauthorizedResponse({ description: 'No valid bearer token' }),
    ...(roles.length ? [ApiForbiddenResponse({ description: `Needs role ${roles.join(' or ')}` })] : []),
  );
}
