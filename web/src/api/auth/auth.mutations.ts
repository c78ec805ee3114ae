import type { AuthResponse } from '@homeground/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { confirmRegistration, login, register } from './auth.api.js';
import { authKeys } from './auth.queries.js';

/** Seeds the profile query with the user the auth answer already carries, saving a /api/me trip. */
function useSeedProfile() {
  const queryClient = useQueryClient();
  return (auth: AuthResponse) => queryClient.setQueryData(authKeys.me(auth.accessToken), auth.user);
}

export function useLoginMutation() {
  const seedProfile = useSeedProfile();
  return useMutation({ mutationFn: login, onSuccess: seedProfile });
}

export function useRegisterMutation() {
  return useMutation({ mutationFn: register });
}

export function useConfirmRegistrationMutation() {
  const seedProfile = useSeedProfile();
  return useMutation({ mutationFn: confirmRegistration, onSuccess: seedProfile });
}
