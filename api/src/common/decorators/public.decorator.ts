import { SetMetadata } from '@nestjs/common';

export const PUBLIC_KEY = 'homeground:public';

/**
 * Anyone may call this route (or every route of this controller) without signing in. Every route makes
 * an explicit access decision, `@Public()` or `@Auth(…)`: the role-matrix test fails on a route with
 * neither, so a new route cannot be left open by forgetting a guard.
 */
export const Public = () => SetMetadata(PUBLIC_KEY, true);
