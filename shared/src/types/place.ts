import type { StateCode } from './species.js';

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
