import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import {
  getPickupList,
  getPublicShare,
  getReservation,
  getShare,
  getShareReport,
  getShareWaitlist,
  getWaitlistOffer,
  type Yard,
} from './plant-share.api.js';

/**
 * Keys run group → share → its parts, so invalidating a group's share refreshes the public page, the
 * pickup lists and the report together (a reservation changes all of them).
 */
export const plantShareKeys = {
  all: ['plant-share'] as const,
  group: (groupSlug: string) => [...plantShareKeys.all, 'group', groupSlug] as const,
  public: (groupSlug: string, yard: Yard) => [...plantShareKeys.group(groupSlug), 'public', yard] as const,
  organiser: (groupSlug: string) => [...plantShareKeys.group(groupSlug), 'organiser'] as const,
  pickupList: (groupSlug: string, slotId: string) => [...plantShareKeys.group(groupSlug), 'pickup', slotId] as const,
  report: (groupSlug: string) => [...plantShareKeys.group(groupSlug), 'report'] as const,
  waitlist: (groupSlug: string) => [...plantShareKeys.group(groupSlug), 'waitlist'] as const,
  reservation: (token: string) => [...plantShareKeys.all, 'reservation', token] as const,
  offer: (token: string) => [...plantShareKeys.all, 'offer', token] as const,
};

export function waitlistOfferQueryOptions(token: string) {
  return queryOptions({
    queryKey: plantShareKeys.offer(token),
    queryFn: ({ signal }) => getWaitlistOffer(token, signal),
  });
}

export function publicShareQueryOptions(groupSlug: string, yard: Yard = null) {
  return queryOptions({
    queryKey: plantShareKeys.public(groupSlug, yard),
    queryFn: ({ signal }) => getPublicShare(groupSlug, yard, signal),
    // A new yard answer keeps the list on screen while the ranked one arrives.
    placeholderData: keepPreviousData,
  });
}

export function shareQueryOptions(groupSlug: string) {
  return queryOptions({
    queryKey: plantShareKeys.organiser(groupSlug),
    queryFn: ({ signal }) => getShare(groupSlug, signal),
  });
}

export function pickupListQueryOptions(groupSlug: string, slotId: string) {
  return queryOptions({
    queryKey: plantShareKeys.pickupList(groupSlug, slotId),
    queryFn: ({ signal }) => getPickupList(groupSlug, slotId, signal),
  });
}

export function shareReportQueryOptions(groupSlug: string) {
  return queryOptions({
    queryKey: plantShareKeys.report(groupSlug),
    queryFn: ({ signal }) => getShareReport(groupSlug, signal),
  });
}

export function reservationQueryOptions(token: string) {
  return queryOptions({
    queryKey: plantShareKeys.reservation(token),
    queryFn: ({ signal }) => getReservation(token, signal),
  });
}

/** The organiser's view of the waitlist per species; read again with the rest of the group's share. */
export function shareWaitlistQueryOptions(groupSlug: string) {
  return queryOptions({
    queryKey: plantShareKeys.waitlist(groupSlug),
    queryFn: ({ signal }) => getShareWaitlist(groupSlug, signal),
  });
}
