import type { InviteRequest } from '@homeground/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invite, removeMember } from './groups.api.js';
import { groupKeys } from './groups.queries.js';

/** Sends an invitation e-mail; the group's invitation list refreshes. */
export function useInviteMutation(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: InviteRequest) => invite(slug, body),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: groupKeys.invitations(slug) }),
  });
}

/** Takes a person out of the group; the member list and the group's count refresh. */
export function useRemoveMemberMutation(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => removeMember(slug, userId),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: groupKeys.detail(slug) }),
  });
}
