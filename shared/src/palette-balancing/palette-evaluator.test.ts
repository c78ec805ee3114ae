import { describe, expect, it } from 'vitest';
import { BLOOM_PERIODS } from '../types/recommendation.js';
import { FLOWER_COLOURS } from '../types/species.js';
import { makeObjective } from './objective.js';
import type { HeightTier, PaletteItem } from './palette-item.js';
import { randomInt, seededRandom } from './seeded-random.js';

// Consistency checks, not outside values: the incremental evaluator must give the objective's value.
const GENERA: [string, number][] = [
  ['Solidago', 115],
  ['Asclepias', 12],
  ['Carex', 36],
  ['Quercus', 534],
  ['Zizia', 0],
];
const TIERS: HeightTier[] = ['front', 'middle', 'back'];

function randomItems(seed: number, n: number): PaletteItem[] {
  const rnd = seededRandom(seed);
  return Array.from({ length: n }, (_, i) => {
    const [genus, hostCount] = GENERA[randomInt(rnd, 0, GENERA.length - 1)];
    const graminoid = genus === 'Carex';
    const periods = graminoid ? [] : BLOOM_PERIODS.filter(() => rnd() < 0.5);
    return {
      slug: `s${String(i).padStart(3, '0')}`,
      name: `s${i}`,
      fit: rnd() * 12 - 2,
      periods,
      flowering: periods.length > 0,
      genus,
      hostCount,
      tier: TIERS[randomInt(rnd, 0, 2)],
      graminoid,
      milkweed: genus === 'Asclepias',
      colours: graminoid ? [] : FLOWER_COLOURS.filter(() => rnd() < 0.2),
      // Months in flower, some outside the April–October season the month term counts.
      months: periods.length > 0 ? [3, 4, 5, 6, 7, 8, 9, 10, 11].filter(() => rnd() < 0.4) : [],
    };
  });
}

describe('paletteEvaluator (objective kept up to date one item at a time)', () => {
  it.each([
    [1, 6, true],
    [2, 11, false],
    [3, 25, true],
  ] as const)('seed %i, mix of %i, monarchs %s: equals the objective after every step', (seed, size, monarchsGoal) => {
    const items = randomItems(seed, 40);
    const objective = makeObjective({ size, monarchsGoal });
    const ev = objective.evaluator!(items);
    const inMix = new Set<number>();
    const rnd = seededRandom(seed * 7);
    for (let step = 0; step < 400; step++) {
      const i = randomInt(rnd, 0, items.length - 1);
      if (inMix.has(i)) {
        ev.remove(i);
        inMix.delete(i);
      } else {
        ev.add(i);
        inMix.add(i);
      }
      const mix = [...inMix].sort((a, b) => a - b).map((k) => items[k]);
      expect(ev.value()).toBeCloseTo(objective(mix), 9);
    }
  });

  it('bounds what adding an item can add, to any mix', () => {
    const items = randomItems(4, 30);
    const objective = makeObjective({ size: 8, monarchsGoal: true });
    const ev = objective.evaluator!(items);
    const rnd = seededRandom(11);
    for (let trial = 0; trial < 200; trial++) {
      const mix = items.filter(() => rnd() < 0.3);
      const out = items.filter((i) => !mix.includes(i));
      for (const j of out.slice(0, 5)) {
        const gain = objective([...mix, j].sort((a, b) => (a.slug < b.slug ? -1 : 1))) - objective(mix);
        expect(gain).toBeLessThanOrEqual(ev.gainBounds![items.indexOf(j)] + 1e-9);
      }
    }
  });

  it('falls back to whole-set evaluation when one genus has two caterpillar counts', () => {
    const items = randomItems(5, 10).map((it, k) => ({ ...it, genus: 'Solidago', hostCount: k === 3 ? 99 : 115 }));
    const objective = makeObjective({ size: 4, monarchsGoal: false });
    const ev = objective.evaluator!(items);
    expect(ev.gainBounds).toBeUndefined();
    [1, 3, 7].forEach((i) => ev.add(i));
    expect(ev.value()).toBeCloseTo(objective([items[1], items[3], items[7]]), 9);
  });
});
