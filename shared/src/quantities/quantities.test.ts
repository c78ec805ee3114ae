import { describe, expect, it } from 'vitest';
import { F } from '../scoring/__tests__/species-fixtures.js';
import { plantsPerSpecies, totalFootprintSqFt } from './plant-split.js';
import { seedWeight, seedsToSow } from './seed-count.js';
import { directSeeding, rateFromSeedsPerSqFt, seedsPerSqFtFromRate } from './seeding-rate.js';
import { defaultSpacingIn, plantsPerSqFt, plantsPerSqM } from './spacing.js';

// BWSR seed-mix rows (CHECK-VALUES §3, R): lb PLS/acre ↔ seeds/ft² at the implied seeds per pound.
describe('seeds/ft² ↔ lb PLS/acre (seeds/ft² = lb/acre × seeds/lb ÷ 43,560; BWSR rows, R)', () => {
  it.each([
    ['Schizachyrium scoparium', 2.3, 240_000, 12.67],
    ['Sporobolus heterolepis', 0.25, 256_000, 1.47],
    ['Andropogon gerardii', 1.5, 160_000, 5.51],
    ['Dalea purpurea', 0.12, 218_000, 0.6],
    ['Asclepias verticillata', 0.05, 174_000, 0.2],
  ])('%s: %d lb/acre at %d seeds/lb ↔ %d seeds/ft²', (_name, lbPerAcre, seedsPerLb, seedsPerSqFt) => {
    // "Within rounding": the table prints two decimals.
    expect(Math.abs(seedsPerSqFtFromRate(lbPerAcre, seedsPerLb) - seedsPerSqFt)).toBeLessThan(0.006);
    expect(rateFromSeedsPerSqFt(seedsPerSqFt, seedsPerLb)).toBeCloseTo(lbPerAcre, 2);
  });

  it('gives the metric rate and the PLS weight for an area', () => {
    const d = directSeeding(2.3, 240_000, 1000);
    expect(d.kgPlsPerHectare).toBeCloseTo(2.578, 3); // 1 lb/acre = 1.12085 kg/ha (exact factors)
    expect(d.seedsPerSqM).toBeCloseTo(136.4, 1);
    expect(d.seed.ounces).toBeCloseTo(0.845, 3); // 12,672 seeds ÷ 240,000/lb × 16 oz
  });
});

// Geometry of a square grid (X); CHECK-VALUES marks the typical 12–18 in plug spacing as M.
describe('on-centre spacing → plants per area', () => {
  it.each([
    [12, 1.0],
    [18, 0.44],
    [24, 0.25],
  ])('%d in → %d plants/ft²', (spacing, density) => {
    expect(plantsPerSqFt(spacing)).toBeCloseTo(density, 2);
  });

  it('metric: 30 cm → 11.1 plants/m²', () => {
    expect(plantsPerSqM(30)).toBeCloseTo(11.11, 2);
  });

  it.each([
    ['golden alexanders, 30–45 cm wide', 12, F.goldenAlexanders],
    ['wild bergamot, 45–90 cm wide', 18, F.wildBergamot],
  ])('default spacing: %s → %d in (typical 12–18 in, M)', (_what, inches, species) => {
    expect(defaultSpacingIn(species)).toBe(inches);
  });
});

describe('plantsPerSpecies (grasses 30 % of the bed, the rest shared; plants × spacing² never over the bed)', () => {
  it('splits a 100 ft² bed', () => {
    const mix = [F.goldenAlexanders, F.wildBergamot, F.littleBluestem];
    const r = Object.fromEntries(plantsPerSpecies(mix, 100).map((p) => [p.slug, p]));
    expect(r['zizia-aurea'].plants).toBe(35); // 70 ft² ÷ 2 = 35 ft² at 12 in
    expect(r['zizia-aurea'].areaSqFt).toBeCloseTo(35, 6);
    expect(r['monarda-fistulosa'].plants).toBe(15); // 35 ft² ÷ 2.25 ft² = 15.6 → 15 (rounded down: 16 would overfill)
    expect(r['schizachyrium-scoparium'].plants).toBe(30); // 30 ft² at 12 in
    expect(r['zizia-aurea'].areaSqM).toBeCloseTo(3.252, 3);
    expect(totalFootprintSqFt(Object.values(r))).toBeLessThanOrEqual(100);
  });

  it('3 plants each where 3 fit, fewer where the bed cannot hold them (6 ft² for three 18–24 in plants)', () => {
    const r = plantsPerSpecies([F.wildBergamot, F.showyGoldenrod, F.newEnglandAster], 6);
    expect(totalFootprintSqFt(r)).toBeLessThanOrEqual(6);
    expect(r.every((p) => p.plants >= 1)).toBe(true);
    expect(plantsPerSpecies([F.goldenAlexanders, F.wildBergamot], 40).map((p) => p.plants)).toEqual([20, 8]);
  });

  it('no fixed minimum for a shrub: one where one fits (a 6 ft shrub in the woody quarter of a 200 ft² bed)', () => {
    const shrub = {
      ...F.wildBergamot,
      slug: 'a-shrub',
      scientificName: 'Cornus racemosa',
      growthForm: 'shrub' as const,
      spreadCm: { min: 180, max: 300 },
    };
    const r = plantsPerSpecies([shrub, F.goldenAlexanders, F.littleBluestem], 200);
    // spacing 72 in → 36 ft² a plant; woody share 50 ft² → 1 plant
    expect(r[0]).toMatchObject({ slug: 'a-shrub', plants: 1, spacingIn: 72 });
    expect(totalFootprintSqFt(r)).toBeLessThanOrEqual(200);
  });
});

describe('seeds to sow and their weight', () => {
  it.each([
    // plants ÷ (germination × (1 − loss)); loss 0.2 is the stated common-practice default
    [10, 60, undefined, 21],
    [35, 50, undefined, 88],
    [100, 80, 0, 125],
    [12, 100, 0.25, 16],
  ])('%d plants at %d %% germination, loss %s → %d seeds', (plants, germ, loss, seeds) => {
    expect(seedsToSow(plants, germ, loss)).toBe(seeds);
  });

  it('weighs seed from seeds per pound (butterfly milkweed ≈ 70,000/lb, record)', () => {
    const w = seedWeight(700, 70_000);
    expect(w.grams).toBeCloseTo(4.536, 3);
    expect(w.ounces).toBeCloseTo(0.16, 3);
  });

  it('refuses impossible rates', () => {
    expect(() => seedsToSow(10, 0)).toThrow(RangeError);
    expect(() => seedsToSow(10, 50, 1)).toThrow(RangeError);
  });
});
