import type { Group } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

/** Every growing group (public). */
export function listGroups(signal?: AbortSignal): Promise<Group[]> {
  return httpClient.get<Group[]>('/api/groups', { signal, token: null });
}
