import { describe, expect, it } from 'vitest';
import { intoSheets } from './paging.js';

// Four fact cards to a page (the brief's 2 × 2 grid): 9 cards need ceil(9 / 4) = 3 pages.
describe('intoSheets', () => {
  it.each([
    [0, 4, []],
    [4, 4, [4]],
    [8, 4, [4, 4]],
    [9, 4, [4, 4, 1]],
    [31, 30, [30, 1]],
  ])('%i items at %i a page → pages of %j', (count, perPage, sizes) => {
    const items = Array.from({ length: count }, (_, i) => i);
    const sheets = intoSheets(items, perPage);
    expect(sheets.map((s) => s.length)).toEqual(sizes);
    expect(sheets.flat()).toEqual(items);
  });

  it('refuses a page that holds nothing', () => {
    expect(() => intoSheets([1], 0)).toThrow(RangeError);
  });
});
