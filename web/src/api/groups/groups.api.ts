import type { Group, GroupMember, Invitation, InviteRequest } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

const groupPath = (slug: string) => `/api/groups/${encodeURIComponent(slug)}`;

/** Every growing group (public). */
export function listGroups(signal?: AbortSignal): Promise<Group[]> {
  return httpClient.get<Group[]>('/api/groups', { signal, token: null });
}

/** One group's public facts. */
export function getGroup(slug: string, signal?: AbortSignal): Promise<Group> {
  return httpClient.get<Group>(groupPath(slug), { signal, token: null });
}

/** The group's people; e-mail addresses only for its organisers. */
export function listMembers(slug: string, signal?: AbortSignal): Promise<GroupMember[]> {
  return httpClient.get<GroupMember[]>(`${groupPath(slug)}/members`, { signal });
}

export function removeMember(slug: string, userId: string): Promise<void> {
  return httpClient.delete(`${groupPath(slug)}/members/${encodeURIComponent(userId)}`);
}

/** Invitations the group's organisers sent. */
export function listInvitations(slug: string, signal?: AbortSignal): Promise<Invitation[]> {
  return httpClient.get<Invitation[]>(`${groupPath(slug)}/invitations`, { signal });
}

export function invite(slug: string, body: InviteRequest): Promise<Invitation> {
  return httpClient.post<Invitation>(`${groupPath(slug)}/invitations`, body);
}
