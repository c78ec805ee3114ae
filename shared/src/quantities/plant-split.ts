import type { Species } from '../types/species.js';
import { roundTo, squareFeetToSquareMetres } from '../units/conversions.js';
import { defaultSpacingIn, describeSpacing, type Spacing } from './spacing.js';

/**
 * Grasses and sedges take this share of the bed between them when the mix has any (Homeground's
 * rule, common practice: prairie-style plantings often run a third or more grass, which fills gaps
 * and keeps weeds down; a yard mix leans to flowers). Flowers and woody plants share the rest.
 */
export const DEFAULT_GRASS_SHARE = 0.3;
/** Fewer than 3 of a kind reads as a stray plant, not part of the design (common practice). */
export const MIN_PLANTS_PER_SPECIES = 3;

export interface SpeciesPlanting extends Spacing {
  slug: string;
  areaSqFt: number;
  areaSqM: number;
  plants: number;
}

/**
 * How many plants of each species a bed takes. The area is split first between grasses (a set
 * share) and everything else, then equally among the species of each group; each species' plants
 * = its area × 144 ÷ spacing², rounded up, and at least 3. A mix that is all grass, or has none,
 * gives the whole bed to what it has.
 */
export function plantsPerSpecies(
  mix: readonly Pick<Species, 'slug' | 'growthForm' | 'spreadCm'>[], areaSqFt: number,
  options: { grassShare?: number; spacingIn?: Record<string, number> } = {},
): SpeciesPlanting[] {
  const grasses = mix.filter((s) => s.growthForm === 'graminoid');
  const others = mix.filter((s) => s.growthForm !== 'graminoid');
  const share = grasses.length === 0 ? 0 : others.length === 0 ? 1 : (options.grassShare ?? DEFAULT_GRASS_SHARE);
  return mix.map((s) => {
    const group = s.growthForm === 'graminoid' ? grasses : others;
    const groupShare = s.growthForm === 'graminoid' ? share : 1 - share;
    const area = (areaSqFt * groupShare) / group.length;
    const spacing = describeSpacing(options.spacingIn?.[s.slug] ?? defaultSpacingIn(s));
    // Round before ceil so float noise (e.g. 25.000000000004) does not add a plant.
    const plants = Math.max(MIN_PLANTS_PER_SPECIES, Math.ceil(roundTo(area * spacing.plantsPerSqFt, 6)));
    return { slug: s.slug, areaSqFt: area, areaSqM: squareFeetToSquareMetres(area), ...spacing, plants };
  });
}
