import { describe, expect, it } from 'vitest';
import { F } from '../scoring/__tests__/species-fixtures.js';
import { plantingMethodFor } from './planting-method.js';
import { seedingPlan } from './seeding-plan.js';

describe('meadows get a seeding plan by seeds/ft²', () => {
  it.each([
    [300, 'plugs'],
    [21_779, 'plugs'],
    [21_780, 'seeding'],
    [43_560, 'seeding'],
  ] as const)('%d ft² → %s (half an acre = 21,780 ft²)', (area, method) => {
    expect(plantingMethodFor(area)).toBe(method);
  });

  it('40 seeds/ft² in all (NRCS Elsberry PMC demo rate, CHECK-VALUES §3, R); grasses 40 % of the seed', () => {
    const plan = seedingPlan([F.wildBergamot, F.showyGoldenrod, F.littleBluestem], 43_560);
    expect(plan.map((p) => p.seedsPerSqFt)).toEqual([12, 12, 16]);
    expect(plan.reduce((s, p) => s + p.seedsPerSqFt, 0)).toBe(40);
    // 16 seeds/ft² × 43,560 ft² ÷ seeds/lb of the record
    const perLb = F.littleBluestem.germination.seedsPerPound;
    if (perLb) expect(plan[2].seed?.pounds).toBeCloseTo((16 * 43_560) / perLb, 6);
  });
});
