import { queryOptions } from '@tanstack/react-query';
import { getHealth, getStats } from './system.api.js';

export const systemKeys = {
  all: ['system'] as const,
  health: () => [...systemKeys.all, 'health'] as const,
  stats: () => [...systemKeys.all, 'stats'] as const,
};

export function healthQueryOptions() {
  return queryOptions({
    queryKey: systemKeys.health(),
    queryFn: ({ signal }) => getHealth(signal),
    staleTime: 60_000,
  });
}

export function statsQueryOptions() {
  return queryOptions({
    queryKey: systemKeys.stats(),
    queryFn: ({ signal }) => getStats(signal),
    staleTime: 60_000,
  });
}
