import { z } from 'zod';
import { squareMetresToSquareFeet } from '../units/conversions.js';
import { HABITATS, habitatSchema, moistureSchema, soilTextureSchema, stateCodeSchema, sunSchema } from './species.js';

/** What the user wants their ground to do; each goal adds a part to "why it fits". */
export const GOALS = ['monarchs', 'pollinators', 'birds', 'rain-garden', 'shade-garden', 'low-spreaders'] as const;
export const goalSchema = z.enum(GOALS);
export type Goal = z.infer<typeof goalSchema>;

export const DEER_PRESSURES = ['low', 'medium', 'high'] as const;
export const deerPressureSchema = z.enum(DEER_PRESSURES);
export type DeerPressure = z.infer<typeof deerPressureSchema>;

/** 10 acres: the largest planting Homeground plans as one site (bigger plantings are field seedings). */
export const MAX_AREA_SQ_FT = 435_600;
/** The same 10 acres in m² (1 acre = 4,046.8564224 m², NIST Handbook 44). */
export const MAX_AREA_SQ_M = 40_468.564224;

/** The stored site: the area is always in ft². */
export const siteSchema = z.object({
  sun: sunSchema,
  moisture: moistureSchema,
  soilTexture: soilTextureSchema.optional(),
  /** Planting area in square feet. */
  areaSqFt: z.number().positive().max(MAX_AREA_SQ_FT),
  /** Tallest plant wanted, in centimetres (e.g. under a window or by a path). */
  maxHeightCm: z.number().min(10).max(3000).optional(),
  deerPressure: deerPressureSchema,
  goals: z
    .array(goalSchema)
    .max(GOALS.length)
    .refine((g) => new Set(g).size === g.length, {
      message: 'each goal once',
    }),
  /**
   * Add shrubs, small trees and vines (the woody layer). A yard mix is herbaceous unless asked:
   * woody plants then get a share of the bed, and only those whose mature spread fits it.
   */
  woodyPlants: z.boolean().optional(),
  /** Allow aggressive spreaders and heavy self-sowers in a small bed (they are left out unless asked). */
  spreaders: z.boolean().optional(),
});
export type Site = z.infer<typeof siteSchema>;

/**
 * A site as a request gives it: the area in ft² (`areaSqFt`) or in m² (`areaSqM`), exactly one.
 * Parsing turns it into a `Site` in ft².
 */
export const siteRequestSchema = siteSchema
  .omit({ areaSqFt: true })
  .extend({
    areaSqFt: z.number().positive().max(MAX_AREA_SQ_FT, 'must be at most 10 acres').optional(),
    areaSqM: z.number().positive().max(MAX_AREA_SQ_M, 'must be at most 10 acres').optional(),
  })
  .strict()
  .refine((s) => (s.areaSqFt === undefined) !== (s.areaSqM === undefined), {
    message: 'give the area in ft² (areaSqFt) or in m² (areaSqM), not both',
    path: ['areaSqFt'],
  })
  .transform(({ areaSqM, areaSqFt, ...rest }) => ({
    ...rest,
    areaSqFt: areaSqFt ?? squareMetresToSquareFeet(areaSqM as number),
  }))
  .pipe(siteSchema);
export type SiteRequest = z.input<typeof siteRequestSchema>;

/** Where the site is: its state, and its EPA Level III ecoregion when known. */
export const regionContextSchema = z
  .object({
    state: stateCodeSchema,
    /** EPA US Level III code, e.g. "52" for the Driftless Area. */
    ecoregionCode: z
      .string()
      .regex(/^([1-9]|[1-7][0-9]|8[0-5])$/)
      .optional(),
    /** The ecoregion's natural plant communities, in the catalogue's habitat words. */
    ecoregionPlantCommunities: z.array(habitatSchema).max(HABITATS.length).optional(),
  })
  .strict();
export type RegionContext = z.infer<typeof regionContextSchema>;
