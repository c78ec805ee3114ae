import { queryOptions } from '@tanstack/react-query';
import { getGroup, listGroups, listInvitations, listMembers } from './groups.api.js';

export const groupKeys = {
  all: ['groups'] as const,
  list: () => [...groupKeys.all, 'list'] as const,
  detail: (slug: string) => [...groupKeys.all, 'detail', slug] as const,
  members: (slug: string) => [...groupKeys.detail(slug), 'members'] as const,
  invitations: (slug: string) => [...groupKeys.detail(slug), 'invitations'] as const,
};

export function groupsQueryOptions() {
  return queryOptions({
    queryKey: groupKeys.list(),
    queryFn: ({ signal }) => listGroups(signal),
    staleTime: 5 * 60_000,
  });
}

export function groupQueryOptions(slug: string) {
  return queryOptions({ queryKey: groupKeys.detail(slug), queryFn: ({ signal }) => getGroup(slug, signal) });
}

export function membersQueryOptions(slug: string) {
  return queryOptions({ queryKey: groupKeys.members(slug), queryFn: ({ signal }) => listMembers(slug, signal) });
}

export function invitationsQueryOptions(slug: string) {
  return queryOptions({
    queryKey: groupKeys.invitations(slug),
    queryFn: ({ signal }) => listInvitations(slug, signal),
  });
}
