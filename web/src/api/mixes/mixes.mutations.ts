import type { SavedMix, SaveMixRequest } from '@homeground/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { saveMix } from './mixes.api.js';
import { mixKeys } from './mixes.queries.js';

/** Saves a mix; the new one is cached under its own key and the person's list is refreshed. */
export function useSaveMixMutation() {
  const queryClient = useQueryClient();
  return useMutation<SavedMix, Error, SaveMixRequest>({
    mutationFn: saveMix,
    onSuccess: (saved) => {
      queryClient.setQueryData(mixKeys.savedDetail(saved.id), saved);
      void queryClient.invalidateQueries({ queryKey: mixKeys.mine() });
    },
  });
}
