import type { RegionContext } from '../../types/site.js';
import { SOURCED_FIELDS, type Species, type TreatmentStep } from '../../types/species.js';

/**
 * Test fixtures modelled on species-data/species records (copied by hand, trimmed). Facts are the
 * catalogue's or from-memory; they exist to exercise the engine, not as data. Kept here so shared
 * tests do not depend on a catalogue that other work is still filling in.
 */
const WIDE_EAST: Species['nativeStates'] = [
  'AL', 'AR', 'CT', 'DE', 'GA', 'IA', 'IL', 'IN', 'KS', 'KY', 'MA', 'MD', 'ME', 'MI', 'MN', 'MO', 'MS', 'NC',
  'ND', 'NE', 'NH', 'NJ', 'NY', 'OH', 'OK', 'PA', 'RI', 'SC', 'SD', 'TN', 'TX', 'VA', 'VT', 'WI', 'WV',
];

/** EPA Level III codes of the Great Plains and the East (25–84), where these fixtures' species grow. */
const EASTERN_REGIONS: Species['ecoregions'] = Array.from({ length: 60 }, (_, i) => String(25 + i));

type Overrides = Partial<Omit<Species, 'germination' | 'wildlife'>> & {
  slug: string;
  scientificName: string;
  germination?: Partial<Species['germination']>;
  wildlife?: Partial<Species['wildlife']>;
};

export function makeSpecies(o: Overrides): Species {
  const { germination, wildlife, ...rest } = o;
  return {
    usdaSymbol: 'TEST',
    family: 'Asteraceae',
    commonNames: [o.slug.replace(/-/g, ' ')],
    synonyms: [],
    growthForm: 'forb',
    lifespan: 'perennial',
    heightCm: { min: 30, max: 90 },
    spreadCm: { min: 30, max: 45 },
    bloomMonths: [6, 7],
    flowerColours: ['yellow'],
    sun: ['full', 'part'],
    moisture: ['dry', 'medium'],
    soilTextures: ['loam'],
    nativeStates: WIDE_EAST,
    habitats: ['prairie'],
    spreadHabit: 'clumping',
    deerResistance: 'medium',
    cautions: [],
    tags: [],
    sources: Object.fromEntries(SOURCED_FIELDS.map((f) => [f, 'from-memory'])) as Species['sources'],
    reconciliations: [],
    // Neutral site-fit facts: thrives wherever it grows, eastern and central regions, nothing special.
    ecoregions: EASTERN_REGIONS,
    sunOptimum: o.sun ?? ['full', 'part'],
    moistureOptimum: o.moisture ?? ['dry', 'medium'],
    wetlandIndicator: null,
    needsAcidSoil: false,
    selfSows: false,
    commercialAvailability: null,
    protectedIn: [],
    ...rest,
    wildlife: { lepidopteraGenusCount: null, monarchHost: false, pollinators: 'Bees and butterflies visit.', specialistBees: [], ...wildlife },
    germination: {
      treatments: [{ kind: 'none' }],
      needsLight: false,
      sowingDepthMm: 3,
      seedsPerPound: null,
      germinationRatePct: 50,
      methods: ['winter-sowing', 'outdoor-pot-winter', 'indoor-lights', 'soil-blocks', 'direct-seed'],
      ...germination,
    },
  };
}

const cms = (days: number): TreatmentStep[] => [{ kind: 'cold-moist', days }];

