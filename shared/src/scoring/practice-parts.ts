import type { ScorePart } from '../types/recommendation.js';
import type { Site } from '../types/site.js';
import { type Species, type CommercialAvailability } from '../types/species.js';
import { SMALL_BED_SQ_FT, layerOf } from './layers.js';
import { formatHeightCm } from '../units/format-units.js';
import { plantingMethodFor } from '../quantities/planting-method.js';
import { commercialAvailabilityOf } from './species-traits.js';
import { beeWords, caterpillarWords, hostLevelOf, hostsSpecialistBees } from './wildlife-value.js';
import { PartCache, sharedPart } from './word-cache.js';

// Parts below repeat across a catalogue; each wording is made once and shared (see word-cache.ts).
const availabilityParts = new PartCache<string>();
const hostPartsByWords = new PartCache<string>();
const beeParts = new PartCache<string>();
const SEED_EASE_PART = sharedPart({ name: 'seed-ease', points: 0.5, reason: 'Easy to raise from seed.' });
const STAPLE_PART = sharedPart({
  name: 'availability',
  points: 1.5,
  reason: 'Easy to find: native-plant nurseries commonly sell it.',
});

/** Garden-practice and wildlife parts: whether plants or seed can be had, ease from seed, host value within the layer, bees. */

const AVAILABILITY: Record<CommercialAvailability, { points: number; reason: string }> = {
  routine: { points: 1.5, reason: 'Seed and plants are commonly sold (USDA commercial availability).' },
  'contract-only': { points: -0.25, reason: 'Seed is grown mostly on contract, so plants can be hard to find.' },
  'field-collection-only': {
    points: -0.75,
    reason: 'Seed is only collected from the wild, so plants can be hard to buy.',
  },
  'none-known': { points: -1, reason: 'USDA knows no commercial source: it may be hard to buy as seed or plants.' },
};

/**
 * Staples of native-plant nurseries in the East and Midwest, sold as plugs nearly everywhere
 * (common practice, from memory). Used only while a record has no USDA availability value.
 */
const NURSERY_STAPLES: ReadonlySet<string> = new Set([
  'Asclepias tuberosa',
  'Asclepias incarnata',
  'Asclepias syriaca',
  'Asclepias verticillata',
  'Echinacea purpurea',
  'Echinacea pallida',
  'Rudbeckia fulgida',
  'Monarda fistulosa',
  'Monarda didyma',
  'Liatris spicata',
  'Liatris aspera',
  'Liatris pycnostachya',
  'Symphyotrichum novae-angliae',
  'Symphyotrichum laeve',
  'Symphyotrichum oblongifolium',
  'Symphyotrichum cordifolium',
  'Solidago speciosa',
  'Solidago rigida',
  'Solidago nemoralis',
  'Solidago caesia',
  'Solidago flexicaulis',
  'Eutrochium maculatum',
  'Eutrochium purpureum',
  'Eupatorium perfoliatum',
  'Lobelia cardinalis',
  'Lobelia siphilitica',
  'Iris versicolor',
  'Iris virginica',
  'Verbena hastata',
  'Chelone glabra',
  'Vernonia fasciculata',
  'Penstemon digitalis',
  'Penstemon hirsutus',
  'Zizia aurea',
  'Pycnanthemum virginianum',
  'Pycnanthemum tenuifolium',
  'Dalea purpurea',
  'Amorpha canescens',
  'Baptisia australis',
  'Schizachyrium scoparium',
  'Sporobolus heterolepis',
  'Bouteloua curtipendula',
  'Andropogon gerardii',
  'Sorghastrum nutans',
  'Panicum virgatum',
  'Elymus canadensis',
  'Carex pensylvanica',
  'Carex vulpinoidea',
  'Carex stricta',
  'Carex muskingumensis',
  'Aquilegia canadensis',
  'Geranium maculatum',
  'Polemonium reptans',
  'Tiarella cordifolia',
  'Phlox divaricata',
  'Mertensia virginica',
  'Packera aurea',
  'Osmundastrum cinnamomeum',
  'Matteuccia struthiopteris',
  'Athyrium filix-femina',
  'Polystichum acrostichoides',
  'Adiantum pedatum',
  'Onoclea sensibilis',
  'Coreopsis lanceolata',
  'Ratibida pinnata',
  'Silphium perfoliatum',
  'Heliopsis helianthoides',
  'Allium cernuum',
  'Tradescantia ohiensis',
  'Veronicastrum virginicum',
  'Eryngium yuccifolium',
  'Asarum canadense',
]);

/**
 * USDA's availability value where it has one; the penalties are mild because the USDA field lags the
 * trade (many species it knows no source for are now grown by native-plant nurseries), and a nursery
 * staple (the table above) is never marked hard to buy.
 */
