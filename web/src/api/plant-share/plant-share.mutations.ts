import { useMutation, useQueryClient } from '@tanstack/react-query';
import { cancelReservation, changeReservation, joinWaitlist, reservePlants } from './plant-share.api.js';
import { plantShareKeys } from './plant-share.queries.js';
import type { ReservationRequest } from './plant-share.types.js';

/** Reserves plants; what is left changes for everyone, so the share is read again (also after a 409). */
export function useReserveMutation(groupSlug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReservationRequest) => reservePlants(groupSlug, body),
    onSettled: () => queryClient.invalidateQueries({ queryKey: plantShareKeys.public(groupSlug) }),
  });
}

export function useWaitlistMutation(groupSlug: string) {
  return useMutation({ mutationFn: (body: ReservationRequest) => joinWaitlist(groupSlug, body) });
}

/** Changes counts or slot by the private link; the answer replaces the reservation shown. */
export function useChangeReservationMutation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Pick<ReservationRequest, 'slotId' | 'items'>) => changeReservation(token, body),
    onSuccess: (r) => queryClient.setQueryData(plantShareKeys.reservation(token), r),
  });
}

export function useCancelReservationMutation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => cancelReservation(token),
    onSuccess: (r) => queryClient.setQueryData(plantShareKeys.reservation(token), r),
  });
}
