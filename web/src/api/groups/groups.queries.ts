import { queryOptions } from '@tanstack/react-query';
import { listGroups } from './groups.api.js';

export const groupKeys = {
  all: ['groups'] as const,
  list: () => [...groupKeys.all, 'list'] as const,
};

export function groupsQueryOptions() {
  return queryOptions({
    queryKey: groupKeys.list(),
    queryFn: ({ signal }) => listGroups(signal),
    staleTime: 5 * 60_000,
  });
}
