import { describe, expect, it } from 'vitest';
import { seasonSpecies as sp } from '../season-planning/season-fixtures.js';
import type { GrowerMethod } from '../types/batch.js';
import { PLANTS_PER_UNIT, unitsFor } from './batch-units.js';
import { methodFit } from './method-fit.js';
import { proposeBatchSplit, type SplitGrower, type SplitTarget } from './propose-split.js';

// Treatments follow CHECK-VALUES.md §1: Solidago speciosa CMS 60 d (from memory, M), Asclepias
// incarnata minimum CMS 7 d (NPN-ASIN, R; the record holds 30), Rudbeckia hirta no pretreatment (M),
// Baptisia australis scarification (BH05, R). Capacities are invented test values.
const goldenrod = sp({
  slug: 'solidago-speciosa',
  scientificName: 'Solidago speciosa',
  germination: { treatments: [{ kind: 'cold-moist', days: 60 }] },
});
const swampMilkweed = sp({
  slug: 'asclepias-incarnata',
  scientificName: 'Asclepias incarnata',
  germination: { treatments: [{ kind: 'cold-moist', days: 30 }] },
});
const susan = sp({
  slug: 'rudbeckia-hirta',
  scientificName: 'Rudbeckia hirta',
  germination: { treatments: [{ kind: 'none' }], methods: ['indoor-lights', 'soil-blocks', 'winter-sowing'] },
});
const indigo = sp({
  slug: 'baptisia-australis',
  scientificName: 'Baptisia australis',
  germination: { treatments: [{ kind: 'scarification' }], methods: ['indoor-lights', 'outdoor-pot-winter'] },
});
const outdoorOnly = sp({
  slug: 'viola-canadensis',
  scientificName: 'Viola canadensis',
  germination: { treatments: [{ kind: 'cold-moist', days: 60 }], methods: ['outdoor-pot-winter'] },
});

const juniper: SplitGrower = { growerId: 'juniper', methods: [{ method: 'winter-sowing', capacity: 12 }] };
const theo: SplitGrower = {
  growerId: 'theo',
  methods: [
    { method: 'indoor-lights', capacity: 72 },
    { method: 'soil-blocks', capacity: 40 },
  ],
};
const amara: SplitGrower = { growerId: 'amara', methods: [{ method: 'outdoor-pot-winter', capacity: 60 }] };
const growers = [juniper, theo, amara];

/** Units each grower's batches take per method, to compare with what they said they can tend. */
function unitsUsed(batches: { growerId: string; method: GrowerMethod; plants: number }[]) {
  const used = new Map<string, number>();
  for (const b of batches)
    used.set(`${b.growerId}|${b.method}`, (used.get(`${b.growerId}|${b.method}`) ?? 0) + unitsFor(b.method, b.plants));
  return used;
}

function assertInvariants(targets: SplitTarget[], gs: SplitGrower[]) {
  const split = proposeBatchSplit(targets, gs);
  // Never over a grower's stated capacity for a method.
  for (const [key, units] of unitsUsed(split.batches)) {
    const [growerId, method] = key.split('|');
    const cap = gs.find((g) => g.growerId === growerId)!.methods.find((m) => m.method === method)!.capacity;
    expect(units).toBeLessThanOrEqual(cap);
  }
  // Every plant of every target is in a batch or reported unassigned.
  for (const t of targets) {
    const placed = split.batches.filter((b) => b.slug === t.species.slug).reduce((a, b) => a + b.plants, 0);
    const left = split.unassigned.filter((u) => u.slug === t.species.slug).reduce((a, u) => a + u.plants, 0);
    expect(placed + left).toBe(t.targetPlants);
  }
  // Only methods the species' record lists.
  for (const b of split.batches) {
    const species = targets.find((t) => t.species.slug === b.slug)!.species;
    expect(species.germination.methods).toContain(b.method);
  }
  return split;
}

describe('methodFit (common practice, from memory; CMS lengths from CHECK-VALUES §1)', () => {
  it('prefers winter sowing for 60 days of cold-moist stratification, indoors for seed with no cold need', () => {
    expect(methodFit(goldenrod, 'winter-sowing').rank).toBeLessThan(methodFit(goldenrod, 'indoor-lights').rank);
    expect(methodFit(susan, 'indoor-lights').rank).toBeLessThan(methodFit(susan, 'winter-sowing').rank);
    expect(methodFit(indigo, 'soil-blocks').fits).toBe(false); // not on its record
    expect(methodFit(goldenrod, 'winter-sowing').why).toMatch(/60 days of cold-moist/);
  });
});

describe('proposeBatchSplit', () => {
  it('sends long-cold seed outdoors and no-cold seed indoors when there is room', () => {
    const split = assertInvariants(
      [
        { species: goldenrod, targetPlants: 50 },
        { species: susan, targetPlants: 50 },
      ],
      growers,
    );
    expect(split.batches.find((b) => b.slug === 'solidago-speciosa')).toMatchObject({
      growerId: 'juniper',
      method: 'winter-sowing',
      units: 5, // 50 plants ÷ 10 per container (common practice)
    });
    expect(split.batches.find((b) => b.slug === 'rudbeckia-hirta')).toMatchObject({
      growerId: 'theo',
      method: 'indoor-lights',
    });
    expect(split.unassigned).toEqual([]);
  });

  it('spills over to the next grower when the best one is full, never past capacity', () => {
    const split = assertInvariants([{ species: goldenrod, targetPlants: 200 }], growers);
    // 12 containers × 10 = 120 with Juniper; the rest outdoors in Amara's pots (60), then indoors.
    expect(split.batches.map((b) => [b.growerId, b.method, b.plants])).toEqual([
      ['juniper', 'winter-sowing', 120],
      ['amara', 'outdoor-pot-winter', 60],
      ['theo', 'indoor-lights', 20],
    ]);
  });

  it('places the species with fewest options first, and reports what does not fit', () => {
    const split = assertInvariants(
      [
        { species: swampMilkweed, targetPlants: 100 },
        { species: outdoorOnly, targetPlants: 80 },
      ],
      [amara, theo],
    );
    // The violet can only go in Amara's pots, so it is placed first even though its target is smaller.
    expect(split.batches.find((b) => b.slug === 'viola-canadensis')).toMatchObject({ growerId: 'amara', plants: 60 });
    expect(split.batches.find((b) => b.slug === 'asclepias-incarnata')).toMatchObject({ growerId: 'theo', plants: 72 });
    expect(split.unassigned).toEqual([
      expect.objectContaining({ slug: 'viola-canadensis', plants: 20, reason: expect.stringMatching(/no room left/) }),
      expect.objectContaining({ slug: 'asclepias-incarnata', plants: 28 }),
    ]);
  });

  it('says when no grower uses a method the record lists', () => {
    const split = assertInvariants([{ species: outdoorOnly, targetPlants: 10 }], [theo]);
    expect(split.batches).toEqual([]);
    expect(split.unassigned[0].reason).toMatch(/No grower uses a method that suits it; its record lists outdoor pots/);
  });

  it.each([
    [[3, 7, 11], 1],
    [[40, 1, 99], 2],
    [[250, 250, 250], 3],
  ])('keeps the invariants for targets %j (case %d)', (plants) => {
    const targets = [goldenrod, susan, indigo].map((species, i) => ({ species, targetPlants: plants[i] }));
    assertInvariants(targets, growers);
  });

  it('counts winter-sowing containers at 10 plants each (common practice)', () => {
    expect(PLANTS_PER_UNIT['winter-sowing']).toBe(10);
    expect(unitsFor('winter-sowing', 41)).toBe(5);
  });
});
