import type {
  BatchSplitProposalAnswer,
  BatchSplitRequest,
  FrostWarningAnswer,
  FrostWarningRequest,
  WeeklySummaryAnswer,
  GrowerSetupRequest,
  LogEntryAnswer,
  LogEntryRequest,
  SeasonBatches,
  SeasonGrower,
  SeasonProgress,
  SplitProposalRequest,
} from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

const seasonPath = (slug: string) => `/api/groups/${encodeURIComponent(slug)}/season`;

/** Organisers: every grower with methods and capacity; a grower: themself. */
export function getGrowers(slug: string, signal?: AbortSignal): Promise<SeasonGrower[]> {
  return httpClient.get<SeasonGrower[]>(`${seasonPath(slug)}/growers`, { signal });
}

/** A grower's methods and capacity (the grower themself, or an organiser). */
export function putGrower(slug: string, userId: string, body: GrowerSetupRequest): Promise<SeasonGrower> {
  return httpClient.put<SeasonGrower>(`${seasonPath(slug)}/growers/${encodeURIComponent(userId)}`, body);
}

/** Batches with dates, logs and supplies: all for organisers, their own for a grower. */
export function getBatches(slug: string, signal?: AbortSignal): Promise<SeasonBatches> {
  return httpClient.get<SeasonBatches>(`${seasonPath(slug)}/batches`, { signal });
}

/** Proposes a split of the targets over the growers' capacity; the API writes nothing. */
export function proposeSplit(slug: string, body: SplitProposalRequest): Promise<BatchSplitProposalAnswer> {
  return httpClient.post<BatchSplitProposalAnswer>(`${seasonPath(slug)}/batches/propose`, body);
}

/** Replaces the split (organisers). */
export function putSplit(slug: string, body: BatchSplitRequest): Promise<SeasonBatches> {
  return httpClient.put<SeasonBatches>(`${seasonPath(slug)}/batches`, body);
}

/** Adds a batch-log entry (the batch's grower); answers the entry as stored and the batch's totals. */
export function postLogEntry(slug: string, batchId: string, body: LogEntryRequest): Promise<LogEntryAnswer> {
  return httpClient.post<LogEntryAnswer>(`${seasonPath(slug)}/batches/${encodeURIComponent(batchId)}/log`, body);
}

/** Targets against sown, up and ready, with the ready forecast (organisers). */
export function getProgress(slug: string, signal?: AbortSignal): Promise<SeasonProgress> {
  return httpClient.get<SeasonProgress>(`${seasonPath(slug)}/progress`, { signal });
}

/** The caller's own batches as an iCalendar file. */
export function downloadMyBatchesIcs(slug: string): Promise<Blob> {
  return httpClient.file(`${seasonPath(slug)}/my-batches.ics`);
}

/** Warns every grower with plants outdoors of a frost, by e-mail (organisers). */
export function postFrostWarning(slug: string, body: FrostWarningRequest): Promise<FrostWarningAnswer> {
  return httpClient.post<FrostWarningAnswer>(`${seasonPath(slug)}/frost-warning`, body);
}

/** Sends this week's summary now to each grower who has not had it (organisers). */
export function postWeeklySummary(slug: string): Promise<WeeklySummaryAnswer> {
  return httpClient.post<WeeklySummaryAnswer>(`${seasonPath(slug)}/weekly-summary`, {});
}
