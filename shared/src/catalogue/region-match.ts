import type { Ecoregion } from '../types/ecoregion.js';
import type { Species } from '../types/species.js';

/**
 * Whether a species belongs to an ecoregion: native (USDA) to a state the region spans, and at home in
 * one of the region's natural plant communities. The state test alone would put coastal-plain species
 * in the Driftless Area of the same state; the habitat test alone ignores range.
 */
export function belongsToEcoregion(
  species: Pick<Species, 'nativeStates' | 'habitats'>,
  region: Pick<Ecoregion, 'states' | 'plantCommunities'>,
): boolean {
  const states = new Set<string>(region.states);
  if (!species.nativeStates.some((s) => states.has(s))) return false;
  const communities = new Set<string>(region.plantCommunities);
  return species.habitats.some((h) => communities.has(h));
}
