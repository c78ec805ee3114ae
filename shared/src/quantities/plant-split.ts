import type { Species } from '../types/species.js';
import { roundTo, squareFeetToSquareMetres } from '../units/conversions.js';
import { isStructural, woodyShare } from '../scoring/layers.js';
import { defaultSpacingIn, describeSpacing, type Spacing } from './spacing.js';

/**
 * Grasses and sedges take this share of the herbaceous area between them when the mix has any
 * (Homeground's rule, common practice: prairie-style plantings often run a third or more grass,
 * which fills gaps and keeps weeds down; a yard mix leans to flowers).
 */
export const DEFAULT_GRASS_SHARE = 0.3;
/**
 * Herbaceous species get at least this many plants when the area allows it: fewer reads as a
 * stray plant, not part of the design (common practice). Never a fixed minimum for woody plants,
 * and never one that would overfill the bed.
 */
export const MIN_PLANTS_PER_SPECIES = 3;

export interface SpeciesPlanting extends Spacing {
  slug: string;
  /** The area the species' plants take: plants × spacing². */
  areaSqFt: number;
  areaSqM: number;
  plants: number;
}

type PlantFacts = Pick<Species, 'slug' | 'growthForm' | 'spreadCm'> & Partial<Pick<Species, 'scientificName'>>;

const woodyOf = (s: PlantFacts) => isStructural({ growthForm: s.growthForm, scientificName: s.scientificName ?? '' });

/**
 * How many plants of each species a bed takes, so that Σ plants × spacing² never exceeds the bed.
 * Woody plants (on request) share their part of the bed (woodyShare), each at least one plant, as
 * many as fit at their spacing; the herbaceous area left is split between grasses (a set share)
 * and the other species, equally within each group; each gets area × 144 ÷ spacing² plants,
 * rounded down (rounding up is how beds got overfilled), at least 3 where 3 fit.
 */
export function plantsPerSpecies(
  mix: readonly PlantFacts[],
  areaSqFt: number,
  options: { grassShare?: number; spacingIn?: Record<string, number> } = {},
): SpeciesPlanting[] {
  const spacingOf = (s: PlantFacts) => describeSpacing(options.spacingIn?.[s.slug] ?? defaultSpacingIn(s));
  const woody = mix.filter(woodyOf);
  const herbs = mix.filter((s) => !woodyOf(s));
  const plantsBySlug = new Map<string, number>();
  // Woody first: one plant each at least (the user chose them), then as many as their share holds.
  const woodyArea = herbs.length === 0 ? areaSqFt : woodyShare(areaSqFt) * areaSqFt;
  let woodyUsed = 0;
  for (const s of woody) {
    const sq = spacingOf(s).spacingIn ** 2 / 144;
    const plants = Math.max(1, Math.floor(roundTo(woodyArea / woody.length / sq, 6)));
    plantsBySlug.set(s.slug, plants);
    woodyUsed += plants * sq;
  }
  const herbArea = Math.max(0, areaSqFt - woodyUsed);
  const grasses = herbs.filter((s) => s.growthForm === 'graminoid');
  const others = herbs.filter((s) => s.growthForm !== 'graminoid');
  const share = grasses.length === 0 ? 0 : others.length === 0 ? 1 : (options.grassShare ?? DEFAULT_GRASS_SHARE);
  for (const s of herbs) {
    const isGrass = s.growthForm === 'graminoid';
    const area = (herbArea * (isGrass ? share : 1 - share)) / (isGrass ? grasses : others).length;
    const sq = spacingOf(s).spacingIn ** 2 / 144;
    // Round before floor so float noise (24.999999999) does not drop a plant.
    const fits = Math.floor(roundTo(area / sq, 6));
    plantsBySlug.set(
      s.slug,
      fits >= MIN_PLANTS_PER_SPECIES ? fits : Math.min(MIN_PLANTS_PER_SPECIES, Math.max(1, fits)),
    );
  }
  trimToBed(mix, plantsBySlug, spacingOf, areaSqFt);
  return mix.map((s) => {
    const spacing = spacingOf(s);
    const plants = plantsBySlug.get(s.slug) ?? 0;
    const area = (plants * spacing.spacingIn ** 2) / 144;
    return { slug: s.slug, areaSqFt: area, areaSqM: squareFeetToSquareMetres(area), ...spacing, plants };
  });
}

/**
 * A bed too small for one plant of each species would still overflow: take plants from the species
 * with most until it fits, never below one plant (the user still gets every species they chose,
 * and the total says it is over).
 */
function trimToBed(
  mix: readonly PlantFacts[],
  plants: Map<string, number>,
  spacingOf: (s: PlantFacts) => Spacing,
  areaSqFt: number,
): void {
  const sq = (s: PlantFacts) => spacingOf(s).spacingIn ** 2 / 144;
  let total = mix.reduce((sum, s) => sum + (plants.get(s.slug) ?? 0) * sq(s), 0);
  while (total > areaSqFt + 1e-6) {
    let most: PlantFacts | undefined;
    for (const s of mix)
      if ((plants.get(s.slug) ?? 0) > 1 && (!most || (plants.get(s.slug) ?? 0) > (plants.get(most.slug) ?? 0)))
        most = s;
    if (!most) return;
    plants.set(most.slug, (plants.get(most.slug) ?? 0) - 1);
    total -= sq(most);
  }
}

/** Σ plants × spacing², the ground the planted mix covers, in ft² (≤ the bed unless it cannot hold one of each). */
export function totalFootprintSqFt(plantings: readonly Pick<SpeciesPlanting, 'plants' | 'spacingIn'>[]): number {
  let sum = 0;
  for (const p of plantings) sum += (p.plants * p.spacingIn ** 2) / 144;
  return roundTo(sum, 2);
}
