import { queryOptions } from '@tanstack/react-query';
import { getSeason, getSeedList } from './seasons.api.js';

/** Keys run group → season → seed list, so invalidating a season refreshes its seed list too. */
export const seasonKeys = {
  all: ['seasons'] as const,
  detail: (slug: string) => [...seasonKeys.all, 'detail', slug] as const,
  seedList: (slug: string) => [...seasonKeys.detail(slug), 'seed-list'] as const,
};

export function seasonQueryOptions(slug: string) {
  return queryOptions({ queryKey: seasonKeys.detail(slug), queryFn: ({ signal }) => getSeason(slug, signal) });
}

export function seedListQueryOptions(slug: string) {
  return queryOptions({ queryKey: seasonKeys.seedList(slug), queryFn: ({ signal }) => getSeedList(slug, signal) });
}
