import { httpClient } from '../../lib/http-client.js';
import type { FitResult, PublicShare, Reservation, ReservationRequest } from './plant-share.types.js';

const publicPath = (groupSlug: string) => `/api/plant-shares/${encodeURIComponent(groupSlug)}`;
const reservationPath = (token: string) => `/api/reservations/${encodeURIComponent(token)}`;

/** The group's plant share as anyone sees it: species on offer with how many are left, and the slots. */
export function getPublicShare(groupSlug: string, signal?: AbortSignal): Promise<PublicShare> {
  return httpClient.get<PublicShare>(publicPath(groupSlug), { signal, token: null });
}

/** The species on offer ranked by the engine's fit for the taker's spot, with why. */
export function getShareFit(
  groupSlug: string,
  answer: { sun: string; moisture: string } | { zip: string },
  signal?: AbortSignal,
): Promise<FitResult> {
  return httpClient.post<FitResult>(`${publicPath(groupSlug)}/fit`, answer, { signal, token: null });
}

/** Takes plants in one go; a 409 says some ran out (nothing is held then). */
export function reservePlants(groupSlug: string, body: ReservationRequest): Promise<Reservation> {
  return httpClient.post<Reservation>(`${publicPath(groupSlug)}/reservations`, body, { token: null });
}

/** Puts the taker on the waitlist for the species that ran out. */
export function joinWaitlist(groupSlug: string, body: ReservationRequest): Promise<unknown> {
  return httpClient.post(`${publicPath(groupSlug)}/waitlist`, body, { token: null });
}

/** A reservation opened by the private link from its e-mail. */
export function getReservation(token: string, signal?: AbortSignal): Promise<Reservation> {
  return httpClient.get<Reservation>(reservationPath(token), { signal, token: null });
}

/** Changes the counts or the slot by the private link. */
export function changeReservation(
  token: string,
  body: Pick<ReservationRequest, 'slotId' | 'items'>,
): Promise<Reservation> {
  return httpClient.put<Reservation>(reservationPath(token), body, { token: null });
}

/** Cancels by the private link; the plants go back to the share. */
export function cancelReservation(token: string): Promise<Reservation> {
  return httpClient.delete<Reservation>(reservationPath(token), { token: null });
}
