import { z } from 'zod';
import type { SowingCalendar } from '../sowing-calendar/calendar-types.js';
import type { Coverage, PaletteAlternative, PaletteResult, ScoredSpecies } from './recommendation.js';
import type { SeedingLine } from '../quantities/seeding-plan.js';
import { paletteRequestSchema } from './recommendation.js';
import type { Site } from './site.js';
import type { SpeciesSummary } from './species-query.js';
import { slugSchema } from './species.js';

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

export const alternativesRequestSchema = paletteRequestSchema.extend({
  /** The slugs now in the mix. */
  chosen: z.array(slugSchema).min(1).max(60),
  /** The chosen species to find replacements for. */
  slot: slugSchema,
  /** Offer replacements of any growth form (a shrub for a wildflower); by default only the slot's own kind. */
  acrossForms: z.boolean().default(false),
});
export type AlternativesRequest = z.input<typeof alternativesRequestSchema>;

export interface AlternativesResponse {
  alternatives: (PaletteAlternative & { species: SpeciesSummary })[];
}

export const saveMixRequestSchema = z.object({
  name: z.string().trim().min(1, 'must not be empty').max(80, 'must be at most 80 characters'),
  request: paletteRequestSchema,
  /** The species in the mix as the user left it (after locks, swaps and rebalancing). */
  chosen: z.array(slugSchema).min(1).max(60),
});
export type SaveMixRequest = z.input<typeof saveMixRequestSchema>;

export interface SavedMix {
  id: string;
  name: string;
  request: z.infer<typeof paletteRequestSchema>;
  chosen: string[];
  ownerName: string;
  createdAt: string;
}

export type CalendarResponse = SowingCalendar;
