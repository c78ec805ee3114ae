import { describe, expect, it } from 'vitest';
import { bloomPeriodsOf, cp42PeriodsOf, isFloweringSpecies, monthsInPeriod } from './bloom-periods.js';

// CP42 bloom periods: early Apr–15 Jun, mid 15 Jun–Jul, late Aug–Oct (CP42-IN, CHECK-VALUES §3, R).
describe('bloomPeriodsOf (CP42-IN periods from whole months)', () => {
  it.each([
    ['April–May', [4, 5], ['early']],
    ['June only: both halves of the split month', [6], ['early', 'mid']],
    ['June–August (butterfly milkweed)', [6, 7, 8], ['early', 'mid', 'late']],
    ['July', [7], ['mid']],
    ['August–October (showy goldenrod)', [8, 9, 10], ['late']],
    ['March only: before CP42 early', [3], []],
    ['November only: after CP42 late', [11], []],
    ['no months', [], []],
  ])('%s', (_what, months, expected) => {
    expect(bloomPeriodsOf(months)).toEqual(expected);
  });

  it('lists the months a species flowers within one period', () => {
    expect(monthsInPeriod([7, 8, 9], 'late')).toEqual([8, 9]);
  });
});

describe('isFloweringSpecies (CP42-IN: wildflowers, legumes, shrubs count; grasses do not)', () => {
  it.each([
    ['forb with months', 'forb', [6], true],
    ['shrub with months', 'shrub', [5], true],
    ['graminoid with months', 'graminoid', [8, 9], false],
    ['fern', 'fern', [], false],
    ['forb without months', 'forb', [], false],
  ] as const)('%s', (_what, growthForm, bloomMonths, expected) => {
    expect(isFloweringSpecies({ growthForm, bloomMonths: [...bloomMonths] })).toBe(expected);
  });

  it('a grass counts for no CP42 period', () => {
    expect(cp42PeriodsOf({ growthForm: 'graminoid', bloomMonths: [8, 9] })).toEqual([]);
  });
});
