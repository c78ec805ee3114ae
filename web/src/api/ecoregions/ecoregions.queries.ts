import { queryOptions } from '@tanstack/react-query';
import { getEcoregion, getEcoregionOutline, listEcoregions } from './ecoregions.api.js';

export const ecoregionKeys = {
  all: ['ecoregions'] as const,
  list: (state?: string) => [...ecoregionKeys.all, 'list', state ?? 'all'] as const,
  detail: (code: string) => [...ecoregionKeys.all, 'detail', code] as const,
  outline: (code: string) => [...ecoregionKeys.all, 'outline', code] as const,
};

export function ecoregionListQueryOptions(state?: string) {
  return queryOptions({
    queryKey: ecoregionKeys.list(state),
    queryFn: ({ signal }) => listEcoregions(state, signal),
    staleTime: Infinity,
  });
}

export function ecoregionQueryOptions(code: string) {
  return queryOptions({
    queryKey: ecoregionKeys.detail(code),
    queryFn: ({ signal }) => getEcoregion(code, signal),
    staleTime: Infinity,
  });
}

export function ecoregionOutlineQueryOptions(code: string) {
  return queryOptions({
    queryKey: ecoregionKeys.outline(code),
    queryFn: ({ signal }) => getEcoregionOutline(code, signal),
    staleTime: 10 * 60_000,
  });
}
