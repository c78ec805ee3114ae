import { z } from 'zod';

/**
 * The species catalogue's record shape. One record per species lives in
 * `species-data/species/<slug>.json`; the API stores the same shape in SQLite.
 * Sizes are stored in SI (centimetres); the web shows US units beside them.
 */

/** USPS codes of the 48 conterminous states plus DC: the range Homeground covers. */
export const US_STATE_CODES = [
  'AL',
  'AR',
  'AZ',
  'CA',
  'CO',
  'CT',
  'DC',
  'DE',
  'FL',
  'GA',
  'IA',
  'ID',
  'IL',
  'IN',
  'KS',
  'KY',
  'LA',
  'MA',
  'MD',
  'ME',
  'MI',
  'MN',
  'MO',
  'MS',
  'MT',
  'NC',
  'ND',
  'NE',
  'NH',
  'NJ',
  'NM',
  'NV',
  'NY',
  'OH',
  'OK',
  'OR',
  'PA',
  'RI',
  'SC',
  'SD',
  'TN',
  'TX',
  'UT',
  'VA',
  'VT',
  'WA',
  'WI',
  'WV',
  'WY',
] as const;
export const stateCodeSchema = z.enum(US_STATE_CODES);
export type StateCode = z.infer<typeof stateCodeSchema>;

export const GROWTH_FORMS = ['forb', 'graminoid', 'fern', 'shrub', 'vine', 'tree'] as const;
export const growthFormSchema = z.enum(GROWTH_FORMS);
export type GrowthForm = z.infer<typeof growthFormSchema>;

export const LIFESPANS = ['annual', 'biennial', 'short-lived-perennial', 'perennial'] as const;
export const lifespanSchema = z.enum(LIFESPANS);

export const SUN_LEVELS = ['full', 'part', 'shade'] as const;
export const sunSchema = z.enum(SUN_LEVELS);
export type Sun = z.infer<typeof sunSchema>;

export const MOISTURE_LEVELS = ['dry', 'medium', 'wet'] as const;
export const moistureSchema = z.enum(MOISTURE_LEVELS);
export type Moisture = z.infer<typeof moistureSchema>;

export const SOIL_TEXTURES = ['sand', 'loam', 'clay', 'rocky'] as const;
export const soilTextureSchema = z.enum(SOIL_TEXTURES);
export type SoilTexture = z.infer<typeof soilTextureSchema>;

export const FLOWER_COLOURS = [
  'white',
  'cream',
  'yellow',
  'orange',
  'red',
  'pink',
  'magenta',
  'purple',
  'lavender',
  'blue',
  'green',
  'brown',
] as const;
export const flowerColourSchema = z.enum(FLOWER_COLOURS);
export type FlowerColour = z.infer<typeof flowerColourSchema>;

/**
 * Natural plant communities. Ecoregions list the communities they hold with the same words,
 * so a species' habitats can be matched to a region.
 */
export const HABITATS = [
  'prairie',
  'sand-prairie',
  'wet-prairie',
  'savanna',
  'open-woodland',
  'forest',
  'floodplain-forest',
  'wetland',
  'marsh',
  'fen-bog',
  'streambank',
  'glade',
  'rock-outcrop',
  'dune',
  'coastal-plain',
  'pine-barrens',
  'old-field',
  'shortgrass-prairie',
  'mixed-grass-prairie',
] as const;
export const habitatSchema = z.enum(HABITATS);
export type Habitat = z.infer<typeof habitatSchema>;

export const SPREAD_HABITS = ['clumping', 'spreading', 'aggressive'] as const;
export const spreadHabitSchema = z.enum(SPREAD_HABITS);

/** National Wetland Plant List indicator classes, wettest first. */
export const WETLAND_INDICATORS = ['OBL', 'FACW', 'FAC', 'FACU', 'UPL'] as const;
export type WetlandIndicator = (typeof WETLAND_INDICATORS)[number];

/** USDA PLANTS `commercial_availability` values, in Homeground's spelling. */
export const COMMERCIAL_AVAILABILITY = ['routine', 'contract-only', 'field-collection-only', 'none-known'] as const;
export type CommercialAvailability = (typeof COMMERCIAL_AVAILABILITY)[number];

