import type { Ecoregion, EcoregionOutline } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

/** EPA Level III ecoregions, optionally only those reaching into one state. */
export function listEcoregions(state?: string, signal?: AbortSignal): Promise<Ecoregion[]> {
  return httpClient.get<Ecoregion[]>(`/api/ecoregions${state ? `?state=${encodeURIComponent(state)}` : ''}`, {
    signal,
    token: null,
  });
}

export function getEcoregion(code: string, signal?: AbortSignal): Promise<Ecoregion> {
  return httpClient.get<Ecoregion>(`/api/ecoregions/${encodeURIComponent(code)}`, { signal, token: null });
}

/** The region's EPA outline for the map (null until an admin has imported the boundaries). */
export function getEcoregionOutline(code: string, signal?: AbortSignal): Promise<EcoregionOutline> {
  return httpClient.get<EcoregionOutline>(`/api/ecoregions/${encodeURIComponent(code)}/outline`, {
    signal,
    token: null,
  });
}
