import type { PlaceLookup } from '../types/place.js';

export type EcoregionMethod = PlaceLookup['ecoregion']['method'];

/** How a lookup found the ecoregion, as a short lead-in ("By county: …"). */
export const ECOREGION_METHOD_WORDS = {
  boundary: 'by boundary',
  'county-crosswalk': 'by county',
} as const satisfies Record<EcoregionMethod, string>;

/**
 * One sentence saying how the ecoregion of a lookup was found: by the EPA outline at the point when
 * the boundaries are loaded, else by the county's largest share (the county crosswalk).
 */
export function ecoregionFoundWords(lookup: Pick<PlaceLookup, 'ecoregion' | 'zip'>): string {
  const { method, name, share } = lookup.ecoregion;
  const lead = ECOREGION_METHOD_WORDS[method].replace(/^./, (c) => c.toUpperCase());
  if (method === 'boundary') {
    const where = lookup.zip ? 'the centre of your ZIP code' : 'your point';
    return `${lead}: ${where} lies inside the EPA's outline of ${name}.`;
  }
  if (share !== null && share >= 0.995) return `${lead}: all of your county is in ${name}.`;
  const about = share === null ? '' : ` (about ${Math.round(share * 100)}%)`;
  return `${lead}: your county is mostly in ${name}${about}. Near an edge your ground may be in another one; choose it below if you know.`;
}
