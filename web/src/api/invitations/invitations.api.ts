import type { AcceptInvitationRequest, AuthResponse, InvitationPreview } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

const invitationPath = (token: string) => `/api/invitations/${encodeURIComponent(token)}`;

/** What an invitation link offers (public: the link's secret is the key). */
export function previewInvitation(token: string, signal?: AbortSignal): Promise<InvitationPreview> {
  return httpClient.get<InvitationPreview>(invitationPath(token), { signal, token: null });
}

/** Joins the group: with the stored sign-in when there is one, or with a new account's name and password. */
export function acceptInvitation(token: string, body: AcceptInvitationRequest): Promise<AuthResponse> {
  return httpClient.post<AuthResponse>(`${invitationPath(token)}/accept`, body);
}
