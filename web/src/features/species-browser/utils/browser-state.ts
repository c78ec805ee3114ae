import type { SpeciesQueryInput } from '@homeground/shared';
import { type BrowserState, paths } from '../../../config/paths.js';

/** The URL half of the browser's state (its type, defaults, parse and write) lives in config/paths. */
export type { BrowserState, SortOrder, SpeciesSort } from '../../../config/paths.js';
export { DEFAULT_PAGE_SIZE, EMPTY_STATE, PAGE_SIZES } from '../../../config/paths.js';

/** Reads the browser's state from a query string (see `paths.species.parse`). */
export const parseBrowserState = paths.species.parse;
/** The query string for a state, defaults left out (see `paths.species.search`). */
export const browserStateToSearchParams = paths.species.search;

/** The filters that narrow the catalogue (not search, paging or order): what "Clear filters" resets. */
export const FILTER_KEYS = [
  'state',
  'ecoregion',
  'sun',
  'moisture',
  'bloomMonth',
  'growthForm',
  'minHeightCm',
  'maxHeightCm',
  'monarchHost',
] as const satisfies readonly (keyof BrowserState)[];

/** True when the minimum height is above the maximum: the API refuses that, so neither is sent. */
export function isHeightRangeInverted(s: Pick<BrowserState, 'minHeightCm' | 'maxHeightCm'>): boolean {
  return s.minHeightCm !== undefined && s.maxHeightCm !== undefined && s.minHeightCm > s.maxHeightCm;
}

/** The GET /api/species query for a state; every value it uses is part of the query key. */
export function browserStateToQuery(s: BrowserState): SpeciesQueryInput {
  const inverted = isHeightRangeInverted(s);
  const query: SpeciesQueryInput = { page: s.page, pageSize: s.pageSize, order: s.order };
  const q = s.q.trim();
  if (q) query.q = q;
  if (s.state) query.state = s.state;
  if (s.ecoregion) query.ecoregion = s.ecoregion;
  if (s.sun) query.sun = s.sun;
  if (s.moisture) query.moisture = s.moisture;
  if (s.bloomMonth !== undefined) query.bloomMonth = s.bloomMonth;
  if (s.growthForm) query.growthForm = s.growthForm;
  if (!inverted && s.minHeightCm !== undefined) query.minHeightCm = s.minHeightCm;
  if (!inverted && s.maxHeightCm !== undefined) query.maxHeightCm = s.maxHeightCm;
  if (s.monarchHost) query.monarchHost = 'true';
  if (s.sort) query.sort = s.sort;
  return query;
}

/** How many narrowing filters are set, for the phone's "Filters (3)" button. */
export function countActiveFilters(s: BrowserState): number {
  return FILTER_KEYS.filter((k) => (k === 'monarchHost' ? s.monarchHost : s[k] !== undefined)).length;
}

/**
 * A change to search or any filter starts again at page 1: page 7 of the old result may not exist
 * in the new one. Paging and page size changes keep what they set.
 */
export function applyChange(current: BrowserState, change: Partial<BrowserState>): BrowserState {
  const next = { ...current, ...change };
  if (!('page' in change)) next.page = 1;
  // An ecoregion chosen under one state may not reach the next one; start the ecoregion over.
  if ('state' in change && change.state !== current.state && !('ecoregion' in change)) next.ecoregion = undefined;
  return next;
}
