import type { AlternativesRequest, PaletteRequest, RecommendRequest } from '@homeground/shared';
import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import {
  balanceMix,
  buildCalendar,
  type CalendarRequest,
  findAlternatives,
  getRecommendations,
  getSavedMix,
  listMyMixes,
} from './mixes.api.js';

/** Keys run general to specific; each holds the whole request body, because the answer depends on all of it. */
export const mixKeys = {
  all: ['mixes'] as const,
  recommendations: (body: RecommendRequest) => [...mixKeys.all, 'recommendations', body] as const,
  balance: (body: PaletteRequest) => [...mixKeys.all, 'balance', body] as const,
  alternatives: (body: AlternativesRequest) => [...mixKeys.all, 'alternatives', body] as const,
  saved: () => [...mixKeys.all, 'saved'] as const,
  savedDetail: (id: string) => [...mixKeys.saved(), 'detail', id] as const,
  mine: () => [...mixKeys.saved(), 'mine'] as const,
  calendar: (body: CalendarRequest) => [...mixKeys.all, 'calendar', body] as const,
};

export function recommendationsQueryOptions(body: RecommendRequest) {
  return queryOptions({
    queryKey: mixKeys.recommendations(body),
    queryFn: ({ signal }) => getRecommendations(body, signal),
    staleTime: 10 * 60_000,
  });
}

export function balanceQueryOptions(body: PaletteRequest) {
  return queryOptions({
    queryKey: mixKeys.balance(body),
    queryFn: ({ signal }) => balanceMix(body, signal),
    // Keep the last mix on screen while a swap or rebalance is worked out, instead of blanking it.
    placeholderData: keepPreviousData,
    staleTime: 10 * 60_000,
    retry: false,
  });
}

export function alternativesQueryOptions(body: AlternativesRequest) {
  return queryOptions({
    queryKey: mixKeys.alternatives(body),
    queryFn: ({ signal }) => findAlternatives(body, signal),
    staleTime: 10 * 60_000,
    retry: false,
  });
}

export function savedMixQueryOptions(id: string) {
  return queryOptions({
    queryKey: mixKeys.savedDetail(id),
    queryFn: ({ signal }) => getSavedMix(id, signal),
    staleTime: Infinity,
    retry: false,
  });
}

export function myMixesQueryOptions() {
  return queryOptions({ queryKey: mixKeys.mine(), queryFn: ({ signal }) => listMyMixes(signal) });
}

export function calendarQueryOptions(body: CalendarRequest) {
  return queryOptions({ queryKey: mixKeys.calendar(body), queryFn: ({ signal }) => buildCalendar(body, signal) });
}
