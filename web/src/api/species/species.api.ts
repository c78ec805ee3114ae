import type { SpeciesDetail, SpeciesPage, SpeciesQueryInput } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

export type { SpeciesDetail };

/** Query string for the list: only the filters that are set, in a stable order. */
export function speciesSearchParams(query: SpeciesQueryInput): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query).sort(([a], [b]) => a.localeCompare(b))) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  return params.toString();
}

export function listSpecies(query: SpeciesQueryInput, signal?: AbortSignal): Promise<SpeciesPage> {
  const qs = speciesSearchParams(query);
  return httpClient.get<SpeciesPage>(`/api/species${qs ? `?${qs}` : ''}`, { signal, token: null });
}

export function getSpecies(slug: string, signal?: AbortSignal): Promise<SpeciesDetail> {
  return httpClient.get<SpeciesDetail>(`/api/species/${encodeURIComponent(slug)}`, { signal, token: null });
}

/** URL of a species photo, resized server-side to one of 160, 400 or 800 px wide. */
export function speciesPhotoUrl(slug: string, width: 160 | 400 | 800 = 400): string {
  return `/api/species/${encodeURIComponent(slug)}/photo?w=${width}`;
}

export const SPECIES_EXPORT_URL = '/api/species/export.csv';
