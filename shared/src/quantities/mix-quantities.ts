import type { MixQuantity } from '../types/mix-api.js';
import type { Species } from '../types/species.js';
import { roundTo } from '../units/conversions.js';
import { plantsPerSpecies, totalFootprintSqFt } from './plant-split.js';
import { plantingMethodFor } from './planting-method.js';
import { seedingPlan, type SeedingLine } from './seeding-plan.js';
import { DEFAULT_LOSS_FACTOR, seedsToSow, seedWeight } from './seed-count.js';

/**
 * Plants per species for the bed (grasses a set share, spacing from the spread), then seeds to sow
 * from each species' germination rate and the loss factor, and their weight.
 */
export function mixQuantities(
  species: readonly Species[],
  areaSqFt: number,
  options: { lossFactor?: number; spacingIn?: Record<string, number>; grassShare?: number } = {},
): MixQuantity[] {
  const lossFactor = options.lossFactor ?? DEFAULT_LOSS_FACTOR;
  const plantings = plantsPerSpecies(species, areaSqFt, {
    spacingIn: options.spacingIn,
    grassShare: options.grassShare,
  });
  return plantings.map((p, i) => {
    const s = species[i];
    const seeds = seedsToSow(p.plants, s.germination.germinationRatePct, lossFactor);
    const weight = s.germination.seedsPerPound ? seedWeight(seeds, s.germination.seedsPerPound) : null;
    return {
      slug: p.slug,
      plants: p.plants,
      spacingIn: p.spacingIn,
      spacingCm: p.spacingCm,
      areaSqFt: roundTo(p.areaSqFt, 1),
      areaSqM: roundTo(p.areaSqM, 2),
      seedsToSow: seeds,
      seedWeight: weight && { grams: roundTo(weight.grams, 3), ounces: roundTo(weight.ounces, 4) },
    };
  });
}

/** The whole planting: plants by count with their total footprint, and for a meadow the seeding plan. */
export function mixPlanting(
  species: readonly Species[],
  areaSqFt: number,
  options: { lossFactor?: number } = {},
): { quantities: MixQuantity[]; totalFootprintSqFt: number; seeding: SeedingLine[] | null } {
  const quantities = mixQuantities(species, areaSqFt, options);
  const seeding =
    plantingMethodFor(areaSqFt) === 'seeding'
      ? seedingPlan(species, areaSqFt).map((l) => ({
          ...l,
          seed: l.seed && {
            grams: roundTo(l.seed.grams, 1),
            ounces: roundTo(l.seed.ounces, 2),
            pounds: roundTo(l.seed.pounds, 3),
          },
        }))
      : null;
  return { quantities, totalFootprintSqFt: totalFootprintSqFt(quantities), seeding };
}
