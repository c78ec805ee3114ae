import type { SeasonRequest, ShareListRequest, TargetsRequest } from '@homeground/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { proposeShareList, putSeason, putTargets } from './seasons.api.js';
import { batchKeys } from '../batches/batches.queries.js';
import { seasonKeys } from './seasons.queries.js';

/** Saves the season's dates and settings; the season, its seed list and its batch dates refresh. */
export function useSaveSeasonMutation(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SeasonRequest) => putSeason(slug, body),
    onSuccess: (season) => {
      queryClient.setQueryData(seasonKeys.detail(slug), season);
      void queryClient.invalidateQueries({ queryKey: seasonKeys.seedList(slug) });
      void queryClient.invalidateQueries({ queryKey: batchKeys.season(slug) });
    },
  });
}

/** Replaces the target list; the season takes the answer and the seed list is worked out again. */
export function useSaveTargetsMutation(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: TargetsRequest) => putTargets(slug, body),
    onSuccess: (season) => {
      queryClient.setQueryData(seasonKeys.detail(slug), season);
      void queryClient.invalidateQueries({ queryKey: seasonKeys.seedList(slug) });
    },
  });
}

/** Asks for a share list; nothing is written, so nothing is invalidated. */
export function useProposeShareListMutation(slug: string) {
  return useMutation({ mutationFn: (body: ShareListRequest) => proposeShareList(slug, body) });
}
