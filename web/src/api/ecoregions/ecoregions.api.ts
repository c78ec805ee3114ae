import type { Ecoregion } from '@homeground/shared';
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
