import { queryOptions } from '@tanstack/react-query';
import { withSavedCopy } from '../../lib/offline/saved-answers.js';
import { getBatches, getGrowers, getProgress } from './batches.api.js';

/** Keys run group → batches → growers / progress, so invalidating a group's batches refreshes all three. */
export const batchKeys = {
  all: ['batches'] as const,
  season: (slug: string) => [...batchKeys.all, slug] as const,
  list: (slug: string) => [...batchKeys.season(slug), 'list'] as const,
  /** One grower's own view, kept on the device under their id (never read by another person). */
  mine: (slug: string, userId: string) => [...batchKeys.season(slug), 'mine', userId] as const,
  growers: (slug: string) => [...batchKeys.season(slug), 'growers'] as const,
  progress: (slug: string) => [...batchKeys.season(slug), 'progress'] as const,
};

export function batchesQueryOptions(slug: string) {
  return queryOptions({ queryKey: batchKeys.list(slug), queryFn: ({ signal }) => getBatches(slug, signal) });
}

/**
 * The grower's own batches for My batches, with a copy kept on the device: with no signal the page
 * shows the last answer and when it was taken (`savedAt`), never another person's.
 */
export function myBatchesQueryOptions(slug: string, userId: string) {
  return queryOptions({
    queryKey: batchKeys.mine(slug, userId),
    queryFn: ({ signal }) => withSavedCopy(userId, `batches:${slug}`, () => getBatches(slug, signal)),
    // Ask even when the browser says it is offline, so the kept copy answers instead of waiting.
    networkMode: 'offlineFirst',
  });
}

export function growersQueryOptions(slug: string) {
  return queryOptions({ queryKey: batchKeys.growers(slug), queryFn: ({ signal }) => getGrowers(slug, signal) });
}

export function progressQueryOptions(slug: string) {
  return queryOptions({ queryKey: batchKeys.progress(slug), queryFn: ({ signal }) => getProgress(slug, signal) });
}
