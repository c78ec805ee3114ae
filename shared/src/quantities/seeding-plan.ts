import type { Species } from '../types/species.js';
import { roundTo, perSquareFootToPerSquareMetre } from '../units/conversions.js';
import { seedWeight, type SeedWeight } from './seed-count.js';

/**
 * A meadow's seeding plan by seeds/ft² instead of plug counts. Total rate: 40 PLS seeds/ft², the
 * rate of the NRCS Elsberry PMC monarch demonstration seeding (20 and 40 seeds/ft², CHECK-VALUES §3,
 * R) and within the 40–60 seeds/ft² typical of small pollinator meadows (§3, from memory, M).
 * Grasses and sedges take 40 % of the seeds when the mix has any (common practice: enough to knit
 * the sod, few enough that forbs hold their own), the rest split equally among the other species.
 */
export const MEADOW_SEEDS_PER_SQ_FT = 40;
export const MEADOW_GRASS_SEED_SHARE = 0.4;

export interface SeedingLine {
  slug: string;
  seedsPerSqFt: number;
  seedsPerSqM: number;
  /** PLS weight for the whole area; null when the catalogue has no seeds-per-pound figure. */
  seed: SeedWeight | null;
}

export function seedingPlan(
  mix: readonly Pick<Species, 'slug' | 'growthForm' | 'germination'>[],
  areaSqFt: number,
  totalSeedsPerSqFt = MEADOW_SEEDS_PER_SQ_FT,
): SeedingLine[] {
  const grasses = mix.filter((s) => s.growthForm === 'graminoid');
  const others = mix.filter((s) => s.growthForm !== 'graminoid');
  const share = grasses.length === 0 ? 0 : others.length === 0 ? 1 : MEADOW_GRASS_SEED_SHARE;
  return mix.map((s) => {
    const isGrass = s.growthForm === 'graminoid';
    const rate = (totalSeedsPerSqFt * (isGrass ? share : 1 - share)) / (isGrass ? grasses : others).length;
    const perLb = s.germination.seedsPerPound;
    return {
      slug: s.slug,
      seedsPerSqFt: roundTo(rate, 2),
      seedsPerSqM: roundTo(perSquareFootToPerSquareMetre(rate), 1),
      seed: perLb ? seedWeight(rate * areaSqFt, perLb) : null,
    };
  });
}
