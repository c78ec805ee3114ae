import { queryOptions, useQuery } from '@tanstack/react-query';
import { getHealth, getSite, getStats } from './system.api.js';

export const systemKeys = {
  all: ['system'] as const,
  health: () => [...systemKeys.all, 'health'] as const,
  stats: () => [...systemKeys.all, 'stats'] as const,
  site: () => [...systemKeys.all, 'site'] as const,
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

export function siteQueryOptions() {
  return queryOptions({
    queryKey: systemKeys.site(),
    queryFn: ({ signal }) => getSite(signal),
    staleTime: Infinity,
  });
}

/**
 * The origin printed and shared links point at: the configured public address, or this page's own
 * origin only until that answer arrives (or if it cannot be had).
 */
export function usePublicOrigin(): string {
  const { data } = useQuery(siteQueryOptions());
  return data?.publicUrl ?? window.location.origin;
}
