import type { Species, SpeciesChange } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

const historyPath = (slug: string) => `/api/species/${encodeURIComponent(slug)}/history`;

/** Every change to a species record, newest first (curators and admins). */
export function getSpeciesHistory(slug: string, signal?: AbortSignal): Promise<SpeciesChange[]> {
  return httpClient.get<SpeciesChange[]>(historyPath(slug), { signal });
}

/** Puts the record back as it was before one change; the undo is itself a change. */
export function revertSpeciesChange(slug: string, changeId: string): Promise<Species> {
  return httpClient.post<Species>(`${historyPath(slug)}/${encodeURIComponent(changeId)}/revert`, {});
}
