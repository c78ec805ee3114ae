import { z } from 'zod';
import {
  type Caution,
  type FlowerColour,
  GROWTH_FORMS,
  type GrowthForm,
  MOISTURE_LEVELS,
  type Moisture,
  SUN_LEVELS,
  type Sun,
  stateCodeSchema,
} from './species.js';

const boolFromQuery = z.enum(['true', 'false'], { message: 'must be true or false' }).transform((v) => v === 'true');

export const SPECIES_SORTS = ['name', 'scientificName', 'height', 'bloomStart', 'hostValue', 'relevance'] as const;

/** Query string of `GET /api/species`. Every filter is optional; `q` is a typo-tolerant search. */
export const speciesQuerySchema = z
  .object({
    q: z.string().trim().max(100, 'must be at most 100 characters').optional(),
    state: stateCodeSchema.optional(),
    ecoregion: z
      .string()
      .regex(/^([1-9]|[1-7][0-9]|8[0-5])$/, 'must be an EPA Level III code, 1–85')
      .optional(),
    sun: z.enum(SUN_LEVELS).optional(),
    moisture: z.enum(MOISTURE_LEVELS).optional(),
    bloomMonth: z.coerce
      .number()
      .int('must be a whole month number')
      .min(1, 'must be 1–12')
      .max(12, 'must be 1–12')
      .optional(),
    growthForm: z.enum(GROWTH_FORMS).optional(),
    minHeightCm: z.coerce.number().min(0, 'must not be negative').max(5000).optional(),
    maxHeightCm: z.coerce.number().min(0, 'must not be negative').max(5000).optional(),
    monarchHost: boolFromQuery.optional(),
    page: z.coerce.number().int().min(1, 'must be 1 or more').default(1),
    pageSize: z.coerce.number().int().min(1).max(200, 'must be at most 200').default(24),
    sort: z.enum(SPECIES_SORTS).optional(),
    order: z.enum(['asc', 'desc']).default('asc'),
  })
  .strict()
  .refine((q) => q.minHeightCm === undefined || q.maxHeightCm === undefined || q.minHeightCm <= q.maxHeightCm, {
    message: 'must not be more than maxHeightCm',
    path: ['minHeightCm'],
  });
export type SpeciesQuery = z.infer<typeof speciesQuerySchema>;

/** Widths a photo is served resized to; a fixed list keeps the server's disk cache bounded. */
export const PHOTO_WIDTHS = [160, 400, 800] as const;
export type PhotoWidth = (typeof PHOTO_WIDTHS)[number];
/** The width each place shows a photo at: list thumbnails, printed fact cards, the species page. */
export const PHOTO_SIZES = { list: 160, print: 400, detail: 800 } as const satisfies Record<string, PhotoWidth>;

/** Query string of `GET /api/species/:slug/photo`: `w` picks a resized copy; left out, the original. */
export const photoQuerySchema = z
  .object({
    w: z
      .enum(PHOTO_WIDTHS.map(String) as ['160', '400', '800'], { message: `must be one of ${PHOTO_WIDTHS.join(', ')}` })
      .transform(Number)
      .optional(),
  })
  .strict();
export type PhotoQuery = z.infer<typeof photoQuerySchema>;
export type SpeciesQueryInput = z.input<typeof speciesQuerySchema>;

/** One species in a list: enough for a table row or a card. */
export interface SpeciesSummary {
  slug: string;
  scientificName: string;
  commonName: string;
  family: string;
  growthForm: GrowthForm;
  heightCm: { min: number; max: number };
  bloomMonths: number[];
  flowerColours: FlowerColour[];
  sun: Sun[];
  moisture: Moisture[];
  monarchHost: boolean;
  lepidopteraGenusCount: number | null;
  cautionKinds: Caution['kind'][];
  hasPhoto: boolean;
}

export interface SpeciesPage {
  items: SpeciesSummary[];
  total: number;
  page: number;
  pageSize: number;
}

/** A bad CSV row in an import: the file's line number (header = line 1), the field and why. */
export interface CsvRowError {
  row: number;
  field: string;
  message: string;
}

/** What an import does to one row's record: adds it, changes these fields, or leaves it as it is. */
export interface CsvImportPreviewRow {
  line: number;
  slug: string;
  scientificName: string;
  action: 'create' | 'change' | 'unchanged';
  /** The changed fields (nested ones by path, e.g. `heightCm`); empty for a new or unchanged record. */
  fields: string[];
}

export interface CsvImportResult {
  created: number;
  updated: number;
  /** True when nothing was written: the answer is a preview of what the same file would do. */
  dryRun: boolean;
  preview: CsvImportPreviewRow[];
}

/** `?dryRun=true` checks the file and answers what it would create and change, writing nothing. */
export const csvImportQuerySchema = z.object({ dryRun: boolFromQuery.optional() }).strict();
export type CsvImportQuery = z.infer<typeof csvImportQuerySchema>;
