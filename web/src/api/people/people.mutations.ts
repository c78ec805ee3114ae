import type { GlobalRole } from '@homeground/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { setPersonAccess, setPersonRole } from './people.api.js';
import { peopleKeys } from './people.queries.js';

/** Changes a person's global role; the list refreshes. */
export function useSetRoleMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: string; role: GlobalRole }) => setPersonRole(id, role),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}

/** Switches an account off or on; the list refreshes. */
export function useSetAccessMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, disabled }: { id: string; disabled: boolean }) => setPersonAccess(id, disabled),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}
