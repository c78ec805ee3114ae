import { z } from 'zod';
import { regionContextSchema, siteRequestSchema } from './site.js';
import { slugSchema } from './species.js';

/** CP42 bloom periods (CP42-IN): early Apr–15 Jun, mid 15 Jun–Jul, late Aug–Oct. */
export const BLOOM_PERIODS = ['early', 'mid', 'late'] as const;
export type BloomPeriod = (typeof BLOOM_PERIODS)[number];

export type ScorePartName =
  | 'native'
  | 'sun'
  | 'moisture'
  | 'soil'
  | 'habitat'
  | 'host-plant'
  | 'monarch-host'
  | 'pollinators'
  | 'birds'
  | 'bloom-gap'
  | 'height'
  | 'room'
  | 'deer'
  | 'spread'
  | 'rain-garden'
  | 'shade-garden'
  | 'thrives'
  | 'community'
  | 'wetland-class'
  | 'acid-soil'
  | 'bees'
  | 'availability'
  | 'seed-ease'
  | 'garden-use'
  | 'fern'
  | 'ecoregion';

/** One line of "why it fits": points and a sentence a homeowner understands. */
export interface ScorePart {
  name: ScorePartName;
  points: number;
  reason: string;
}

export interface ScoredSpecies {
  slug: string;
  /** Sum of the parts' points (higher fits better); comparable only within one site. */
  score: number;
  parts: ScorePart[];
  eligible: boolean;
  /** Why it cannot go in the mix, in plain words (only when not eligible). */
  ineligibleReason?: string;
  /** Not eligible, but missed by one step only (sun, moisture, height, room, or native next door). */
  nearMiss: boolean;
  /**
   * Breaks ties in the score: how well the species thrives here (not merely tolerates), then its
   * wildlife value within its layer. Higher is better.
   */
  tieBreak?: number;
}

/** Whether Homeground's catalogue covers the site's region; when not, say so instead of recommending. */
export interface Coverage {
  covered: boolean;
  /** Plain words when not covered (e.g. the catalogue holds eastern and central species only). */
  message?: string;
}

export interface Recommendation {
  /** Eligible species, best first (score descending, then slug). */
  ranked: ScoredSpecies[];
  /** Near misses with the reason, same order (annuals and biennials among them: they are not counted into a mix). */
  alsoConsider: ScoredSpecies[];
  coverage: Coverage;
}

export const MAX_MIX_SIZE = 40;
/**
 * How many ranked species and near misses ("also consider") a recommendations answer lists, with
 * their reasons: more than a page shows. The engine ranks every species, but builds reasons only
 * for these.
 */
export const RECOMMENDATION_LIST_LIMITS = { ranked: 60, alsoConsider: 20 } as const;
/** Most slugs one request may list (locks, exclusions, a saved mix): more than any mix holds. */
export const MAX_LISTED_SLUGS = 60;

export const paletteOptionsSchema = z
  .object({
    /** Number of species in the mix; from the area when left out. */
    size: z.number().int().min(1).max(MAX_MIX_SIZE).optional(),
    /** Always in the mix: kept species, swapped-in species and species added by search. */
    locked: z.array(slugSchema).max(MAX_LISTED_SLUGS).default([]),
    /** Never in the mix (wins over a lock on the same slug). */
    excluded: z.array(slugSchema).max(MAX_LISTED_SLUGS).default([]),
  })
  .strict();
export type PaletteOptions = z.input<typeof paletteOptionsSchema>;

export const recommendRequestSchema = z.object({ site: siteRequestSchema, region: regionContextSchema }).strict();
export type RecommendRequest = z.input<typeof recommendRequestSchema>;

export const paletteRequestSchema = recommendRequestSchema
  .extend({
    options: paletteOptionsSchema.default({ locked: [], excluded: [] }),
  })
  .strict();
export type PaletteRequest = z.input<typeof paletteRequestSchema>;

export type PaletteConstraintId =
  'cp42-early' | 'cp42-mid' | 'cp42-late' | 'cp42-flowering' | 'monarch-milkweed' | 'grass-share' | 'height-spread';

/** One design rule checked on the mix; an unmet rule always says why in words. */
export interface PaletteConstraint {
  id: PaletteConstraintId;
  /** The rule itself, e.g. "At least 3 species in flower in each bloom period". */
  rule: string;
  /** False when the rule does not apply to this site (e.g. monarchs are not a goal). */
  applies: boolean;
  met: boolean;
  /** What the mix has, and when unmet, why (e.g. "Only 1 late bloomer native to your region suits dry shade"). */
  detail: string;
  /** Source key of the rule (species-data/sources.json). */
  source: string;
}

export interface ObjectiveTerm {
  name:
    | 'fit'
    | 'host-plants'
    | 'bloom-periods'
    | 'bloom-months'
    | 'flowering-count'
    | 'milkweed'
    | 'grasses'
    | 'height-tiers'
    | 'colours'
    | 'genus-variety';
  value: number;
}

export interface ChosenSpecies {
  slug: string;
  score: number;
  parts: ScorePart[];
  /** What it does for the mix as a whole, e.g. "one of 3 late bloomers". */
  roles: string[];
  locked: boolean;
}

/** How a mix is planted: plugs by count for a bed, a seeding plan by seeds/ft² for a meadow. */
export type PlantingMethod = 'plugs' | 'seeding';

export interface PaletteResult {
  size: number;
  coverage: Coverage;
  /** Plugs for a bed; a seeding plan from half an acre (see quantities/planting-method.ts). */
  plantingMethod: PlantingMethod;
  /** How the size was chosen, in words. */
  sizeReason: string;
  chosen: ChosenSpecies[];
  objective: number;
  terms: ObjectiveTerm[];
  constraints: PaletteConstraint[];
  /** Locks or exclusions that could not be honoured, and similar notes. */
  notices: string[];
}

export interface PaletteAlternative {
  slug: string;
  /** Objective of the mix with this species in the slot, minus the objective of the current mix. */
  objectiveChange: number;
  score: number;
  parts: ScorePart[];
}
