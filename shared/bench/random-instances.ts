import { makeObjective, type Objective } from '../src/palette-balancing/objective.js';
import type { HeightTier, PaletteItem } from '../src/palette-balancing/palette-item.js';
import { randomInt, seededRandom } from '../src/palette-balancing/seeded-random.js';
import { BLOOM_PERIODS } from '../src/types/recommendation.js';
import { FLOWER_COLOURS } from '../src/types/species.js';

/**
 * Seeded optimiser instances like optimiser.test.ts's, at a chosen size: genera with their
 * caterpillar counts (tallamy-shropshire-2009 as the catalogue stores them), one grass in five.
 */
const GENERA: [string, number][] = [
  ['Solidago', 115],
  ['Symphyotrichum', 112],
  ['Asclepias', 12],
  ['Monarda', 7],
  ['Carex', 36],
  ['Zizia', 4],
];
const TIERS: HeightTier[] = ['front', 'middle', 'back'];

export interface Instance {
  items: PaletteItem[];
  size: number;
  objective: Objective<PaletteItem>;
}

export function randomInstance(seed: number, minItems: number, maxItems: number, size: number): Instance {
  const rnd = seededRandom(seed);
  const n = randomInt(rnd, minItems, maxItems);
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
  return { items, size, objective: makeObjective({ size, monarchsGoal: rnd() < 0.5 }) };
}
