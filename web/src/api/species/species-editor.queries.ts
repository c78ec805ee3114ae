import type { Species } from '@homeground/shared';
import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { createSpecies, listSpeciesSources, replaceSpecies } from './species-editor.api.js';
import { speciesKeys } from './species.queries.js';

export const speciesSourcesKey = ['species-sources'] as const;

export function speciesSourcesQueryOptions() {
  return queryOptions({
    queryKey: speciesSourcesKey,
    queryFn: ({ signal }) => listSpeciesSources(signal),
    staleTime: 60 * 60_000,
  });
}

/** Saves a new record (no `slug`) or an edit; every species list, page and history refreshes. */
export function useSaveSpeciesMutation(slug: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (record: Species) => (slug ? replaceSpecies(slug, record) : createSpecies(record)),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: speciesKeys.all }),
  });
}
