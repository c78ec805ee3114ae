import { queryOptions } from '@tanstack/react-query';
import { getPublicShare, getReservation } from './plant-share.api.js';

/** Keys run share → its parts, so invalidating a group's share refreshes what hangs on it. */
export const plantShareKeys = {
  all: ['plant-share'] as const,
  public: (groupSlug: string) => [...plantShareKeys.all, 'public', groupSlug] as const,
  reservation: (token: string) => [...plantShareKeys.all, 'reservation', token] as const,
};

export function publicShareQueryOptions(groupSlug: string) {
  return queryOptions({
    queryKey: plantShareKeys.public(groupSlug),
    queryFn: ({ signal }) => getPublicShare(groupSlug, signal),
  });
}

export function reservationQueryOptions(token: string) {
  return queryOptions({
    queryKey: plantShareKeys.reservation(token),
    queryFn: ({ signal }) => getReservation(token, signal),
  });
}
