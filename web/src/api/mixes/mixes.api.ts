import type {
  AlternativesRequest,
  AlternativesResponse,
  CalendarResponse,
  MixResponse,
  PaletteRequest,
  RecommendationsResponse,
  RecommendRequest,
  SavedMix,
  SaveMixRequest,
  SowingCalendarRequest,
} from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

/** Body of `POST /api/calendar` (and its .ics / .csv twins); dates are ISO `YYYY-MM-DD`. */
export type CalendarRequest = SowingCalendarRequest;

/** Every species native to the state scored for the site, best first, with near misses. */
export function getRecommendations(body: RecommendRequest, signal?: AbortSignal): Promise<RecommendationsResponse> {
  return httpClient.post<RecommendationsResponse>('/api/recommendations', body, { signal, token: null });
}

/** A balanced mix for the site with quantities and the design rules met or missed. */
export function balanceMix(body: PaletteRequest, signal?: AbortSignal): Promise<MixResponse> {
  return httpClient.post<MixResponse>('/api/mixes/balance', body, { signal, token: null });
}

/** The best replacements for one species (`slot`) of a mix. */
export function findAlternatives(body: AlternativesRequest, signal?: AbortSignal): Promise<AlternativesResponse> {
  return httpClient.post<AlternativesResponse>('/api/mixes/alternatives', body, { signal, token: null });
}

/** Saves a mix for the signed-in person; anyone with its id can open it. */
export function saveMix(body: SaveMixRequest): Promise<SavedMix> {
  return httpClient.post<SavedMix>('/api/mixes', body);
}

export function getSavedMix(id: string, signal?: AbortSignal): Promise<SavedMix> {
  return httpClient.get<SavedMix>(`/api/mixes/${encodeURIComponent(id)}`, { signal, token: null });
}

/** The signed-in person's saved mixes. */
export function listMyMixes(signal?: AbortSignal): Promise<SavedMix[]> {
  return httpClient.get<SavedMix[]>('/api/mixes', { signal });
}

export function buildCalendar(body: CalendarRequest, signal?: AbortSignal): Promise<CalendarResponse> {
  return httpClient.post<CalendarResponse>('/api/calendar', body, { signal, token: null });
}
