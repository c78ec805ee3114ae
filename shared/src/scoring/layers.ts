import type { Species } from '../types/species.js';
import { squareMetresToSquareFeet } from '../units/conversions.js';
import { genusOf } from './genus.js';

/**
 * The two layers of a planting. A yard mix is herbaceous (wildflowers, grasses and sedges, ferns);
 * shrubs, trees and woody vines are a layer the user asks for. Caterpillar host counts are
 * published as two separate lists, one per layer (Tallamy's herbaceous and woody lists,
 * CHECK-VALUES §2, genera marked h or w), so host value is compared within a layer only.
 */
export type PlantLayer = 'herbaceous' | 'woody';

/**
 * Vines of genera on the herbaceous list (CHECK-VALUES §2 marks Ipomoea h) or that die back each
 * winter (from memory): they climb, but belong with the wildflowers for host value.
 */
const HERBACEOUS_VINE_GENERA: ReadonlySet<string> = new Set([
  'Ipomoea',
  'Apios',
  'Echinocystis',
  'Sicyos',
  'Mikania',
  'Amphicarpaea',
  'Clitoria',
  'Strophostyles',
  'Dioscorea',
  'Cuscuta',
  'Galactia',
  'Passiflora',
]);

export function layerOf(species: Pick<Species, 'growthForm' | 'scientificName'>): PlantLayer {
  const form = species.growthForm;
  if (form === 'shrub' || form === 'tree') return 'woody';
  if (form === 'vine') return HERBACEOUS_VINE_GENERA.has(genusOf(species)) ? 'herbaceous' : 'woody';
  return 'herbaceous';
}

/** Any vine needs a support, so vines come with the woody layer, on request, whichever list hosts them. */
export function isStructural(species: Pick<Species, 'growthForm' | 'scientificName'>): boolean {
  return species.growthForm === 'vine' || layerOf(species) === 'woody';
}

/**
 * Share of the bed the woody layer may take when asked for (Homeground's rule, common practice in
 * mixed borders: shrubs as a backbone, most of a small bed left to perennials). Beds under 100 ft²
 * get none: one shrub would be most of the bed.
 */
export const WOODY_MIN_BED_SQ_FT = 100;
export function woodyShare(areaSqFt: number): number {
  if (areaSqFt < WOODY_MIN_BED_SQ_FT) return 0;
  return areaSqFt <= 500 ? 0.25 : 0.35;
}

/** Woody species in a mix that asks for them: 1 up to 500 ft², then one more per 500 ft², at most 6 (Homeground's rule). */
export function woodySpeciesFor(areaSqFt: number): number {
  if (areaSqFt < WOODY_MIN_BED_SQ_FT) return 0;
  return Math.min(6, Math.max(1, Math.ceil(areaSqFt / 500)));
}

/** A plant's mature footprint in ft²: a circle as wide as the narrow end of its spread (as checkRoom measures it). */
export function matureFootprintSqFt(species: Pick<Species, 'spreadCm'>): number {
  return squareMetresToSquareFeet(Math.PI * (species.spreadCm.min / 200) ** 2);
}

/** The beds where aggressive spreaders and heavy self-sowers are left out unless asked for (Homeground's rule). */
export const SMALL_BED_SQ_FT = 500;
