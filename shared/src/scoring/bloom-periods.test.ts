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

// Homeground's rule for wind-pollinated trees (bloom-periods.ts): a tree is a CP42 flowering species
// only when its record names a flower colour other than green or brown. Colours are the catalogue's:
// river birch brown catkins (usda-plants-characteristics), eastern redbud pink and magenta (from-memory).
describe('isFloweringSpecies: trees count only with showy flowers', () => {
  it.each([
    ['river birch: brown catkins', 'tree', ['brown'], false],
    ['a tree with green flowers only', 'tree', ['green'], false],
    ['green and brown only', 'tree', ['green', 'brown'], false],
    ['a tree with no colours recorded', 'tree', [], false],
    ['eastern redbud: pink and magenta', 'tree', ['pink', 'magenta'], true],
    ['green and white (some white is showy)', 'tree', ['green', 'white'], true],
    ['a shrub with green flowers: the rule is for trees only', 'shrub', ['green'], true],
  ] as const)('%s', (_what, growthForm, flowerColours, expected) => {
    expect(isFloweringSpecies({ growthForm, bloomMonths: [4, 5], flowerColours: [...flowerColours] })).toBe(expected);
  });

  it('a wind-pollinated tree counts for no CP42 period', () => {
    expect(cp42PeriodsOf({ growthForm: 'tree', bloomMonths: [4, 5], flowerColours: ['brown'] })).toEqual([]);
    expect(cp42PeriodsOf({ growthForm: 'tree', bloomMonths: [4, 5], flowerColours: ['pink'] })).toEqual(['early']);
  });
});
