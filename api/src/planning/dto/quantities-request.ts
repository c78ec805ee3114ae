import { MAX_AREA_SQ_FT, slugSchema, squareMetresToSquareFeet } from '@homeground/shared';
import { z } from 'zod';

/** `POST /api/quantities`: plants and seed for a list of species over an area (ft² or m²). */
export const quantitiesRequestSchema = z
  .object({
    areaSqFt: z.number().positive('must be more than 0').max(MAX_AREA_SQ_FT, 'must be at most 10 acres').optional(),
    areaSqM: z.number().positive('must be more than 0').optional(),
    species: z.array(z.object({ slug: slugSchema, spacingIn: z.number().min(4, 'must be at least 4 in').max(240).optional() })).min(1).max(60),
    /** Fraction of seedlings lost before planting out; default 0.2 (common practice). */
    lossFactor: z.number().min(0).max(0.9, 'must be at most 0.9').optional(),
    /** Share of the bed for grasses and sedges; default 0.3. */
    grassShare: z.number().min(0).max(1).optional(),
  })
  .strict()
  .refine((q) => (q.areaSqFt === undefined) !== (q.areaSqM === undefined), {
    message: 'give the area in ft² (areaSqFt) or in m² (areaSqM), not both', path: ['areaSqFt'],
  })
  .transform(({ areaSqM, areaSqFt, ...rest }) => ({ ...rest, areaSqFt: areaSqFt ?? squareMetresToSquareFeet(areaSqM as number) }));
export type QuantitiesRequest = z.infer<typeof quantitiesRequestSchema>;
