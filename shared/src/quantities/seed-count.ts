import { GRAMS_PER_POUND, gramsToOunces } from '../units/conversions.js';

/**
 * Seedlings lost between germination and planting out (damping off, transplanting, thinning), as a
 * fraction. 0.2 is a common planning allowance among native-plant growers (common-practice); pass
 * your own from the batch log once you have one.
 */
export const DEFAULT_LOSS_FACTOR = 0.2;

/**
 * Seeds to sow for a number of plants: plants ÷ (germination rate × (1 − loss factor)), rounded
 * up. E.g. 10 plants at 60 % germination and 20 % loss: 10 ÷ (0.6 × 0.8) = 20.8 → 21 seeds.
 */
export function seedsToSow(plantsWanted: number, germinationRatePct: number, lossFactor = DEFAULT_LOSS_FACTOR): number {
  if (germinationRatePct <= 0 || germinationRatePct > 100)
    throw new RangeError('germinationRatePct must be in (0, 100]');
  if (lossFactor < 0 || lossFactor >= 1) throw new RangeError('lossFactor must be in [0, 1)');
  const perSeed = (germinationRatePct / 100) * (1 - lossFactor);
  return Math.ceil(Math.round((plantsWanted / perSeed) * 1e6) / 1e6);
}

export interface SeedWeight {
  grams: number;
  ounces: number;
  pounds: number;
}

/** Weight of a number of seeds from the seeds-per-pound figure (1 lb = 453.59237 g, 16 oz). */
export function seedWeight(seeds: number, seedsPerPound: number): SeedWeight {
  const pounds = seeds / seedsPerPound;
  const grams = pounds * GRAMS_PER_POUND;
  return { grams, ounces: gramsToOunces(grams), pounds };
}
