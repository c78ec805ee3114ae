import { z } from 'zod';
import type { StateCode } from './species.js';

/** `GET /api/places/lookup`: a 5-digit ZIP code, or a latitude and longitude (WGS84 degrees). */
export const placeQuerySchema = z
  .object({
    zip: z
      .string()
      .trim()
      .max(10, 'must be a 5-digit US ZIP code')
      .regex(/^\d{5}$/, 'must be a 5-digit US ZIP code')
      .optional(),
    lat: z.coerce.number().min(-90, 'must be −90 to 90').max(90, 'must be −90 to 90').optional(),
    lon: z.coerce.number().min(-180, 'must be −180 to 180').max(180, 'must be −180 to 180').optional(),
  })
  .strict()
  .refine((q) => q.zip !== undefined || (q.lat !== undefined && q.lon !== undefined), {
    message: 'give a zip, or both lat and lon',
    path: ['zip'],
  });
export type PlaceQuery = z.infer<typeof placeQuerySchema>;

export interface EcoregionBrief {
  code: string;
  name: string;
  /** Share of the county's area in this region (county crosswalk), or null when not from the crosswalk. */
  share: number | null;
  description: string;
  level1: string;
  level2: string;
}

/** `GET /api/places/lookup`: your ground for a ZIP or a point. */
export interface PlaceLookup {
  point: { lat: number; lon: number };
  zip: { code: string; city: string; state: string } | null;
  state: StateCode;
  county: { fips: string; name: string };
  /** `boundary`: the point tested against imported EPA polygons; `county-crosswalk`: the county's dominant region. */
  ecoregion: EcoregionBrief & { method: 'boundary' | 'county-crosswalk' };
  /** Other regions the county overlaps, for the user to choose from when the county is split. */
  otherEcoregions: EcoregionBrief[];
}

/** An ecoregion's outline in WGS84 [longitude, latitude] positions (RFC 7946), simplified for drawing. */
export type OutlineGeometry =
  { type: 'Polygon'; coordinates: number[][][] } | { type: 'MultiPolygon'; coordinates: number[][][][] };

/** `GET /api/ecoregions/:code/outline`: the region's imported EPA outline, or null when none is loaded. */
export interface EcoregionOutline {
  code: string;
  outline: OutlineGeometry | null;
}
