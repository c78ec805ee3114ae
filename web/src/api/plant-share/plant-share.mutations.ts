import type {
  AddStockRequest,
  ChangeReservationRequest,
  CheckInRequest,
  ClaimOfferRequest,
  EditShareRequest,
  OpenShareRequest,
  PickupSlotRequest,
  PlantShare,
  ReservationRequest,
  SetStockRequest,
  ShareStatus,
  WaitlistRequest,
  WalkUpRequest,
} from '@homeground/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  addSlot,
  addStock,
  cancelReservation,
  changeReservation,
  checkIn,
  claimWaitlistOffer,
  editShare,
  deleteSlot,
  editSlot,
  joinWaitlist,
  openShare,
  recordWalkUp,
  reservePlants,
  setShareStatus,
  setStock,
} from './plant-share.api.js';
import { plantShareKeys } from './plant-share.queries.js';

/** Reserves plants; what is left changes for everyone, so the share is read again (also after a 409). */
export function useReserveMutation(groupSlug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReservationRequest) => reservePlants(groupSlug, body),
    onSettled: () => queryClient.invalidateQueries({ queryKey: plantShareKeys.group(groupSlug) }),
  });
}

export function useWaitlistMutation() {
  return useMutation({
    mutationFn: ({ path, body }: { path: string; body: WaitlistRequest }) => joinWaitlist(path, body),
  });
}

/** Changes counts or slot by the private link; the answer replaces the reservation shown. */
export function useChangeReservationMutation(token: string, groupSlug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ChangeReservationRequest) => changeReservation(token, body),
    onSuccess: (r) => queryClient.setQueryData(plantShareKeys.reservation(token), r),
    onSettled: () => queryClient.invalidateQueries({ queryKey: plantShareKeys.group(groupSlug) }),
  });
}

export function useCancelReservationMutation(token: string, groupSlug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => cancelReservation(token),
    onSuccess: (r) => queryClient.setQueryData(plantShareKeys.reservation(token), r),
    onSettled: () => queryClient.invalidateQueries({ queryKey: plantShareKeys.group(groupSlug) }),
  });
}

/**
 * Every organiser write answers the whole share: it replaces the cached one (no second read), and the
 * public page, pickup lists and report that hang on it are read again.
 */
function useShareWrite<B>(groupSlug: string, write: (body: B) => Promise<PlantShare>) {
  const queryClient = useQueryClient();
  const organiserKey = plantShareKeys.organiser(groupSlug);
  return useMutation({
    mutationFn: write,
    onSuccess: (share) => {
      queryClient.setQueryData(organiserKey, share);
      void queryClient.invalidateQueries({
        queryKey: plantShareKeys.group(groupSlug),
        predicate: (q) => q.queryKey[organiserKey.length - 1] !== organiserKey[organiserKey.length - 1],
      });
    },
  });
}

export const useOpenShareMutation = (groupSlug: string) =>
  useShareWrite(groupSlug, (body: OpenShareRequest) => openShare(groupSlug, body));
export const useEditShareMutation = (groupSlug: string) =>
  useShareWrite(groupSlug, (body: EditShareRequest) => editShare(groupSlug, body));
export const useSetStockMutation = (groupSlug: string) =>
  useShareWrite(groupSlug, (body: SetStockRequest) => setStock(groupSlug, body));
export const useAddStockMutation = (groupSlug: string) =>
  useShareWrite(groupSlug, (body: AddStockRequest) => addStock(groupSlug, body));
export const useAddSlotMutation = (groupSlug: string) =>
  useShareWrite(groupSlug, (body: PickupSlotRequest) => addSlot(groupSlug, body));
export const useDeleteSlotMutation = (groupSlug: string) =>
  useShareWrite(groupSlug, (slotId: string) => deleteSlot(groupSlug, slotId));
export const useEditSlotMutation = (groupSlug: string) =>
  useShareWrite(groupSlug, ({ slotId, body }: { slotId: string; body: PickupSlotRequest }) =>
    editSlot(groupSlug, slotId, body),
  );
export const useShareStatusMutation = (groupSlug: string) =>
  useShareWrite(groupSlug, (status: ShareStatus) => setShareStatus(groupSlug, status));

/** Check-in changes the slot's list, the stock and the report. */
export function useCheckInMutation(groupSlug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ reservationId, body }: { reservationId: string; body: CheckInRequest }) =>
      checkIn(groupSlug, reservationId, body),
    onSettled: () => queryClient.invalidateQueries({ queryKey: plantShareKeys.group(groupSlug) }),
  });
}

export function useWalkUpMutation(groupSlug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: WalkUpRequest) => recordWalkUp(groupSlug, body),
    onSettled: () => queryClient.invalidateQueries({ queryKey: plantShareKeys.group(groupSlug) }),
  });
}

/** Takes a waitlist offer's plants; the offer and the share's counts are read again. */
export function useClaimOfferMutation(token: string, groupSlug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ClaimOfferRequest) => claimWaitlistOffer(token, body),
    onSettled: () => {
      void queryClient.invalidateQueries({ queryKey: plantShareKeys.offer(token) });
      void queryClient.invalidateQueries({ queryKey: plantShareKeys.group(groupSlug) });
    },
  });
}
