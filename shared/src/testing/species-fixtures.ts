import { SOURCED_FIELDS } from '../types/species.js';

/** A complete record for tests (facts from memory; not catalogue data). */
export const ziziaAurea = {
  slug: 'zizia-aurea',
  scientificName: 'Zizia aurea',
  usdaSymbol: 'ZIAU',
  family: 'Apiaceae',
  commonNames: ['golden alexanders'],
  growthForm: 'forb',
  lifespan: 'perennial',
  heightCm: { min: 30, max: 75 },
  spreadCm: { min: 30, max: 45 },
  bloomMonths: [5, 6],
  flowerColours: ['yellow'],
  sun: ['full', 'part'],
  moisture: ['medium', 'wet'],
  soilTextures: ['loam', 'clay'],
  nativeStates: ['WI', 'MN'],
  habitats: ['prairie', 'open-woodland'],
  wildlife: { lepidopteraGenusCount: null, monarchHost: false, pollinators: 'Early nectar for short-tongued bees.' },
  spreadHabit: 'clumping',
  deerResistance: 'medium',
  germination: {
    treatments: [{ kind: 'cold-moist', days: 60 }],
    needsLight: false,
    sowingDepthMm: 3,
    seedsPerPound: null,
    germinationRatePct: 50,
    methods: ['winter-sowing'],
  },
  sources: Object.fromEntries(SOURCED_FIELDS.map((f) => [f, 'from-memory'])),
};
