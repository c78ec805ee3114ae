import { loadCatalogue } from '@homeground/species-data';
import type { RegionContext, Site } from '../src/types/site.js';
import type { Species } from '../src/types/species.js';
import { syntheticCatalogue } from './synthetic-catalogue.js';

/** The Driftless Area (EPA Level III 52) in Wisconsin, with the catalogue's plant communities for it. */
export function driftlessWisconsin(): RegionContext {
  const eco = loadCatalogue().ecoregions.find((e) => e.code === '52');
  return { state: 'WI', ecoregionCode: '52', ecoregionPlantCommunities: eco?.plantCommunities };
}

/** Two representative yards: sunny and medium-moist for monarchs and pollinators, and shady and wet. */
export const SITES: { name: string; site: Site }[] = [
  {
    name: 'sunny-medium-500ft2',
    site: {
      sun: 'full',
      moisture: 'medium',
      areaSqFt: 500,
      deerPressure: 'medium',
      goals: ['monarchs', 'pollinators'],
    },
  },
  {
    name: 'shady-wet-500ft2',
    site: {
      sun: 'shade',
      moisture: 'wet',
      areaSqFt: 500,
      deerPressure: 'medium',
      goals: ['pollinators', 'shade-garden'],
    },
  },
];

export const SYNTHETIC_SEED = 20_240_601;

/**
 * The catalogues timed: the first 300 real records (slug order), and 30,000 synthetic ones. Each is
 * built only when asked for, so the big one is not in memory (and in the garbage collector's way)
 * while the small one is timed.
 */
export const CATALOGUES: { name: string; make: () => Species[] }[] = [
  { name: 'real-300', make: () => loadCatalogue().species.slice(0, 300) },
  { name: 'synthetic-30000', make: () => syntheticCatalogue(loadCatalogue().species, 30_000, SYNTHETIC_SEED) },
];
