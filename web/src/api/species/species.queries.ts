import type { SpeciesQueryInput } from '@homeground/shared';
import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { getSpecies, listSpecies } from './species.api.js';

export const speciesKeys = {
  all: ['species'] as const,
  lists: () => [...speciesKeys.all, 'list'] as const,
  list: (query: SpeciesQueryInput) => [...speciesKeys.lists(), query] as const,
  details: () => [...speciesKeys.all, 'detail'] as const,
  detail: (slug: string) => [...speciesKeys.details(), slug] as const,
};

export function speciesListQueryOptions(query: SpeciesQueryInput) {
  return queryOptions({
    queryKey: speciesKeys.list(query),
    queryFn: ({ signal }) => listSpecies(query, signal),
    // Keep the last page on screen while the next filter's answer arrives.
    placeholderData: keepPreviousData,
    staleTime: 5 * 60_000,
  });
}

export function speciesDetailQueryOptions(slug: string) {
  return queryOptions({
    queryKey: speciesKeys.detail(slug),
    queryFn: ({ signal }) => getSpecies(slug, signal),
    staleTime: 5 * 60_000,
  });
}
