import { SetMetadata } from '@nestjs/common';
import type { GlobalRole } from '@homeground/shared';

export const ROLES_KEY = 'homeground:roles';

/** Global roles allowed on a route. Admins pass every role check. */
export const Roles = (...roles: GlobalRole[]) => SetMetadata(ROLES_KEY, roles);
