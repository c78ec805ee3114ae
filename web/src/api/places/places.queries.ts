import { queryOptions } from '@tanstack/react-query';
import { lookupPlace, type PlaceQuery } from './places.api.js';

export const placeKeys = {
  all: ['places'] as const,
  lookup: (query: PlaceQuery) => [...placeKeys.all, 'lookup', query] as const,
};

export function placeLookupQueryOptions(query: PlaceQuery) {
  return queryOptions({
    queryKey: placeKeys.lookup(query),
    queryFn: ({ signal }) => lookupPlace(query, signal),
    staleTime: Infinity,
    retry: false,
  });
}