export function availabilityPart(species: Species): ScorePart | null {
  const a = commercialAvailabilityOf(species);
  const staple = NURSERY_STAPLES.has(species.scientificName);
  if (a !== null && (a === 'routine' || !staple))
    return availabilityParts.get(a) ?? availabilityParts.keep(a, { name: 'availability', ...AVAILABILITY[a] });
  return staple ? STAPLE_PART : null;
}

/**
 * No availability on record (USDA PLANTS gives none and it is no nursery staple): for a bed planted
 * as plugs this ranks below species known to be sold, as none-known does, since a homeowner has
 * to find the plants. A meadow is sown from seed mixes, where the record's silence says less, so
 * it costs nothing there (Homeground's rule).
 */
const UNKNOWN_AVAILABILITY_PART = sharedPart({
  name: 'availability',
  points: AVAILABILITY['none-known'].points,
  reason:
    'No commercial source is on record for it: plants may be hard to find, so ask native-plant nurseries near you.',
});

export function unknownAvailabilityPart(site: Site): ScorePart | null {
  return plantingMethodFor(site.areaSqFt) === 'plugs' ? UNKNOWN_AVAILABILITY_PART : null;
}

/**
 * Species grown as lawn or between stepping stones, where feet keep taller plants out (common
 * practice, from memory): path rush of trampled paths and lawns, buffalograss of shortgrass turf.
 * They take being walked on and little else asks that of them, so in a bed planted as plugs they
 * belong on its path or edge, not among its lead species.
 */
const LAWN_AND_PATH_SPECIES: ReadonlySet<string> = new Set(['Juncus tenuis', 'Bouteloua dactyloides']);
const LAWN_AND_PATH_PART = sharedPart({
  name: 'garden-use',
  points: -3,
  reason: 'A plant for paths and lawns, where it takes being walked on: in a flower bed keep it to the path or edge.',
});

export function isLawnOrPathPlant(species: Pick<Species, 'scientificName'>): boolean {
  return LAWN_AND_PATH_SPECIES.has(species.scientificName);
}

export function gardenUsePart(species: Species, site: Site): ScorePart | null {
  if (plantingMethodFor(site.areaSqFt) !== 'plugs' || !isLawnOrPathPlant(species)) return null;
  return LAWN_AND_PATH_PART;
}

/** Easy from seed: no treatment, or a cold-moist spell of two months at most (the trade's usual winter sowing). */
export function seedEasePart(species: Species): ScorePart | null {
  // A plain loop: this runs for every candidate on every request.
  for (const t of species.germination.treatments) {
    if (t.kind !== 'none' && !(t.kind === 'cold-moist' && (t.days ?? 0) <= 60)) return null;
  }
  return SEED_EASE_PART;
}

/** Caterpillar host value within the species' layer, in words; points by level, the same scale in both layers. */
const HOST_POINTS = { top: 3, good: 2, some: 0.75, none: 0 } as const;

export function layeredHostPart(species: Species): ScorePart | null {
  const level = hostLevelOf(species);
  if (level === 'none') return null;
  // Keyed by layer and level, so the words are built once per pair, not per species.
  const key = `${layerOf(species)}${level}`;
  const cached = hostPartsByWords.get(key);
  if (cached !== undefined) return cached;
  const reason = caterpillarWords(species) ?? '';
  return hostPartsByWords.keep(key, { name: 'host-plant', points: HOST_POINTS[level], reason });
}

export function beesPart(species: Species, site: Site): ScorePart | null {
  if (!site.goals.includes('pollinators')) return null;
  return beePartOf(species);
}

/** beesPart when pollinators are a goal: it depends on the species alone, so species-facts keeps it. */
export function beePartOf(species: Species): ScorePart | null {
  if (layerOf(species) !== 'herbaceous' && species.growthForm !== 'shrub') return null;
  if (!hostsSpecialistBees(species)) return null;
  const named = species.wildlife.specialistBees;
  const key = named.length === 0 ? '' : named.slice(0, 3).join('|');
  const cached = beeParts.get(key);
  if (cached !== undefined) return cached;
  return beeParts.keep(key, { name: 'bees', points: 1, reason: beeWords(species) ?? 'Flowers for bees.' });
}

/** Over 6 ft (180 cm) a perennial towers over a small bed and flops onto its neighbours (common practice). */
export const TALL_FOR_SMALL_BED_CM = 180;

export function scalePart(species: Species, site: Site): ScorePart | null {
  if (site.areaSqFt >= SMALL_BED_SQ_FT || layerOf(species) === 'woody' || species.heightCm.max <= TALL_FOR_SMALL_BED_CM)
    return null;
  return {
    name: 'height',
    points: -2,
    reason: `Grows up to ${formatHeightCm(species.heightCm.max)}: tall for a small bed.`,
  };
}
