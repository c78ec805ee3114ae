import type {
  AddStockRequest,
  ChangeReservationRequest,
  ClaimOfferRequest,
  CheckInRequest,
  CheckInResult,
  EditShareRequest,
  Moisture,
  OpenShareRequest,
  PickupList,
  PickupSlotRequest,
  PlantShare,
  PublicPlantShare,
  ReservationCreated,
  ReservationRequest,
  SetStockRequest,
  ShareReport,
  ShareStatus,
  ShareWaitlist,
  Sun,
  TakerReservation,
  WaitlistJoined,
  WaitlistOfferView,
  WaitlistRequest,
  WalkUpGift,
  WalkUpRequest,
} from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

/**
 * The taker's spot for "fits my yard": their sun and moisture (with their ZIP, to rank for where they
 * live), or a saved mix's link id (its own site and place); null shows the list in the share's order.
 */
export type Yard = { sun: Sun; moisture: Moisture; zip?: string } | { mix: string } | null;

const enc = encodeURIComponent;
const publicPath = (groupSlug: string) => `/api/plant-shares/${enc(groupSlug)}`;
const sharePath = (groupSlug: string) => `/api/groups/${enc(groupSlug)}/plant-share`;
const reservationPath = (token: string) => `/api/reservations/${enc(token)}`;

// ---- takers (no sign-in) ----

/** A group's plant share as anyone sees it, ranked for the taker's yard when one is given. */
export function getPublicShare(groupSlug: string, yard: Yard, signal?: AbortSignal): Promise<PublicPlantShare> {
  const query = yard ? `?${new URLSearchParams(yard)}` : '';
  return httpClient.get<PublicPlantShare>(`${publicPath(groupSlug)}${query}`, { signal, token: null });
}

/** Takes plants in one transaction; a 409 says some ran out and carries the waitlist offer. */
export function reservePlants(groupSlug: string, body: ReservationRequest): Promise<ReservationCreated> {
  return httpClient.post<ReservationCreated>(`${publicPath(groupSlug)}/reservations`, body, { token: null });
}

/** Joins the waitlist at the path the 409's offer named. */
export function joinWaitlist(path: string, body: WaitlistRequest): Promise<WaitlistJoined> {
  return httpClient.post<WaitlistJoined>(path, body, { token: null });
}

/** A reservation opened by the private link from its e-mail. */
export function getReservation(token: string, signal?: AbortSignal): Promise<TakerReservation> {
  return httpClient.get<TakerReservation>(reservationPath(token), { signal, token: null });
}

export function changeReservation(token: string, body: ChangeReservationRequest): Promise<TakerReservation> {
  return httpClient.put<TakerReservation>(reservationPath(token), body, { token: null });
}

/** Cancels by the private link; the plants go to the waitlist or back to the share. */
export function cancelReservation(token: string): Promise<TakerReservation> {
  return httpClient.delete<TakerReservation>(reservationPath(token), { token: null });
}

/** The plants a waitlist offer holds for a household, opened by the link in its e-mail. */
export function getWaitlistOffer(token: string, signal?: AbortSignal): Promise<WaitlistOfferView> {
  return httpClient.get<WaitlistOfferView>(`/api/waitlist-offers/${enc(token)}`, { signal, token: null });
}

/** Takes the held plants with a pickup slot (ignored when they join the household's reservation). */
export function claimWaitlistOffer(token: string, body: ClaimOfferRequest): Promise<ReservationCreated> {
  return httpClient.post<ReservationCreated>(`/api/waitlist-offers/${enc(token)}/claim`, body, { token: null });
}

// ---- organisers ----

/** The group's plant share with stock and households (organisers); 404 before one is opened. */
export function getShare(groupSlug: string, signal?: AbortSignal): Promise<PlantShare> {
  return httpClient.get<PlantShare>(sharePath(groupSlug), { signal });
}

export function openShare(groupSlug: string, body: OpenShareRequest): Promise<PlantShare> {
  return httpClient.post<PlantShare>(sharePath(groupSlug), body);
}

export function editShare(groupSlug: string, body: EditShareRequest): Promise<PlantShare> {
  return httpClient.request<PlantShare>(sharePath(groupSlug), { method: 'PATCH', body });
}

export function setStock(groupSlug: string, body: SetStockRequest): Promise<PlantShare> {
  return httpClient.put<PlantShare>(`${sharePath(groupSlug)}/stock`, body);
}

export function addStock(groupSlug: string, body: AddStockRequest): Promise<PlantShare> {
  return httpClient.post<PlantShare>(`${sharePath(groupSlug)}/stock/add`, body);
}

/** Adds a pickup slot on the share's day. */
export function addSlot(groupSlug: string, body: PickupSlotRequest): Promise<PlantShare> {
  return httpClient.post<PlantShare>(`${sharePath(groupSlug)}/slots`, body);
}

/** Changes a slot's times or households (never below those booked: the API answers 400). */
export function editSlot(groupSlug: string, slotId: string, body: PickupSlotRequest): Promise<PlantShare> {
  return httpClient.put<PlantShare>(`${sharePath(groupSlug)}/slots/${enc(slotId)}`, body);
}

/** Deletes a pickup slot nobody has reserved in (a slot with reservations answers 409 saying so). */
export function deleteSlot(groupSlug: string, slotId: string): Promise<PlantShare> {
  return httpClient.delete<PlantShare>(`${sharePath(groupSlug)}/slots/${enc(slotId)}`);
}

/** The waitlist per species with names and e-mails (organisers only). */
export function getShareWaitlist(groupSlug: string, signal?: AbortSignal): Promise<ShareWaitlist> {
  return httpClient.get<ShareWaitlist>(`${sharePath(groupSlug)}/waitlist`, { signal });
}

export function setShareStatus(groupSlug: string, status: ShareStatus): Promise<PlantShare> {
  return httpClient.put<PlantShare>(`${sharePath(groupSlug)}/status`, { status });
}

/** One slot's households with names and e-mails (organisers only). */
export function getPickupList(groupSlug: string, slotId: string, signal?: AbortSignal): Promise<PickupList> {
  return httpClient.get<PickupList>(`${sharePath(groupSlug)}/slots/${enc(slotId)}/pickup-list`, { signal });
}

export function checkIn(groupSlug: string, reservationId: string, body: CheckInRequest): Promise<CheckInResult> {
  return httpClient.post<CheckInResult>(`${sharePath(groupSlug)}/reservations/${enc(reservationId)}/check-in`, body);
}

export function recordWalkUp(groupSlug: string, body: WalkUpRequest): Promise<WalkUpGift> {
  return httpClient.post<WalkUpGift>(`${sharePath(groupSlug)}/walk-ups`, body);
}

/** The season report: counts only. */
export function getShareReport(groupSlug: string, signal?: AbortSignal): Promise<ShareReport> {
  return httpClient.get<ShareReport>(`${sharePath(groupSlug)}/report`, { signal });
}

export function downloadShareReportCsv(groupSlug: string): Promise<Blob> {
  return httpClient.file(`${sharePath(groupSlug)}/report.csv`);
}
