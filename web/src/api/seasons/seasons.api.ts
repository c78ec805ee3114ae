import type { Season, SeasonRequest, SeedList, ShareList, ShareListRequest, TargetsRequest } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

/** The seed list as the API answers it: the shared seed list for the group's latest season. */
export type SeasonSeedList = SeedList & { groupSlug: string; year: number };

const seasonPath = (slug: string) => `/api/groups/${encodeURIComponent(slug)}/season`;

/** The group's season plan (members, growers and organisers of the group). */
export function getSeason(slug: string, signal?: AbortSignal): Promise<Season> {
  return httpClient.get<Season>(seasonPath(slug), { signal });
}

/** Sets the season's dates and seed-list settings (organisers). */
export function putSeason(slug: string, body: SeasonRequest): Promise<Season> {
  return httpClient.put<Season>(seasonPath(slug), body);
}

/** Proposes species for the share list with why; the API writes nothing. */
export function proposeShareList(slug: string, body: ShareListRequest): Promise<ShareList> {
  return httpClient.post<ShareList>(`${seasonPath(slug)}/share-list/propose`, body);
}

/** Replaces the whole target list (organisers); answers the season as saved. */
export function putTargets(slug: string, body: TargetsRequest): Promise<Season> {
  return httpClient.put<Season>(`${seasonPath(slug)}/targets`, body);
}

/** Seeds to sow, weight and packets per target, with the collecting cautions. */
export function getSeedList(slug: string, signal?: AbortSignal): Promise<SeasonSeedList> {
  return httpClient.get<SeasonSeedList>(`${seasonPath(slug)}/seed-list`, { signal });
}

/** The seed list as a CSV file. */
export function downloadSeedListCsv(slug: string): Promise<Blob> {
  return httpClient.file(`${seasonPath(slug)}/seed-list.csv`);
}
