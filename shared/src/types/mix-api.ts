import { z } from 'zod';
import { type SowingCalendar, isoDateSchema, sowingCalendarRequestSchema } from '../sowing-calendar/calendar-types.js';
import type { SeedingLine } from '../quantities/seeding-plan.js';
import {
  type Coverage,
  type PaletteAlternative,
  type PaletteResult,
  type ScoredSpecies,
  MAX_LISTED_SLUGS,
  paletteRequestSchema,
} from './recommendation.js';
import { type Site, MAX_AREA_SQ_FT, MAX_AREA_SQ_M } from './site.js';
import type { SpeciesSummary } from './species-query.js';
import { slugSchema } from './species.js';
import { squareMetresToSquareFeet } from '../units/conversions.js';

/**
 * Request and response shapes of the mix endpoints (`/api/recommendations`, `/api/mixes/*`,
 * `/api/quantities`, `/api/calendar`). The API fills the ecoregion's plant communities itself, so
 * a client sends only `region: {state, ecoregionCode?}`.
 */

export type ScoredWithSpecies = ScoredSpecies & { species: SpeciesSummary };

export interface RecommendationsResponse {
  site: Site;
  /** Best first, at most 60. */
  ranked: ScoredWithSpecies[];
  /** Near misses with the reason, at most 20 (annuals and biennials among them). */
  alsoConsider: ScoredWithSpecies[];
  /** Whether the catalogue covers the region; when not, ranked is empty and the message says why. */
  coverage: Coverage;
}

/** Plants and seed for one species of a mix. */
export interface MixQuantity {
  slug: string;
  plants: number;
  spacingIn: number;
  spacingCm: number;
  areaSqFt: number;
  areaSqM: number;
  /** Seeds to sow for those plants, from the species' germination rate and the loss factor. */
  seedsToSow: number;
  /** Null when the catalogue has no seeds-per-pound figure for the species. */
  seedWeight: { grams: number; ounces: number } | null;
}

export interface MixResponse {
  site: Site;
  palette: PaletteResult;
  /** Summaries of every species the answer mentions, by slug. */
  species: Record<string, SpeciesSummary>;
  quantities: MixQuantity[];
  /** Σ plants × spacing² in ft²: never more than the bed unless it cannot hold one plant of each species. */
  totalFootprintSqFt: number;
  /** A meadow's seeding plan by seeds/ft² (from half an acre; palette.plantingMethod is 'seeding'), else null. */
  seeding: SeedingLine[] | null;
  /** Fraction of seedlings assumed lost before planting out (common practice 0.2). */
  lossFactor: number;
}

export const alternativesRequestSchema = paletteRequestSchema
  .extend({
    /** The slugs now in the mix. */
    chosen: z.array(slugSchema).min(1).max(MAX_LISTED_SLUGS),
    /** The chosen species to find replacements for. */
    slot: slugSchema,
    /** Offer replacements of any growth form (a shrub for a wildflower); by default only the slot's own kind. */
    acrossForms: z.boolean().default(false),
  })
  .strict();
export type AlternativesRequest = z.input<typeof alternativesRequestSchema>;

export interface AlternativesResponse {
  alternatives: (PaletteAlternative & { species: SpeciesSummary })[];
}

export const saveMixRequestSchema = z
  .object({
    name: z.string().trim().min(1, 'must not be empty').max(80, 'must be at most 80 characters'),
    request: paletteRequestSchema,
    /** The species in the mix as the user left it (after locks, swaps and rebalancing). */
    chosen: z.array(slugSchema).min(1).max(MAX_LISTED_SLUGS),
  })
  .strict();
export type SaveMixRequest = z.input<typeof saveMixRequestSchema>;

export interface SavedMix {
  id: string;
  name: string;
  request: z.infer<typeof paletteRequestSchema>;
  chosen: string[];
  /** The saver's first name only (anyone with the link sees it). */
  ownerFirstName: string;
  createdAt: string;
}

export type CalendarResponse = SowingCalendar;

/** `POST /api/calendar(.csv|.ics)`: the shared calendar request; `today` may be left out (the server's date is used). */
export const calendarRequestSchema = sowingCalendarRequestSchema.extend({ today: isoDateSchema.optional() }).strict();
export type CalendarRequest = z.infer<typeof calendarRequestSchema>;

/** `POST /api/quantities`: plants and seed for a list of species over an area (ft² or m², at most 10 acres). */
export const quantitiesRequestSchema = z
  .object({
    areaSqFt: z.number().positive('must be more than 0').max(MAX_AREA_SQ_FT, 'must be at most 10 acres').optional(),
    areaSqM: z.number().positive('must be more than 0').max(MAX_AREA_SQ_M, 'must be at most 10 acres').optional(),
    species: z
      .array(
        z
          .object({ slug: slugSchema, spacingIn: z.number().min(4, 'must be at least 4 in').max(240).optional() })
          .strict(),
      )
      .min(1)
      .max(MAX_LISTED_SLUGS),
    /** Fraction of seedlings lost before planting out; default 0.2 (common practice). */
    lossFactor: z.number().min(0).max(0.9, 'must be at most 0.9').optional(),
    /** Share of the bed for grasses and sedges; default 0.3. */
    grassShare: z.number().min(0).max(1).optional(),
  })
  .strict()
  .refine((q) => (q.areaSqFt === undefined) !== (q.areaSqM === undefined), {
    message: 'give the area in ft² (areaSqFt) or in m² (areaSqM), not both',
    path: ['areaSqFt'],
  })
  .transform(({ areaSqM, areaSqFt, ...rest }) => ({
    ...rest,
    areaSqFt: areaSqFt ?? squareMetresToSquareFeet(areaSqM as number),
  }));
export type QuantitiesRequest = z.infer<typeof quantitiesRequestSchema>;
export type QuantitiesRequestInput = z.input<typeof quantitiesRequestSchema>;
