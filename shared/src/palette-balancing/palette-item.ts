import type { BloomPeriod, ScoredSpecies } from '../types/recommendation.js';
import type { FlowerColour, Species } from '../types/species.js';
import { factsOf } from '../scoring/species-facts.js';

/** Rows of a bed by mature height (Homeground's rule, on the middle of the record's height range). */
export type HeightTier = 'front' | 'middle' | 'back';
/** Under 2 ft (60 cm) goes in front; over 4 ft (120 cm) at the back. */
export const FRONT_BELOW_CM = 60;
export const BACK_ABOVE_CM = 120;

export function heightTierOf(heightCm: { min: number; max: number }): HeightTier {
  const middle = (heightCm.min + heightCm.max) / 2;
  if (middle < FRONT_BELOW_CM) return 'front';
  if (middle > BACK_ABOVE_CM) return 'back';
  return 'middle';
}

/** What the mix objective needs to know about one candidate, worked out once. */
export interface PaletteItem {
  slug: string;
  /** First common name, for reasons in words. */
  name: string;
  /**
   * Fit score without its host-plant and monarch-host parts: the mix objective counts host value
   * once per genus (every species of a genus shares its count) and milkweeds with diminishing
   * returns, so neither is counted twice.
   */
  fit: number;
  periods: readonly BloomPeriod[];
  /** Months in flower (flowering species only), for the month-by-month bloom rule. */
  months?: readonly number[];
  flowering: boolean;
  genus: string;
  /**
   * Lepidoptera species using the genus (0 when the genus is not listed), on the herbaceous list's
   * scale: woody counts are scaled so host value is weighed within each layer (wildlife-value.ts).
   */
  hostCount: number;
  /** A shrub, tree or vine: chosen as its own layer, on request. */
  woody?: boolean;
  tier: HeightTier;
  colours: readonly FlowerColour[];
  graminoid: boolean;
  milkweed: boolean;
}

export function toPaletteItem(species: Species, scored: ScoredSpecies): PaletteItem {
  let hostPoints = 0;
  for (const p of scored.parts) if (p.name === 'host-plant' || p.name === 'monarch-host') hostPoints += p.points;
  return paletteItemOf(species, scored.score - hostPoints);
}

/**
 * A candidate from its fit (score less host-plant and monarch-host points) and the species' facts,
 * which are worked out once per record (species-facts.ts): this runs for every candidate of every
 * mix, so the item shares the record's lists instead of copying them.
 */
export function paletteItemOf(species: Species, fit: number): PaletteItem {
  const f = factsOf(species);
  return {
    slug: species.slug,
    name: species.commonNames[0],
    fit,
    periods: f.periods,
    months: f.months,
    flowering: f.flowering,
    genus: f.genus,
    hostCount: f.hostCountOnHerbaceousScale,
    woody: f.structural,
    tier: heightTierOf(species.heightCm),
    colours: f.colours,
    graminoid: f.graminoid,
    milkweed: f.milkweed,
  };
}
