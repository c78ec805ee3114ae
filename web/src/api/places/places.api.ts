import type { PlaceLookup } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

export type PlaceQuery = { zip: string } | { lat: number; lon: number };

/** Your ground for a ZIP or a point: state, county and EPA Level III ecoregion (with a split county's others). */
export function lookupPlace(query: PlaceQuery, signal?: AbortSignal): Promise<PlaceLookup> {
  const qs = 'zip' in query ? `zip=${encodeURIComponent(query.zip)}` : `lat=${query.lat}&lon=${query.lon}`;
  return httpClient.get<PlaceLookup>(`/api/places/lookup?${qs}`, { signal, token: null });
}
