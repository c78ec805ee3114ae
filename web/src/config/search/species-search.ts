import {
  GROWTH_FORMS,
  type GrowthForm,
  MOISTURE_LEVELS,
  type Moisture,
  SPECIES_SORTS,
  type StateCode,
  SUN_LEVELS,
  type Sun,
  US_STATE_CODES,
} from '@homeground/shared';
import { oneOf, wholeNumber } from './query-values.js';

export type SpeciesSort = (typeof SPECIES_SORTS)[number];
export type SortOrder = 'asc' | 'desc';

/** Page sizes offered in the browser; the API allows up to 200. */
export const PAGE_SIZES = [25, 50, 100, 200] as const;
export const DEFAULT_PAGE_SIZE = 50;

/**
 * Everything the species browser shows, as read from and written to the URL query string, so a
 * filtered view can be shared and the back button steps through earlier views. Heights are in cm,
 * the API's unit; the height filter converts feet on the way in.
 */
export interface BrowserState {
  q: string;
  state?: StateCode;
  ecoregion?: string;
  sun?: Sun;
  moisture?: Moisture;
  bloomMonth?: number;
  growthForm?: GrowthForm;
  minHeightCm?: number;
  maxHeightCm?: number;
  monarchHost: boolean;
  page: number;
  pageSize: number;
  /** Unset: the API's own order (best match while searching, else common name). */
  sort?: SpeciesSort;
  order: SortOrder;
}

export const EMPTY_STATE: BrowserState = {
  q: '',
  monarchHost: false,
  page: 1,
  pageSize: DEFAULT_PAGE_SIZE,
  order: 'asc',
};

function heightCm(value: string | null): number | undefined {
  if (value === null || !/^\d+(\.\d+)?$/.test(value)) return undefined;
  const n = Number(value);
  return n <= 5000 ? n : undefined;
}

/**
 * Reads the browser's state from a query string. A hand-edited or stale link may carry values the
 * API would refuse (bloomMonth=13, sun=bright); those are dropped one by one so the rest still applies.
 */
export function parseBrowserState(params: URLSearchParams): BrowserState {
  const ecoregion = params.get('ecoregion');
  const pageSize = wholeNumber(params.get('pageSize'), 1, 200);
  return {
    q: (params.get('q') ?? '').slice(0, 100),
    state: oneOf(US_STATE_CODES, params.get('state')),
    ecoregion: ecoregion !== null && /^([1-9]|[1-7][0-9]|8[0-5])$/.test(ecoregion) ? ecoregion : undefined,
    sun: oneOf(SUN_LEVELS, params.get('sun')),
    moisture: oneOf(MOISTURE_LEVELS, params.get('moisture')),
    bloomMonth: wholeNumber(params.get('bloomMonth'), 1, 12),
    growthForm: oneOf(GROWTH_FORMS, params.get('growthForm')),
    minHeightCm: heightCm(params.get('minHeightCm')),
    maxHeightCm: heightCm(params.get('maxHeightCm')),
    monarchHost: params.get('monarchHost') === 'true',
    page: wholeNumber(params.get('page'), 1, 100_000) ?? 1,
    pageSize: pageSize ?? DEFAULT_PAGE_SIZE,
    sort: oneOf(SPECIES_SORTS, params.get('sort')),
    order: params.get('order') === 'desc' ? 'desc' : 'asc',
  };
}

/** The query string for a state: defaults are left out so links stay short, keys in a fixed order. */
export function browserStateToSearchParams(s: BrowserState): URLSearchParams {
  const out = new URLSearchParams();
  const put = (key: string, value: string | number | undefined | false) => {
    if (value !== undefined && value !== false && value !== '') out.set(key, String(value));
  };
  put('q', s.q.trim());
  put('state', s.state);
  put('ecoregion', s.ecoregion);
  put('sun', s.sun);
  put('moisture', s.moisture);
  put('bloomMonth', s.bloomMonth);
  put('growthForm', s.growthForm);
  put('minHeightCm', s.minHeightCm);
  put('maxHeightCm', s.maxHeightCm);
  put('monarchHost', s.monarchHost && 'true');
  put('sort', s.sort);
  put('order', s.order === 'desc' && 'desc');
  put('page', s.page > 1 && s.page);
  put('pageSize', s.pageSize !== DEFAULT_PAGE_SIZE && s.pageSize);
  return out;
}
