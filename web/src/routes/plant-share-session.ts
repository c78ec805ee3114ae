import type { User } from '@homeground/shared';

/**
 * The group whose plant share this person runs: the first they organise. Admins run none of their
 * own here (the API lets them act for any group, but the page needs a group to show).
 */
export function organisedGroup(user: User | null | undefined): { slug: string; name: string } | null {
  const membership = user?.groups.find((g) => g.role === 'organiser');
  return membership ? { slug: membership.groupSlug, name: membership.groupName } : null;
}
