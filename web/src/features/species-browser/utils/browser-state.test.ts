import { describe, expect, it } from 'vitest';
import {
  applyChange,
  browserStateToQuery,
  browserStateToSearchParams,
  DEFAULT_PAGE_SIZE,
  EMPTY_STATE,
  parseBrowserState,
} from './browser-state.js';

const parse = (qs: string) => parseBrowserState(new URLSearchParams(qs));

// Allowed values are the API's query schema (shared/src/types/species-query.ts): USPS state
// codes, EPA Level III codes 1–85, months 1–12, page size up to 200.
describe('filters in the URL → API query', () => {
  it('reads every filter from a shared link and sends it to GET /api/species', () => {
    const state = parse(
      'q=buterfly+weed&state=WI&ecoregion=52&sun=full&moisture=dry&bloomMonth=7&growthForm=forb&minHeightCm=30&maxHeightCm=90&monarchHost=true&sort=height&order=desc&page=2&pageSize=100',
    );
    expect(browserStateToQuery(state)).toEqual({
      q: 'buterfly weed',
      state: 'WI',
      ecoregion: '52',
      sun: 'full',
      moisture: 'dry',
      bloomMonth: 7,
      growthForm: 'forb',
      minHeightCm: 30,
      maxHeightCm: 90,
      monarchHost: 'true',
      sort: 'height',
      order: 'desc',
      page: 2,
      pageSize: 100,
    });
  });

  it('sends only paging for an empty URL', () => {
    expect(browserStateToQuery(parse(''))).toEqual({ page: 1, pageSize: DEFAULT_PAGE_SIZE, order: 'asc' });
  });

  it.each([
    ['state=XX', 'state'],
    ['ecoregion=86', 'ecoregion'],
    ['ecoregion=052', 'ecoregion'],
    ['sun=bright', 'sun'],
    ['bloomMonth=13', 'bloomMonth'],
    ['bloomMonth=0', 'bloomMonth'],
    ['growthForm=cactus', 'growthForm'],
    ['minHeightCm=-5', 'minHeightCm'],
    ['sort=colour', 'sort'],
  ])('drops a value the API would refuse (%s) and keeps the rest', (qs, key) => {
    const state = parse(`${qs}&moisture=wet`);
    expect(state[key as keyof typeof state]).toBeUndefined();
    expect(browserStateToQuery(state).moisture).toBe('wet');
  });

  it('leaves out both heights when the lower is above the upper (the API answers 400)', () => {
    const query = browserStateToQuery(parse('minHeightCm=120&maxHeightCm=60'));
    expect(query.minHeightCm).toBeUndefined();
    expect(query.maxHeightCm).toBeUndefined();
  });

  it('falls back to page 1 and the default page size for nonsense', () => {
    const state = parse('page=abc&pageSize=500');
    expect(state.page).toBe(1);
    expect(state.pageSize).toBe(DEFAULT_PAGE_SIZE);
  });
});

describe('state → URL', () => {
  it('writes a short, stable query string without defaults', () => {
    const qs = browserStateToSearchParams({
      ...EMPTY_STATE,
      q: ' milkweed ',
      state: 'WI',
      monarchHost: true,
    }).toString();
    expect(qs).toBe('q=milkweed&state=WI&monarchHost=true');
  });

  it('round-trips a full state', () => {
    const qs =
      'q=aster&state=MN&ecoregion=51&sun=part&moisture=medium&bloomMonth=9&growthForm=forb&minHeightCm=30&maxHeightCm=120&monarchHost=true&sort=bloomStart&order=desc&page=3&pageSize=25';
    expect(browserStateToSearchParams(parse(qs)).toString()).toBe(qs);
  });
});

describe('changing the view', () => {
  const onPage4 = { ...EMPTY_STATE, page: 4, state: 'WI' as const, ecoregion: '52' };

  it('goes back to page 1 when a filter or the search changes', () => {
    expect(applyChange(onPage4, { sun: 'shade' }).page).toBe(1);
    expect(applyChange(onPage4, { q: 'aster' }).page).toBe(1);
  });

  it('keeps the page when paging', () => {
    expect(applyChange(onPage4, { page: 5 }).page).toBe(5);
  });

  it('clears the ecoregion when the state changes, since it may not reach the new state', () => {
    expect(applyChange(onPage4, { state: 'MN' }).ecoregion).toBeUndefined();
    expect(applyChange(onPage4, { sun: 'full' }).ecoregion).toBe('52');
  });
});
