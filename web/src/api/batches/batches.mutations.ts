import type {
  BatchSplitRequest,
  FrostWarningRequest,
  GrowerSetupRequest,
  LogEntryRequest,
  SplitProposalRequest,
} from '@homeground/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { postFrostWarning, postLogEntry, postWeeklySummary, proposeSplit, putGrower, putSplit } from './batches.api.js';
import { batchKeys } from './batches.queries.js';

/** Saves a grower's methods and capacity; growers and batches refresh. */
export function useSaveGrowerMutation(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, body }: { userId: string; body: GrowerSetupRequest }) => putGrower(slug, userId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: batchKeys.season(slug) }),
  });
}

/** Asks for a proposed split; nothing is written, so nothing is invalidated. */
export function useProposeSplitMutation(slug: string) {
  return useMutation({ mutationFn: (body: SplitProposalRequest) => proposeSplit(slug, body) });
}

/** Saves the split; the list takes the answer and growers and progress are fetched again. */
export function useSaveSplitMutation(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: BatchSplitRequest) => putSplit(slug, body),
    onSuccess: (answer) => {
      queryClient.setQueryData(batchKeys.list(slug), answer);
      void queryClient.invalidateQueries({ queryKey: batchKeys.growers(slug) });
      void queryClient.invalidateQueries({ queryKey: batchKeys.progress(slug) });
    },
  });
}

/**
 * Adds a log entry. The entry carries a clientId made once per entry, so a retry after a lost answer
 * is stored once by the API.
 */
export function useLogEntryMutation(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ batchId, entry }: { batchId: string; entry: LogEntryRequest }) => postLogEntry(slug, batchId, entry),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: batchKeys.season(slug) }),
  });
}

/** Sends a frost warning by e-mail; nothing on screen changes but the answer. */
export function useFrostWarningMutation(slug: string) {
  return useMutation({ mutationFn: (body: FrostWarningRequest) => postFrostWarning(slug, body) });
}

/** Sends this week's summaries now. */
export function useWeeklySummaryMutation(slug: string) {
  return useMutation({ mutationFn: () => postWeeklySummary(slug) });
}
