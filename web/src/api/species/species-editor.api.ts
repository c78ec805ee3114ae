import type { Source, Species } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

/** The sources registry a curator cites for each fact. */
export function listSpeciesSources(signal?: AbortSignal): Promise<Source[]> {
  return httpClient.get<Source[]>('/api/species-sources', { signal, token: null });
}

/** Adds a species (curators); the API writes it and its history entry together or not at all. */
export function createSpecies(record: Species): Promise<Species> {
  return httpClient.post<Species>('/api/species', record);
}

/** Replaces the record at `slug` (curators); all or nothing, kept in the history. */
export function replaceSpecies(slug: string, record: Species): Promise<Species> {
  return httpClient.put<Species>(`/api/species/${encodeURIComponent(slug)}`, record);
}
