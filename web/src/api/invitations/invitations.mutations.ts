import type { AcceptInvitationRequest } from '@homeground/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { authKeys } from '../auth/auth.queries.js';
import { acceptInvitation } from './invitations.api.js';

/** Accepts an invitation; the answer carries a fresh sign-in whose profile is cached at once. */
export function useAcceptInvitationMutation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AcceptInvitationRequest) => acceptInvitation(token, body),
    onSuccess: (auth) => queryClient.setQueryData(authKeys.me(auth.accessToken), auth.user),
  });
}
