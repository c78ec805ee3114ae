import { z } from 'zod';
import { habitatSchema, stateCodeSchema, US_STATE_CODES } from './species.js';

/** An EPA Level III ecoregion of the conterminous US, with its Level II and Level I parents. */
export const ecoregionSchema = z.object({
  /** EPA US Level III code, "1"–"85". */
  code: z.string().regex(/^([1-9]|[1-7][0-9]|8[0-5])$/),
  name: z.string().min(3),
  level2: z.object({ code: z.string().regex(/^\d+\.\d+$/), name: z.string() }),
  level1: z.object({ code: z.string().regex(/^\d+$/), name: z.string() }),
  states: z.array(stateCodeSchema).min(1),
  /** Natural plant communities of the region, in the catalogue's habitat words. */
  plantCommunities: z.array(habitatSchema).min(1),
  /** One or two plain sentences for a homeowner choosing among a state's regions. */
  description: z.string().min(20),
  sources: z.record(z.enum(['code', 'name', 'parents', 'states', 'plantCommunities']), z.string()),
});
export type Ecoregion = z.infer<typeof ecoregionSchema>;

/** An EPA US Level III ecoregion code, "1"–"85" (as a path parameter or a field). */
export const ecoregionCodeSchema = z
  .string()
  .max(2, 'must be an EPA Level III code, 1–85')
  .regex(/^([1-9]|[1-7][0-9]|8[0-5])$/, 'must be an EPA Level III code, 1–85');

/** Query string of `GET /api/ecoregions`: only the regions that reach into a state. */
export const ecoregionListQuerySchema = z
  .object({ state: z.enum(US_STATE_CODES, { message: 'must be a USPS code of the 48 states or DC' }).optional() })
  .strict();
export type EcoregionListQuery = z.infer<typeof ecoregionListQuerySchema>;

/** One county's overlap with Level III ecoregions, shares summing to about 1. */
export const countyEcoregionSchema = z.object({
  /** 5-digit county FIPS code. */
  fips: z.string().regex(/^\d{5}$/),
  /** County name as the Census Bureau writes it, e.g. "Vernon". */
  name: z.string().min(1),
  state: stateCodeSchema,
  ecoregions: z.array(z.object({ code: z.string(), share: z.number().min(0).max(1) })).min(1),
});
export type CountyEcoregions = z.infer<typeof countyEcoregionSchema>;
