import type { GlobalRole, PersonAccount } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

const personPath = (id: string) => `/api/users/${encodeURIComponent(id)}`;

/** Every account with its role, groups and sign-in activity (admins only). */
export function listPeople(signal?: AbortSignal): Promise<PersonAccount[]> {
  return httpClient.get<PersonAccount[]>('/api/users', { signal });
}

export function setPersonRole(id: string, role: GlobalRole): Promise<PersonAccount> {
  return httpClient.patch<PersonAccount>(`${personPath(id)}/role`, { role });
}

/** Switches an account off (its tokens stop working at once) or on again. */
export function setPersonAccess(id: string, disabled: boolean): Promise<PersonAccount> {
  return httpClient.patch<PersonAccount>(`${personPath(id)}/access`, { disabled });
}
