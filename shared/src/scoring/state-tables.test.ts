import { describe, expect, it } from 'vitest';
import { US_STATE_CODES } from '../types/species.js';
import { STATE_NAMES } from './state-names.js';
import { STATE_NEIGHBOURS } from './state-neighbours.js';
import { formatMonths } from '../vocabulary/months.js';
import { describeGround } from '../vocabulary/site-words.js';

describe('state tables (from-memory geography; checked for consistency)', () => {
  it('every neighbour relation runs both ways', () => {
    for (const code of US_STATE_CODES) {
      for (const n of STATE_NEIGHBOURS[code]) expect(STATE_NEIGHBOURS[n], `${code}→${n}`).toContain(code);
    }
  });

  it('names every code', () => {
    expect(Object.keys(STATE_NAMES).sort()).toEqual([...US_STATE_CODES].sort());
    expect(STATE_NAMES.WI).toBe('Wisconsin');
  });
});

describe('plain words', () => {
  it.each([
    [[8, 9, 10], 'Aug–Oct'],
    [[6], 'Jun'],
    [[4, 5, 9], 'Apr–May and Sep'],
    [[3, 5, 7], 'Mar, May and Jul'],
  ])('formatMonths(%j) = %s', (months, expected) => {
    expect(formatMonths(months)).toBe(expected);
  });

  it('names a spot the way a grower would', () => {
    expect(describeGround('shade', 'dry')).toBe('dry shade');
    expect(describeGround('full', 'wet')).toBe('wet full sun');
  });
});
