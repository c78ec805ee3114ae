import type { RecordReferenceAnswer, UnexplainedDisagreements } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

/** Differences from the reference no record explains yet, with their count (curators). */
export function getUnexplainedDisagreements(signal?: AbortSignal): Promise<UnexplainedDisagreements> {
  return httpClient.get<UnexplainedDisagreements>('/api/reference-checks', { signal });
}

/** One record beside the reference data, field by field (curators). */
export function getRecordReference(slug: string, signal?: AbortSignal): Promise<RecordReferenceAnswer> {
  return httpClient.get<RecordReferenceAnswer>(`/api/reference-checks/${encodeURIComponent(slug)}`, { signal });
}
