import { queryOptions } from '@tanstack/react-query';
import { getBatches, getGrowers, getProgress } from './batches.api.js';

/** Keys run group → batches → growers / progress, so invalidating a group's batches refreshes all three. */
export const batchKeys = {
  all: ['batches'] as const,
  season: (slug: string) => [...batchKeys.all, slug] as const,
  list: (slug: string) => [...batchKeys.season(slug), 'list'] as const,
  growers: (slug: string) => [...batchKeys.season(slug), 'growers'] as const,
  progress: (slug: string) => [...batchKeys.season(slug), 'progress'] as const,
};

export function batchesQueryOptions(slug: string) {
  return queryOptions({ queryKey: batchKeys.list(slug), queryFn: ({ signal }) => getBatches(slug, signal) });
}

export function growersQueryOptions(slug: string) {
  return queryOptions({ queryKey: batchKeys.growers(slug), queryFn: ({ signal }) => getGrowers(slug, signal) });
}

export function progressQueryOptions(slug: string) {
  return queryOptions({ queryKey: batchKeys.progress(slug), queryFn: ({ signal }) => getProgress(slug, signal) });
}
