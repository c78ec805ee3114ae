import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { getSpeciesHistory, revertSpeciesChange } from './species-history.api.js';
import { speciesKeys } from './species.queries.js';

export const speciesHistoryKey = (slug: string) => [...speciesKeys.detail(slug), 'history'] as const;

export function speciesHistoryQueryOptions(slug: string) {
  return queryOptions({ queryKey: speciesHistoryKey(slug), queryFn: ({ signal }) => getSpeciesHistory(slug, signal) });
}

/** Undoes a change; the record, its history and every cached list refresh. */
export function useRevertChangeMutation(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changeId: string) => revertSpeciesChange(slug, changeId),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: speciesKeys.all }),
  });
}
