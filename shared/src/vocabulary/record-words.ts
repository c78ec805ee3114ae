import type { SourcedField, Species } from '../types/species.js';

export type SpeciesTag = Species['tags'][number];

/** Words for the catalogue's tags, as a species page's chips show them. */
export const SPECIES_TAG_WORDS = {
  'spring-ephemeral': 'Spring ephemeral',
  evergreen: 'Evergreen',
  'nitrogen-fixer': 'Nitrogen fixer',
  keystone: 'Keystone genus',
  'rain-garden': 'Rain garden',
  groundcover: 'Groundcover',
} as const satisfies Record<SpeciesTag, string>;

/** Words for each sourced fact, as a source line lists them ("height, deer resistance"). */
export const SOURCED_FIELD_WORDS = {
  usdaSymbol: 'USDA symbol',
  family: 'family',
  nativeStates: 'native states',
  growthForm: 'growth form',
  lifespan: 'lifespan',
  heightCm: 'height',
  bloomMonths: 'bloom months',
  flowerColours: 'flower colour',
  sun: 'sun',
  moisture: 'moisture',
  soilTextures: 'soil',
  habitats: 'habitats',
  'wildlife.lepidopteraGenusCount': 'caterpillar hosts',
  'wildlife.monarchHost': 'monarch host',
  spreadHabit: 'spread habit',
  deerResistance: 'deer resistance',
  'germination.treatments': 'seed treatment',
  'germination.seedsPerPound': 'seeds per pound',
  'germination.germinationRatePct': 'germination rate',
  ecoregions: 'ecoregions',
  sunOptimum: 'best light',
  moistureOptimum: 'best moisture',
  wetlandIndicator: 'wetland indicator',
  commercialAvailability: 'seed or plants for sale',
  protectedIn: 'protected in',
} as const satisfies Record<SourcedField, string>;
