import { z } from 'zod';
import { isoDateSchema } from '../sowing-calendar/calendar-types.js';
import { slugSchema, sowingMethodSchema, type SowingMethod, type Sun, type Moisture } from './species.js';
import type { BloomPeriod } from './recommendation.js';
import type { PlantLayer } from '../scoring/layers.js';

/**
 * A group's season plan: when the season runs (average last spring frost, plant-share date), the
 * targets (species × plants wanted) and the seed list worked out from them. Requests are strict:
 * an unknown field is a 400 naming it.
 */

/** Most plants of one species a target may ask for: a big group's share is a few hundred. */
export const MAX_TARGET_PLANTS = 5000;
/** Most species on one season plan. */
export const MAX_TARGETS = 200;

/** Methods a new season assumes until the organiser says: the three the demo growers use. */
export const DEFAULT_SEASON_METHODS: readonly SowingMethod[] = ['winter-sowing', 'outdoor-pot-winter', 'indoor-lights'];
/** Milkweed share of the plants a new season assumes (the organiser sets their own, e.g. 0.5). */
export const DEFAULT_MILKWEED_SHARE = 0.25;

/** The season's dates and seed-list settings, as an organiser writes them. */
export const seasonRequestSchema = z
  .object({
    year: z
      .number()
      .int('must be a whole year')
      .min(2000, 'must be 2000 or later')
      .max(2100, 'must be 2100 or earlier'),
    /** Average last spring frost for the group's place (a local figure the organiser looks up). */
    lastFrost: isoDateSchema,
    /** The day plants are given away; must fall after the last frost. */
    plantShareDate: isoDateSchema,
    /** The sowing methods the group's growers use; the share list proposes only what they can raise. */
    methods: z.array(sowingMethodSchema).min(1, 'must name at least one method').max(5).optional(),
    /** Share of the plants that are native milkweeds, 0–1 (e.g. 0.5 = half the plants). */
    milkweedShare: z.number().min(0, 'must be 0 or more').max(1, 'must be at most 1').optional(),
    /** Seedlings lost between germination and planting out, 0–0.9. */
    lossFactor: z.number().min(0, 'must be 0 or more').max(0.9, 'must be at most 0.9').optional(),
    /** Seeds in one packet from the group's usual supplier. */
    seedsPerPacket: z.number().int('must be a whole number').min(1, 'must be at least 1').max(100_000).optional(),
  })
  .strict()
  .refine((s) => s.plantShareDate > s.lastFrost, { message: 'must be after the last frost', path: ['plantShareDate'] })
  .refine((s) => s.lastFrost.slice(0, 4) === String(s.year), {
    message: "must fall in the season's year",
    path: ['lastFrost'],
  })
  .refine((s) => s.plantShareDate.slice(0, 4) === String(s.year), {
    message: "must fall in the season's year",
    path: ['plantShareDate'],
  });
export type SeasonRequest = z.infer<typeof seasonRequestSchema>;

/** One target: plants wanted of a species, with the organiser's own germination rate if they have one. */
export const seasonTargetSchema = z
  .object({
    slug: slugSchema.max(120),
    targetPlants: z
      .number()
      .int('must be a whole number')
      .min(1, 'must be at least 1')
      .max(MAX_TARGET_PLANTS, `must be at most ${MAX_TARGET_PLANTS}`),
    /** Germination of this seed lot in percent (e.g. from a germination test), replacing the record's. */
    germinationRatePct: z.number().min(1, 'must be at least 1').max(100, 'must be at most 100').optional(),
  })
  .strict();
export type SeasonTarget = z.infer<typeof seasonTargetSchema>;

/** Replaces the season's whole target list. */
export const targetsRequestSchema = z
  .object({
    targets: z.array(seasonTargetSchema).max(MAX_TARGETS, `must list at most ${MAX_TARGETS} species`),
  })
  .strict()
  .superRefine((r, ctx) => {
    const seen = new Set<string>();
    r.targets.forEach((t, i) => {
      if (seen.has(t.slug))
        ctx.addIssue({ code: 'custom', message: `"${t.slug}" is listed twice`, path: ['targets', i, 'slug'] });
      seen.add(t.slug);
    });
  });
export type TargetsRequest = z.infer<typeof targetsRequestSchema>;

/** Asks for a share list; what is left out comes from the season. */
export const shareListRequestSchema = z
  .object({
    methods: z.array(sowingMethodSchema).min(1, 'must name at least one method').max(5).optional(),
    milkweedShare: z.number().min(0, 'must be 0 or more').max(1, 'must be at most 1').optional(),
    /** How many species to propose. */
    count: z
      .number()
      .int('must be a whole number')
      .min(3, 'must be at least 3')
      .max(40, 'must be at most 40')
      .optional(),
    /** Plants the group means to raise in all; split into a suggested number per species. */
    totalPlants: z.number().int('must be a whole number').min(10, 'must be at least 10').max(50_000).optional(),
  })
  .strict();
export type ShareListRequest = z.infer<typeof shareListRequestSchema>;

/** One species the share list proposes, with why in words. */
export interface ShareListProposal {
  slug: string;
  commonName: string;
  scientificName: string;
  isMilkweed: boolean;
  layer: PlantLayer;
  bloomPeriods: BloomPeriod[];
  sunOptimum: Sun[];
  moistureOptimum: Moisture[];
  /** The plants this species gets of the total (milkweeds share the milkweed part). */
  suggestedPlants: number;
  /** Plain sentences: ease from seed, wildlife, bloom, the yards it suits, seed supply. */
  why: string[];
}

export interface ShareList {
  ecoregionCode: string;
  state: string;
  methods: SowingMethod[];
  milkweedShare: number;
  totalPlants: number;
  proposals: ShareListProposal[];
  /** What the list could not balance, in words (e.g. no shade plant the group's methods can raise). */
  notes: string[];
}

/** A season as the API returns it. */
export interface Season {
  groupSlug: string;
  groupName: string;
  /** The group's place, from the group. */
  place: { town: string; state: string; ecoregionCode: string | null };
  year: number;
  lastFrost: string;
  plantShareDate: string;
  methods: SowingMethod[];
  milkweedShare: number;
  lossFactor: number;
  seedsPerPacket: number;
  targets: (SeasonTarget & { commonName: string; scientificName: string })[];
  updatedAt: string;
}

/**
 * The season-dates form as the page sends it (every field text): the year stays the season's, the
 * dates are checked by `seasonRequestSchema` so the form says what the API would.
 */
export const seasonDatesFormSchema = z
  .object({
    year: z.string().max(4),
    lastFrost: z.string().max(10),
    plantShareDate: z.string().max(10),
  })
  .strict()
  .transform((f) => ({ ...f, year: Number(f.year) }))
  .pipe(seasonRequestSchema);
