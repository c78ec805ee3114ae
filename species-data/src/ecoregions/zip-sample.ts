/**
 * A deterministic sample of ZIP centroids (zipcodes npm package) in the conterminous US and DC, used to
 * check that the county crosswalk sends people to the right ecoregion.
 */
import { createRequire } from 'node:module';
import { US_STATE_CODES } from '@homeground/shared';

export interface ZipPoint {
  zip: string;
  state: string;
  lon: number;
  lat: number;
}

interface ZipRecord {
  zip: string;
  latitude: number;
  longitude: number;
  state: string;
  country: string;
}

const require = createRequire(import.meta.url);

/** Every `step`-th US ZIP (in ZIP order) whose state is one Homeground covers. */
export function sampleZips(step: number): ZipPoint[] {
  const { codes } = require('zipcodes') as { codes: Record<string, ZipRecord> };
  const covered = new Set<string>(US_STATE_CODES);
  return Object.values(codes)
    .filter(
      (z) => z.country === 'US' && covered.has(z.state) && Number.isFinite(z.latitude) && Number.isFinite(z.longitude),
    )
    .sort((a, b) => a.zip.localeCompare(b.zip))
    .filter((_, i) => i % step === 0)
    .map((z) => ({ zip: z.zip, state: z.state, lon: z.longitude, lat: z.latitude }));
}
