import { describe, expect, it } from 'vitest';
import { bloomWords, formatMonths, MONTH_NUMBERS, MONTH_WORDS, monthLong, monthRuns, monthShort } from './months.js';

// Month names and their usual three-letter abbreviations are plain English (from-memory); bloom
// months are stored 1–12 as in species-data/species/*.json (butterfly milkweed: [6, 7, 8]).
describe('month words', () => {
  it('has twelve months in calendar order', () => {
    expect(MONTH_NUMBERS.map(monthShort).join(' ')).toBe('Jan Feb Mar Apr May Jun Jul Aug Sep Oct Nov Dec');
    expect(monthLong(9)).toBe('September');
    expect(MONTH_NUMBERS.map((m) => MONTH_WORDS[m].initial).join('')).toBe('JFMAMJJASOND');
  });

  it.each([
    [[6, 7, 8], 'Jun–Aug'],
    [[8, 6, 7, 7], 'Jun–Aug'],
    [[5], 'May'],
    [[4, 5, 9], 'Apr–May and Sep'],
    [[3, 5, 7], 'Mar, May and Jul'],
    [[11, 12, 1, 2], 'Nov–Feb'],
    [[12, 1], 'Dec–Jan'],
    [[1, 2, 6, 12], 'Jun and Dec–Feb'],
    [[1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], 'all year'],
    [[], ''],
    [[0, 13], ''],
  ])('formatMonths(%j) = "%s"', (months, expected) => {
    expect(formatMonths(months)).toBe(expected);
  });

  it('keeps a run across the new year as one run', () => {
    expect(monthRuns([12, 1, 2])).toEqual([[12, 2]]);
    expect(monthRuns([7, 9])).toEqual([
      [7, 7],
      [9, 9],
    ]);
  });

  it.each([
    [[6, 7, 8], 'Blooms Jun–Aug'],
    [[1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], 'Blooms all year'],
    [[], 'No bloom months recorded'],
  ])('bloomWords(%j) = "%s"', (months, expected) => {
    expect(bloomWords(months)).toBe(expected);
  });
});