export const F = {
  butterflyMilkweed: makeSpecies({
    slug: 'asclepias-tuberosa', scientificName: 'Asclepias tuberosa', family: 'Apocynaceae', commonNames: ['butterfly milkweed'],
    heightCm: { min: 30, max: 75 }, bloomMonths: [6, 7, 8], flowerColours: ['orange'], soilTextures: ['sand', 'loam', 'rocky'],
    habitats: ['prairie', 'sand-prairie', 'savanna', 'glade', 'old-field'], deerResistance: 'high',
    wildlife: { lepidopteraGenusCount: 12, monarchHost: true, birds: 'Hummingbirds visit the flowers.' },
    germination: { treatments: cms(30), sowingDepthMm: 6, seedsPerPound: 70000, germinationRatePct: 60 },
  }),
  swampMilkweed: makeSpecies({
    slug: 'asclepias-incarnata', scientificName: 'Asclepias incarnata', family: 'Apocynaceae', commonNames: ['swamp milkweed'],
    heightCm: { min: 90, max: 150 }, bloomMonths: [7, 8], flowerColours: ['pink'], moisture: ['medium', 'wet'],
    habitats: ['wet-prairie', 'marsh', 'streambank'], deerResistance: 'high', tags: ['rain-garden'],
    wildlife: { lepidopteraGenusCount: 12, monarchHost: true },
    // NPN-ASIN (R): at least 7 days of cold-moist stratification; longer did no harm. The record keeps 30.
    germination: { treatments: cms(30), sowingDepthMm: 6, germinationRatePct: 70 },
  }),
  goldenAlexanders: makeSpecies({
    slug: 'zizia-aurea', scientificName: 'Zizia aurea', family: 'Apiaceae', commonNames: ['golden alexanders'],
    heightCm: { min: 30, max: 75 }, bloomMonths: [5, 6], moisture: ['medium', 'wet'], soilTextures: ['loam', 'clay'],
    habitats: ['wet-prairie', 'prairie', 'savanna', 'open-woodland', 'streambank'], tags: ['rain-garden'],
    wildlife: { lepidopteraGenusCount: 4 }, germination: { treatments: cms(90) },
  }),
  showyGoldenrod: makeSpecies({
    slug: 'solidago-speciosa', scientificName: 'Solidago speciosa', commonNames: ['showy goldenrod'],
    heightCm: { min: 60, max: 150 }, bloomMonths: [8, 9, 10], soilTextures: ['sand', 'loam', 'clay'],
    habitats: ['prairie', 'savanna', 'sand-prairie', 'open-woodland'],
    wildlife: { lepidopteraGenusCount: 115, birds: 'Sparrows and finches take the seed.' },
    germination: { treatments: cms(60), needsLight: true, sowingDepthMm: 0, germinationRatePct: 40 },
  }),
  newEnglandAster: makeSpecies({
    slug: 'symphyotrichum-novae-angliae', scientificName: 'Symphyotrichum novae-angliae', commonNames: ['New England aster'],
    heightCm: { min: 90, max: 180 }, bloomMonths: [8, 9, 10], flowerColours: ['purple', 'pink'], moisture: ['medium', 'wet'],
    habitats: ['wet-prairie', 'prairie', 'old-field', 'streambank'], deerResistance: 'low',
    wildlife: { lepidopteraGenusCount: 112 }, germination: { treatments: cms(30), needsLight: true, sowingDepthMm: 0 },
  }),
  blueWoodAster: makeSpecies({
    slug: 'symphyotrichum-cordifolium', scientificName: 'Symphyotrichum cordifolium', commonNames: ['blue wood aster'],
    heightCm: { min: 30, max: 120 }, bloomMonths: [8, 9, 10], flowerColours: ['lavender', 'blue'], sun: ['part', 'shade'],
    habitats: ['forest', 'open-woodland'], deerResistance: 'low', wildlife: { lepidopteraGenusCount: 112 },
    germination: { treatments: cms(30), needsLight: true, sowingDepthMm: 0 },
  }),
  wildBergamot: makeSpecies({
    slug: 'monarda-fistulosa', scientificName: 'Monarda fistulosa', family: 'Lamiaceae', commonNames: ['wild bergamot'],
    heightCm: { min: 60, max: 120 }, spreadCm: { min: 45, max: 90 }, bloomMonths: [6, 7, 8, 9], flowerColours: ['lavender', 'pink'],
    habitats: ['prairie', 'savanna', 'old-field', 'open-woodland'], deerResistance: 'high', wildlife: { lepidopteraGenusCount: 7 },
    germination: { needsLight: true, sowingDepthMm: 0, germinationRatePct: 75 },
  }),
  foxgloveBeardtongue: makeSpecies({
    slug: 'penstemon-digitalis', scientificName: 'Penstemon digitalis', family: 'Plantaginaceae', commonNames: ['foxglove beardtongue'],
    heightCm: { min: 60, max: 150 }, bloomMonths: [5, 6, 7], flowerColours: ['white'], moisture: ['medium', 'wet'],
    deerResistance: 'high', wildlife: { lepidopteraGenusCount: 8 }, germination: { treatments: cms(70), sowingDepthMm: 1 },
  }),
  wildLupine: makeSpecies({
    slug: 'lupinus-perennis', scientificName: 'Lupinus perennis', family: 'Fabaceae', commonNames: ['wild lupine'],
    heightCm: { min: 30, max: 60 }, bloomMonths: [5, 6], flowerColours: ['blue', 'purple'], moisture: ['dry'], soilTextures: ['sand'],
    habitats: ['sand-prairie', 'savanna', 'pine-barrens', 'open-woodland'], wildlife: { lepidopteraGenusCount: 33 },
    germination: { treatments: [{ kind: 'scarification', note: 'Nick the seed coat.' }, { kind: 'inoculant' }], sowingDepthMm: 6, seedsPerPound: 20000, germinationRatePct: 80 },
  }),
  columbine: makeSpecies({
    slug: 'aquilegia-canadensis', scientificName: 'Aquilegia canadensis', family: 'Ranunculaceae', commonNames: ['wild columbine'],
    heightCm: { min: 30, max: 60 }, bloomMonths: [4, 5, 6], flowerColours: ['red'], sun: ['part', 'shade'],
    habitats: ['open-woodland', 'rock-outcrop'], wildlife: { lepidopteraGenusCount: 2 },
    germination: { treatments: cms(30), needsLight: true, sowingDepthMm: 0 },
  }),
  littleBluestem: makeSpecies({
    slug: 'schizachyrium-scoparium', scientificName: 'Schizachyrium scoparium', family: 'Poaceae', growthForm: 'graminoid',
    commonNames: ['little bluestem'], heightCm: { min: 60, max: 120 }, bloomMonths: [8, 9], flowerColours: [], sun: ['full'],
    habitats: ['prairie', 'sand-prairie', 'glade'], deerResistance: 'high', wildlife: { lepidopteraGenusCount: 6 },
    germination: { seedsPerPound: 240000 },
  }),
  prairieDropseed: makeSpecies({
    slug: 'sporobolus-heterolepis', scientificName: 'Sporobolus heterolepis', family: 'Poaceae', growthForm: 'graminoid',
    commonNames: ['prairie dropseed'], heightCm: { min: 60, max: 90 }, bloomMonths: [8, 9], flowerColours: [], sun: ['full'],
    deerResistance: 'high', germination: { seedsPerPound: 256000 },
  }),
  pennSedge: makeSpecies({
    slug: 'carex-pensylvanica', scientificName: 'Carex pensylvanica', family: 'Cyperaceae', growthForm: 'graminoid',
    commonNames: ['Pennsylvania sedge'], heightCm: { min: 15, max: 30 }, bloomMonths: [4, 5], flowerColours: [],
    sun: ['part', 'shade'], habitats: ['forest', 'open-woodland', 'savanna'], spreadHabit: 'spreading', deerResistance: 'high',
    wildlife: { lepidopteraGenusCount: 36 },
  }),
  eastsideBluestar: makeSpecies({
    // Native to Illinois but not Wisconsin in the catalogue: a "native next door" near miss for WI.
    slug: 'amsonia-tabernaemontana', scientificName: 'Amsonia tabernaemontana', family: 'Apocynaceae', commonNames: ['eastern bluestar'],
    nativeStates: ['AR', 'IL', 'IN', 'KY', 'MO', 'OH', 'TN'], bloomMonths: [4, 5, 6], flowerColours: ['blue'],
    moisture: ['medium', 'wet'], wildlife: { lepidopteraGenusCount: 1 },
  }),
  yellowConeflower: makeSpecies({
    // Native only well south-west of Wisconsin: not a near miss there.
    slug: 'echinacea-paradoxa', scientificName: 'Echinacea paradoxa', commonNames: ['yellow coneflower'],
    nativeStates: ['AR', 'MO', 'OK', 'TX'], bloomMonths: [5, 6, 7], sun: ['full'],
  }),
};

export const ALL_FIXTURES: Species[] = Object.values(F);

/** Larkfield, Wisconsin (invented demo town) in the Driftless Area, EPA Level III 52; communities are test input. */
export const LARKFIELD: RegionContext = {
  state: 'WI', ecoregionCode: '52', ecoregionPlantCommunities: ['prairie', 'savanna', 'open-woodland', 'forest'],
};