export const DEER_RESISTANCE = ['low', 'medium', 'high'] as const;
export const deerResistanceSchema = z.enum(DEER_RESISTANCE);

/** The pre-sowing treatments the trade uses, in the order they are applied. */
export const TREATMENT_KINDS = ['none', 'cold-moist', 'warm-moist', 'scarification', 'hot-water', 'inoculant'] as const;
export const treatmentStepSchema = z
  .object({
    kind: z.enum(TREATMENT_KINDS),
    /** Length of a moist stratification step, in days (cold-moist and warm-moist only). */
    days: z.number().int().min(1).max(365).optional(),
    /** Plain words for the grower, e.g. "nick the seed coat with a nail file". */
    note: z.string().max(500).optional(),
  })
  .strict()
  .refine((t) => (t.kind !== 'cold-moist' && t.kind !== 'warm-moist') || t.days !== undefined, {
    message: 'a moist stratification step needs its length in days (e.g. cold-moist:60)',
    path: ['days'],
  });
export type TreatmentStep = z.infer<typeof treatmentStepSchema>;

export const SOWING_METHODS = [
  'outdoor-pot-winter',
  'winter-sowing',
  'indoor-lights',
  'soil-blocks',
  'direct-seed',
] as const;
export const sowingMethodSchema = z.enum(SOWING_METHODS);
export type SowingMethod = z.infer<typeof sowingMethodSchema>;

export const germinationSchema = z
  .object({
    treatments: z.array(treatmentStepSchema).min(1).max(10),
    /** True when seed needs light to germinate: surface sow, press in, do not cover. */
    needsLight: z.boolean(),
    /** Sowing depth in millimetres; 0 means surface sow. */
    sowingDepthMm: z.number().min(0).max(100),
    seedsPerPound: z.number().int().positive().nullable(),
    /** Typical germination of a good seed lot after treatment, percent. */
    germinationRatePct: z.number().min(1).max(100),
    methods: z.array(sowingMethodSchema).min(1).max(SOWING_METHODS.length),
  })
  .strict();
export type Germination = z.infer<typeof germinationSchema>;

export const CAUTION_KINDS = [
  'toxic-if-eaten',
  'sap-irritant',
  'skin-irritant',
  'eye-irritant',
  'pets',
  'livestock',
  'aggressive-spreader',
  'look-alike',
  'protected',
  'thorns',
  'regulated',
] as const;
export const cautionSchema = z
  .object({
    kind: z.enum(CAUTION_KINDS),
    /** Calm, specific words shown on cards and pages. */
    text: z.string().min(10).max(1000),
    source: z.string().max(120),
  })
  .strict();
export type Caution = z.infer<typeof cautionSchema>;

export const rangeCmSchema = z
  .object({ min: z.number().positive().max(10_000), max: z.number().positive().max(10_000) })
  .strict()
  .refine((r) => r.min <= r.max, { message: 'min must not exceed max' });

export const wildlifeSchema = z
  .object({
    /** Lepidoptera species whose caterpillars use the genus (Tallamy & Shropshire 2009), or null when the genus is not listed. */
    lepidopteraGenusCount: z.number().int().min(0).nullable(),
    monarchHost: z.boolean(),
    pollinators: z.string().max(1000),
    birds: z.string().max(1000).optional(),
    specialistBees: z.array(z.string().max(120)).max(30).default([]),
  })
  .strict();

/** Facts that must each name a source key (or `from-memory`). */
export const SOURCED_FIELDS = [
  'usdaSymbol',
  'family',
  'nativeStates',
  'growthForm',
  'lifespan',
  'heightCm',
  'bloomMonths',
  'flowerColours',
  'sun',
  'moisture',
  'soilTextures',
  'habitats',
  'wildlife.lepidopteraGenusCount',
  'wildlife.monarchHost',
  'spreadHabit',
  'deerResistance',
  'germination.treatments',
  'germination.seedsPerPound',
  'germination.germinationRatePct',
  'ecoregions',
  'sunOptimum',
  'moistureOptimum',
  'wetlandIndicator',
  'commercialAvailability',
  'protectedIn',
] as const;
export type SourcedField = (typeof SOURCED_FIELDS)[number];

