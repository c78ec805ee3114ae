import { z } from 'zod';

/** `GET /api/places/lookup`: a 5-digit ZIP code, or a latitude and longitude (WGS84 degrees). */
export const placeQuerySchema = z
  .object({
    zip: z.string().trim().regex(/^\d{5}$/, 'must be a 5-digit US ZIP code').optional(),
    lat: z.coerce.number().min(-90, 'must be −90 to 90').max(90, 'must be −90 to 90').optional(),
    lon: z.coerce.number().min(-180, 'must be −180 to 180').max(180, 'must be −180 to 180').optional(),
  })
  .strict()
  .refine((q) => q.zip !== undefined || (q.lat !== undefined && q.lon !== undefined), {
    message: 'give a zip, or both lat and lon',
    path: ['zip'],
  });
export type PlaceQuery = z.infer<typeof placeQuerySchema>;
