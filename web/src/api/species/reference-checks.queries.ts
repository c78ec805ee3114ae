import { queryOptions } from '@tanstack/react-query';
import { getRecordReference, getUnexplainedDisagreements } from './reference-checks.api.js';
import { speciesKeys } from './species.queries.js';

// Under the species keys, so saving or undoing a change refreshes the comparison too.
export const referenceKeys = {
  unexplained: () => [...speciesKeys.all, 'reference', 'unexplained'] as const,
  record: (slug: string) => [...speciesKeys.detail(slug), 'reference'] as const,
};

export function unexplainedDisagreementsQueryOptions() {
  return queryOptions({
    queryKey: referenceKeys.unexplained(),
    queryFn: ({ signal }) => getUnexplainedDisagreements(signal),
  });
}

export function recordReferenceQueryOptions(slug: string) {
  return queryOptions({
    queryKey: referenceKeys.record(slug),
    queryFn: ({ signal }) => getRecordReference(slug, signal),
  });
}
