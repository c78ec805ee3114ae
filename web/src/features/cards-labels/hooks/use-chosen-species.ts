import { useQueries } from '@tanstack/react-query';
import { type SpeciesDetail } from '../../../api/species/species.api.js';
import { speciesDetailQueryOptions } from '../../../api/species/species.queries.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';

export type ChosenEntry =
  | { slug: string; status: 'loading' }
  | { slug: string; status: 'ready'; species: SpeciesDetail }
  | { slug: string; status: 'missing' }
  | { slug: string; status: 'error'; message: string; retry: () => void };

export interface ChosenSpecies {
  entries: ChosenEntry[];
  /** Full records ready to print, in the order they were chosen. */
  ready: SpeciesDetail[];
  isLoading: boolean;
}

/** The full record of every chosen species (cards need germination and caution words). */
export function useChosenSpecies(slugs: readonly string[]): ChosenSpecies {
  const results = useQueries({ queries: slugs.map((slug) => speciesDetailQueryOptions(slug)) });
  const entries: ChosenEntry[] = slugs.map((slug, i) => {
    const result = results[i];
    if (result.data) return { slug, status: 'ready', species: result.data };
    if (result.error) {
      if (isApiRequestError(result.error) && result.error.statusCode === 404) return { slug, status: 'missing' };
      return { slug, status: 'error', message: result.error.message, retry: () => void result.refetch() };
    }
    return { slug, status: 'loading' };
  });
  return {
    entries,
    ready: entries.flatMap((e) => (e.status === 'ready' ? [e.species] : [])),
    isLoading: entries.some((e) => e.status === 'loading'),
  };
}
