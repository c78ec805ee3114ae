import type { GlobalRole } from '@homeground/shared';

/** What the JWT guard puts on `request.user`. */
export interface AuthenticatedUser {
  id: string;
  email: string;
  role: GlobalRole;
}

/** The JWT payload: the user id only; role and name are read fresh from the database. */
export interface JwtPayload {
  sub: string;
}
