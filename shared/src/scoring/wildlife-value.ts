import type { Species } from '../types/species.js';
import { genusOf } from './genus.js';
import { layerOf, type PlantLayer } from './layers.js';

/**
 * Wildlife value in words, in four parts (caterpillars, bees, monarchs, birds), never one ranked
 * number. Caterpillar host value is judged within the species' layer against the top genus of that
 * layer's published list (CHECK-VALUES §2, R): Solidago 115 among herbaceous plants, Quercus 534
 * among woody plants. So a goldenrod is "among the best" just as an oak is, and a cherry (456) does
 * not outrank every wildflower.
 */
export const LAYER_TOP_HOST_COUNT: Record<PlantLayer, number> = { herbaceous: 115, woody: 534 };

export type HostLevel = 'top' | 'good' | 'some' | 'none';

/** Share of the layer's top count for each level (Homeground's bands). */
const BANDS = { top: 0.4, good: 0.12 } as const;

export function hostLevelOf(species: Pick<Species, 'growthForm' | 'scientificName' | 'wildlife'>): HostLevel {
  const count = species.wildlife.lepidopteraGenusCount;
  if (count === null || count === 0) return 'none';
  const share = count / LAYER_TOP_HOST_COUNT[layerOf(species)];
  return share >= BANDS.top ? 'top' : share >= BANDS.good ? 'good' : 'some';
}

/**
 * The genus count on the herbaceous scale: woody counts are scaled by 115 / 534, so the mix
 * objective's host term weighs a cherry like a goldenrod rather than four goldenrods.
 */
export function hostValueOnHerbaceousScale(
  species: Pick<Species, 'growthForm' | 'scientificName' | 'wildlife'>,
): number {
  const count = species.wildlife.lepidopteraGenusCount ?? 0;
  if (layerOf(species) === 'herbaceous') return count;
  return (count * LAYER_TOP_HOST_COUNT.herbaceous) / LAYER_TOP_HOST_COUNT.woody;
}

const LAYER_WORDS: Record<PlantLayer, string> = {
  herbaceous: 'wildflowers, grasses and ferns',
  woody: 'shrubs and trees',
};

export function caterpillarWords(species: Pick<Species, 'growthForm' | 'scientificName' | 'wildlife'>): string | null {
  const level = hostLevelOf(species);
  const among = LAYER_WORDS[layerOf(species)];
  if (level === 'top') return `Among the best caterpillar host plants of the ${among}.`;
  if (level === 'good') return `A good caterpillar host plant among ${among}.`;
  if (level === 'some') return 'Hosts the caterpillars of a few moths and butterflies.';
  return null;
}

/**
 * Genera that host pollen-specialist bees in the eastern US (from memory, after the published
 * specialist-bee host lists of the Mid-Atlantic and Northeast; to be confirmed against them).
 */
const SPECIALIST_BEE_GENERA: ReadonlySet<string> = new Set([
  'Solidago',
  'Symphyotrichum',
  'Helianthus',
  'Rudbeckia',
  'Coreopsis',
  'Ratibida',
  'Silphium',
  'Heliopsis',
  'Echinacea',
  'Penstemon',
  'Oenothera',
  'Vaccinium',
  'Salix',
  'Physalis',
  'Pontederia',
  'Ludwigia',
  'Lysimachia',
  'Campanula',
  'Geranium',
  'Hydrophyllum',
  'Claytonia',
  'Ipomoea',
  'Calystegia',
  'Dalea',
  'Cornus',
  'Monarda',
  'Verbesina',
  'Bidens',
  'Eutrochium',
  'Eupatorium',
  'Packera',
  'Erigeron',
  'Zizia',
  'Chamaecrista',
  'Baptisia',
  'Lupinus',
  'Asclepias',
  'Sphaeralcea',
  'Callirhoe',
  'Hibiscus',
  'Cercis',
  'Amorpha',
  'Viola',
  'Uvularia',
  'Nuphar',
  'Nymphaea',
  'Larrea',
]);

export function hostsSpecialistBees(species: Pick<Species, 'scientificName' | 'wildlife'>): boolean {
  return species.wildlife.specialistBees.length > 0 || SPECIALIST_BEE_GENERA.has(genusOf(species));
}

export function beeWords(
  species: Pick<Species, 'scientificName' | 'wildlife' | 'growthForm' | 'bloomMonths'>,
): string | null {
  const named = species.wildlife.specialistBees;
  if (named.length > 0)
    return `Pollen and nectar for bees, and the host of specialist bees (${named.slice(0, 3).join(', ')}).`;
  if (SPECIALIST_BEE_GENERA.has(genusOf(species)))
    return 'Pollen and nectar for bees, including bees that collect pollen from this genus only.';
  if (species.growthForm === 'graminoid' || species.growthForm === 'fern' || species.bloomMonths.length === 0)
    return null;
  return 'Flowers for bees and other pollinators.';
}

const HOST_LEVEL_RANK: Record<HostLevel, number> = { none: 0, some: 1, good: 2, top: 3 };

/**
 * Orders species by Homeground's several-part wildlife value, least first: caterpillar host value
 * within the species' layer (a goldenrod's "among the best" equals an oak's), then bees (host of
 * specialist bees, then flowers for bees), then monarch host, then food for birds. Each part is
 * compared in turn, never summed into one number. Callers break ties (e.g. by name).
 */
export function compareWildlifeValue(a: Species, b: Species): number {
  return (
    HOST_LEVEL_RANK[hostLevelOf(a)] - HOST_LEVEL_RANK[hostLevelOf(b)] ||
    beeRank(a) - beeRank(b) ||
    Number(a.wildlife.monarchHost) - Number(b.wildlife.monarchHost) ||
    Number(Boolean(a.wildlife.birds)) - Number(Boolean(b.wildlife.birds))
  );
}

function beeRank(s: Species): number {
  if (hostsSpecialistBees(s)) return 2;
  return beeWords(s) === null ? 0 : 1;
}

export interface WildlifeSummary {
  caterpillars: string | null;
  bees: string | null;
  monarchs: string | null;
  birds: string | null;
  /** Where each part comes from (source keys, or from-memory). */
  sources: { caterpillars: string; bees: string; monarchs: string; birds: string };
}

/** Homeground's several-part wildlife summary for list and detail pages: words only. */
export function wildlifeSummary(species: Species): WildlifeSummary {
  return {
    caterpillars: caterpillarWords(species),
    bees: beeWords(species),
    monarchs: species.wildlife.monarchHost ? 'Monarch caterpillars feed on it.' : null,
    birds: species.wildlife.birds ?? null,
    sources: {
      caterpillars: species.sources['wildlife.lepidopteraGenusCount'] ?? 'tallamy-shropshire-2009',
      bees: species.wildlife.specialistBees.length > 0 ? 'catalogue' : 'from-memory',
      monarchs: species.sources['wildlife.monarchHost'] ?? 'from-memory',
      birds: 'from-memory',
    },
  };
}
