import type { SpeciesSummary } from '@homeground/shared';
import type { SpeciesDetail } from '../../../api/species/species.api.js';

// Test records copied in part from the catalogue (species-data/species/asclepias-tuberosa.json,
// monarda-fistulosa.json, zizia-aurea.json; each fact's source key is in those files). Only the
// fields a fact card or pot label prints matter here.

type Shared =
  | 'synonyms'
  | 'lifespan'
  | 'growthForm'
  | 'soilTextures'
  | 'nativeStates'
  | 'habitats'
  | 'spreadHabit'
  | 'deerResistance'
  | 'tags'
  | 'sources'
  | 'reconciliations'
  | 'hasPhoto'
  | 'photoCredit'
  | 'ecoregions'
  | 'sunOptimum'
  | 'moistureOptimum'
  | 'wetlandIndicator'
  | 'needsAcidSoil'
  | 'selfSows'
  | 'commercialAvailability'
  | 'protectedIn';

const COMMON: Pick<SpeciesDetail, Shared> = {
  synonyms: [],
  lifespan: 'perennial',
  growthForm: 'forb',
  soilTextures: ['loam'],
  nativeStates: ['WI'],
  ecoregions: ['52'],
  habitats: ['prairie'],
  // Site-fit facts are not printed on cards; the real records hold each species' own.
  sunOptimum: ['full'],
  moistureOptimum: ['medium'],
  wetlandIndicator: null,
  needsAcidSoil: false,
  selfSows: false,
  commercialAvailability: null,
  protectedIn: [],
  spreadHabit: 'clumping',
  deerResistance: 'medium',
  tags: [],
  // Sources are not printed on cards; the real records name them.
  sources: {} as SpeciesDetail['sources'],
  reconciliations: [],
  hasPhoto: false,
  photoCredit: null,
};

export const butterflyMilkweed: SpeciesDetail = {
  ...COMMON,
  soilTextures: ['sand', 'loam', 'rocky'],
  slug: 'asclepias-tuberosa',
  scientificName: 'Asclepias tuberosa',
  usdaSymbol: 'ASTU',
  family: 'Apocynaceae',
  commonNames: ['butterfly milkweed', 'butterfly weed'],
  heightCm: { min: 30, max: 75 },
  spreadCm: { min: 30, max: 60 },
  bloomMonths: [6, 7, 8],
  flowerColours: ['orange'],
  sun: ['full', 'part'],
  moisture: ['dry', 'medium'],
  wildlife: {
    lepidopteraGenusCount: 12,
    monarchHost: true,
    pollinators: 'Nectar for butterflies, bumble bees and many native bees in early to mid summer.',
    specialistBees: [],
  },
  germination: {
    treatments: [
      { kind: 'cold-moist', days: 30, note: 'Chill damp, never dry: dry chilling gives far poorer germination.' },
    ],
    needsLight: false,
    sowingDepthMm: 6,
    seedsPerPound: 70000,
    germinationRatePct: 60,
    methods: ['winter-sowing', 'outdoor-pot-winter', 'indoor-lights', 'direct-seed'],
  },
  cautions: [
    {
      kind: 'sap-irritant',
      text: 'Milky sap can injure the eye hours after contact: keep it off your face and wash hands after handling stems and pods.',
      source: 'uf-milkweed-toxicity-2019',
    },
    {
      kind: 'toxic-if-eaten',
      text: 'Contains cardiac glycosides; listed in an extension poisonous-plant manual. Keep away from grazing animals.',
      source: 'auburn-poisonous-plants',
    },
  ],
};

export const wildBergamot: SpeciesDetail = {
  ...COMMON,
  slug: 'monarda-fistulosa',
  scientificName: 'Monarda fistulosa',
  usdaSymbol: 'MOFI',
  family: 'Lamiaceae',
  commonNames: ['wild bergamot'],
  heightCm: { min: 60, max: 120 },
  spreadCm: { min: 45, max: 90 },
  bloomMonths: [6, 7, 8, 9],
  flowerColours: ['lavender', 'pink'],
  sun: ['full', 'part'],
  moisture: ['dry', 'medium'],
  wildlife: {
    lepidopteraGenusCount: 7,
    monarchHost: false,
    pollinators: 'Bumble bees, hummingbird moths and butterflies all summer.',
    specialistBees: [],
  },
  germination: {
    treatments: [{ kind: 'none', note: 'No pretreatment needed; surface sow or barely cover, since light helps.' }],
    needsLight: true,
    sowingDepthMm: 0,
    seedsPerPound: 1272500,
    germinationRatePct: 75,
    methods: ['indoor-lights', 'soil-blocks', 'winter-sowing'],
  },
  cautions: [],
};

export const goldenAlexanders: SpeciesDetail = {
  ...wildBergamot,
  slug: 'zizia-aurea',
  scientificName: 'Zizia aurea',
  usdaSymbol: 'ZIAU',
  family: 'Apiaceae',
  commonNames: ['golden alexanders'],
  heightCm: { min: 30, max: 75 },
  bloomMonths: [5, 6],
  flowerColours: ['yellow'],
  moisture: ['medium', 'wet'],
  wildlife: {
    lepidopteraGenusCount: 4,
    monarchHost: false,
    pollinators: 'Early nectar for small bees, flies and wasps.',
    specialistBees: [],
  },
  germination: {
    treatments: [{ kind: 'cold-moist', days: 90 }],
    needsLight: false,
    sowingDepthMm: 3,
    seedsPerPound: null,
    germinationRatePct: 50,
    methods: ['winter-sowing'],
  },
  cautions: [
    {
      kind: 'look-alike',
      text: 'Carrot-family plants are hard to tell apart, and water hemlock and poison hemlock are deadly: never eat wild carrot-family plants.',
      source: 'from-memory',
    },
  ],
};

/** `count` distinct records (slugs suffixed -2, -3 …) for paging tests. */
export function manySpecies(count: number): SpeciesDetail[] {
  const base = [butterflyMilkweed, wildBergamot, goldenAlexanders];
  return Array.from({ length: count }, (_, i) => {
    const s = base[i % base.length];
    const n = Math.floor(i / base.length);
    return n === 0 ? s : { ...s, slug: `${s.slug}-${n + 1}`, commonNames: [`${s.commonNames[0]} ${n + 1}`] };
  });
}

export function summaryOf(s: SpeciesDetail): SpeciesSummary {
  return {
    slug: s.slug,
    scientificName: s.scientificName,
    commonName: s.commonNames[0],
    family: s.family,
    growthForm: s.growthForm,
    heightCm: s.heightCm,
    bloomMonths: s.bloomMonths,
    flowerColours: s.flowerColours,
    sun: s.sun,
    moisture: s.moisture,
    monarchHost: s.wildlife.monarchHost,
    lepidopteraGenusCount: s.wildlife.lepidopteraGenusCount,
    cautionKinds: s.cautions.map((c) => c.kind),
    hasPhoto: false,
  };
}
