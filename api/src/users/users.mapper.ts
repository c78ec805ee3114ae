import type { User as UserDto } from '@homeground/shared';
import type { User } from './user.entity.js';

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
