import { describe, expect, it } from 'vitest';
import { BLOOM_PERIODS } from '../types/recommendation.js';
import { FLOWER_COLOURS } from '../types/species.js';
import { exhaustiveBest } from './exhaustive.js';
import { makeObjective } from './objective.js';
import { optimiseSelection } from './optimiser.js';
import type { HeightTier, PaletteItem } from './palette-item.js';
import { randomInt, seededRandom } from './seeded-random.js';

const GENERA: [string, number][] = [
  ['Solidago', 115],
  ['Symphyotrichum', 112],
  ['Asclepias', 12],
  ['Monarda', 7],
  ['Carex', 36],
  ['Zizia', 4],
];
const TIERS: HeightTier[] = ['front', 'middle', 'back'];

/** A random but plausible candidate list, reproducible from its seed. */
function randomInstance(seed: number) {
  const rnd = seededRandom(seed);
  const n = randomInt(rnd, 12, 14);
  const items: PaletteItem[] = Array.from({ length: n }, (_, i) => {
    const graminoid = rnd() < 0.2;
    const [genus, hostCount] = graminoid ? GENERA[4] : GENERA[randomInt(rnd, 0, GENERA.length - 1)];
    const periods = graminoid ? [] : BLOOM_PERIODS.filter(() => rnd() < 0.45);
    return {
      slug: `s${String(i).padStart(2, '0')}`,
      name: `species ${i}`,
      fit: 5 + rnd() * 10,
      periods,
      flowering: periods.length > 0,
      genus,
      hostCount,
      tier: TIERS[randomInt(rnd, 0, 2)],
      colours: graminoid ? [] : [FLOWER_COLOURS[randomInt(rnd, 0, 5)]],
      graminoid,
      milkweed: genus === 'Asclepias',
    };
  });
  const size = randomInt(rnd, 5, 6);
  return { items, size, objective: makeObjective({ size, monarchsGoal: rnd() < 0.5 }) };
}

describe('optimiseSelection vs exhaustive optimum (50 seeded instances, 12–14 candidates, N = 5–6)', () => {
  it('reaches at least 0.99 of the true optimum on every instance', () => {
    let minRatio = Infinity;
    let exact = 0;
    for (let seed = 1; seed <= 50; seed++) {
      const { items, size, objective } = randomInstance(seed);
      const found = optimiseSelection(items, size, objective);
      const best = exhaustiveBest(items, size, objective);
      expect(found.chosen).toHaveLength(size);
      const ratio = found.value / best.value;
      minRatio = Math.min(minRatio, ratio);
      if (Math.abs(found.value - best.value) < 1e-9) exact++;
      expect(ratio, `seed ${seed}`).toBeGreaterThanOrEqual(0.99);
    }
    console.info(
      `optimiser/exhaustive: minimum ratio ${minRatio.toFixed(4)} over 50 instances; ${exact} exactly optimal`,
    );
  });
});

describe('optimiseSelection: determinism, locks and exclusions', () => {
  const { items, size, objective } = randomInstance(7);

  it('gives the same answer for the same input, in any input order', () => {
    const a = optimiseSelection(items, size, objective);
    const b = optimiseSelection([...items].reverse(), size, objective);
    expect(b).toEqual(a);
  });

  it('always keeps locked items and never takes excluded ones', () => {
    const free = optimiseSelection(items, size, objective).chosen.map((i) => i.slug);
    const unchosen = items.map((i) => i.slug).filter((s) => !free.includes(s));
    const locked = unchosen.slice(0, 2);
    const excluded = [free[0], free[1]];
    const r = optimiseSelection(items, size, objective, { locked, excluded });
    const slugs = r.chosen.map((i) => i.slug);
    expect(slugs).toEqual(expect.arrayContaining(locked));
    for (const x of excluded) expect(slugs).not.toContain(x);
    expect(slugs).toHaveLength(size);
  });
});

describe('exhaustiveBest', () => {
  it('finds the best pair on a hand-checked list', () => {
    const items = [
      { slug: 'a', v: 1 },
      { slug: 'b', v: 5 },
      { slug: 'c', v: 3 },
    ];
    const best = exhaustiveBest(items, 2, (s) => s.reduce((t, i) => t + i.v, 0));
    expect(best.chosen.map((i) => i.slug)).toEqual(['b', 'c']);
    expect(best.value).toBe(8);
  });
});
