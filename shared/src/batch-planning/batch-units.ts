import type { GrowerMethod } from '../types/batch.js';

/** What a grower counts their capacity in, for each method. */
export type BatchUnit = 'pot' | 'container' | 'block';

export const UNIT_OF: Record<GrowerMethod, BatchUnit> = {
  'outdoor-pot-winter': 'pot',
  'winter-sowing': 'container',
  'indoor-lights': 'pot',
  'soil-blocks': 'block',
};

/**
 * Plants one unit gives (common practice, from memory): a pot or a 2 in (5 cm) soil block ends as
 * one plant to give; a covered winter-sowing container (a gallon jug or a deep tray) is sown with
 * one species and gives a clump of about 10 seedlings worth potting up.
 */
export const PLANTS_PER_UNIT: Record<GrowerMethod, number> = {
  'outdoor-pot-winter': 1,
  'winter-sowing': 10,
  'indoor-lights': 1,
  'soil-blocks': 1,
};

/** Units a batch of `plants` takes: whole pots, containers or blocks. */
export function unitsFor(method: GrowerMethod, plants: number): number {
  return Math.ceil(plants / PLANTS_PER_UNIT[method]);
}

/** Most plants that fit in `units` of a method. */
export function plantsIn(method: GrowerMethod, units: number): number {
  return Math.max(0, units) * PLANTS_PER_UNIT[method];
}
