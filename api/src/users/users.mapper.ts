import type { GlobalRole, PersonAccount, User as UserDto } from '@homeground/shared';
import type { User } from './user.entity.js';

/** What sign-in needs of an account; it holds the password hash, so it never leaves the API. */
export interface UserCredentials {
  id: string;
  email: string;
  role: GlobalRole;
  isDemo: boolean;
  passwordHash: string;
  /** Switched off by an admin: no sign-in, and its tokens are refused. */
  disabled: boolean;
}

/** Entity → the plain credentials the auth module checks (other modules never see the entity). */
export function toUserCredentials(user: User): UserCredentials {
  return {
    id: user.id,
    email: user.email,
    role: user.role,
    isDemo: user.isDemo,
    passwordHash: user.passwordHash,
    disabled: user.disabledAt !== null,
  };
}

/** Entity → the shared `User` shape; memberships must be loaded with their groups. */
export function toUserDto(user: User): UserDto {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    groups: (user.memberships ?? []).map((m) => ({
      groupId: m.groupId,
      groupSlug: m.group.slug,
      groupName: m.group.name,
      role: m.role,
    })),
    createdAt: user.createdAt.toISOString(),
  };
}

/** Entity → the admin's view of an account; `signInHeld` comes from the sign-in back-off. */
export function toPersonAccount(user: User, signInHeld: boolean): PersonAccount {
  return {
    ...toUserDto(user),
    disabledAt: user.disabledAt?.toISOString() ?? null,
    lastSignInAt: user.lastSignInAt?.toISOString() ?? null,
    signInHeld,
  };
}