/** A note explaining where the record knowingly differs from a reference. */
export const reconciliationSchema = z
  .object({
    field: z.enum([
      'usdaSymbol',
      'scientificName',
      'family',
      'nativeStates',
      'ecoregions',
      'heightCm',
      'bloomMonths',
      'germination.germinationRatePct',
      'wildlife.lepidopteraGenusCount',
      'cautions',
      'spreadHabit',
      'moistureOptimum',
    ]),
    note: z.string().min(10).max(1000),
  })
  .strict();

export const slugSchema = z
  .string()
  .max(120, 'must be at most 120 characters')
  .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'lower-case words joined by hyphens');

export const speciesSchema = z
  .object({
    slug: slugSchema,
    scientificName: z
      .string()
      .max(120)
      .regex(/^[A-Z][a-z]+ [a-z-]+( (var\.|subsp\.) [a-z-]+)?$/, 'Genus species [var./subsp. name]'),
    usdaSymbol: z.string().regex(/^[A-Z0-9]{4,8}$/),
    family: z
      .string()
      .max(60)
      .regex(/^[A-Z][a-z]+aceae$/),
    commonNames: z.array(z.string().min(2).max(120)).min(1).max(30),
    synonyms: z.array(z.string().max(120)).max(60).default([]),
    growthForm: growthFormSchema,
    lifespan: lifespanSchema,
    heightCm: rangeCmSchema,
    spreadCm: rangeCmSchema,
    bloomMonths: z.array(z.number().int().min(1).max(12)).max(12),
    flowerColours: z.array(flowerColourSchema).max(FLOWER_COLOURS.length),
    sun: z.array(sunSchema).min(1).max(SUN_LEVELS.length),
    moisture: z.array(moistureSchema).min(1).max(MOISTURE_LEVELS.length),
    /** Where it thrives: subsets of sun / moisture (which list what it tolerates). */
    sunOptimum: z.array(sunSchema).min(1).max(SUN_LEVELS.length),
    moistureOptimum: z.array(moistureSchema).min(1).max(MOISTURE_LEVELS.length),
    /** National Wetland Plant List indicator (a published federal standard); null where unknown. */
    wetlandIndicator: z.enum(WETLAND_INDICATORS).nullable(),
    /** Needs acid soil (e.g. blueberries, many ericads). */
    needsAcidSoil: z.boolean(),
    soilTextures: z.array(soilTextureSchema).min(1).max(SOIL_TEXTURES.length),
    nativeStates: z.array(stateCodeSchema).min(1).max(US_STATE_CODES.length),
    /** EPA Level III ecoregion codes ("1"–"85") where the species is native; sourced field 'ecoregions'. */
    ecoregions: z
      .array(z.string().regex(/^[1-9][0-9]?$/))
      .min(1)
      .max(85),
    habitats: z.array(habitatSchema).min(1).max(HABITATS.length),
    wildlife: wildlifeSchema,
    spreadHabit: spreadHabitSchema,
    /** Heavy self-sower (seeds itself around a bed; evening primrose, some asters). */
    selfSows: z.boolean(),
    /** USDA PLANTS `commercial_availability` where it has a value, else null. */
    commercialAvailability: z.enum(COMMERCIAL_AVAILABILITY).nullable(),
    /** States where the species is legally protected (listed); empty when none. Used instead of a blanket 'protected'. */
    protectedIn: z.array(stateCodeSchema).max(US_STATE_CODES.length),
    deerResistance: deerResistanceSchema,
    germination: germinationSchema,
    cautions: z
      .array(cautionSchema)
      .max(CAUTION_KINDS.length * 2)
      .default([]),
    tags: z
      .array(z.enum(['spring-ephemeral', 'evergreen', 'nitrogen-fixer', 'keystone', 'rain-garden', 'groundcover']))
      .max(6)
      .default([]),
    sources: z.record(z.enum(SOURCED_FIELDS), z.string().max(120)),
    reconciliations: z.array(reconciliationSchema).max(10).default([]),
  })
  .strict();
export type Species = z.infer<typeof speciesSchema>;
export type SpeciesInput = z.input<typeof speciesSchema>;

export const sourceSchema = z.object({
  key: z.string().regex(/^[a-z0-9-]+$/),
  citation: z.string().min(10),
  url: z.string().url().optional(),
});
export type Source = z.infer<typeof sourceSchema>;
