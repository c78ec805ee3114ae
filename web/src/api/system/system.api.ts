import type { HealthResponse, SiteInfoResponse, StatsResponse } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

export function getHealth(signal?: AbortSignal): Promise<HealthResponse> {
  return httpClient.get<HealthResponse>('/api/health', { signal, token: null });
}

/** Public counts of what the catalogue holds. */
export function getStats(signal?: AbortSignal): Promise<StatsResponse> {
  return httpClient.get<StatsResponse>('/api/stats', { signal, token: null });
}

/** The site's public address, for QR codes and links that leave the screen. */
export function getSite(signal?: AbortSignal): Promise<SiteInfoResponse> {
  return httpClient.get<SiteInfoResponse>('/api/site', { signal, token: null });
}
