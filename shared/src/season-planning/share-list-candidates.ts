import { isNativeMilkweed } from '../scoring/genus.js';
import { layerOf, type PlantLayer } from '../scoring/layers.js';
import type { Species, SowingMethod, StateCode } from '../types/species.js';
import { methodsThatSuit } from './seed-ease.js';

/**
 * Herbaceous perennials: what a plant share gives best. Plugs of trees and shrubs take years to
 * size up and annuals are gone by fall, so both are proposed only when the perennials run out.
 */
export function isHerbaceousPerennial(species: Species): boolean {
  return (
    layerOf(species) === 'herbaceous' &&
    (species.lifespan === 'perennial' || species.lifespan === 'short-lived-perennial')
  );
}

/**
 * A species a giveaway may never propose on its own: protected in the group's state, carrying a
 * protected caution anywhere (a rarity: seed only from a nursery that propagates it), or restricted
 * by some states. The organiser can still add one by hand, and the seed list then warns.
 */
export function isWithheldFromShareList(species: Species, state: StateCode): boolean {
  return (
    species.protectedIn.includes(state) ||
    species.cautions.some((c) => c.kind === 'protected' || c.kind === 'regulated')
  );
}

export interface ShareCandidate {
  species: Species;
  layer: PlantLayer;
  isMilkweed: boolean;
  methods: SowingMethod[];
}

/**
 * Species native to both the group's ecoregion and its state (an ecoregion crosses state lines, and
 * a plant native to its other side may not be native here) that the group's methods can raise from
 * seed, without the withheld ones.
 */
export function shareCandidates(
  species: readonly Species[],
  ecoregionCode: string,
  state: StateCode,
  methods: readonly SowingMethod[],
): ShareCandidate[] {
  const out: ShareCandidate[] = [];
  for (const s of species) {
    if (!s.ecoregions.includes(ecoregionCode) || !s.nativeStates.includes(state)) continue;
    if (isWithheldFromShareList(s, state)) continue;
    const suits = methodsThatSuit(s, methods);
    if (suits.length === 0) continue;
    out.push({ species: s, layer: layerOf(s), isMilkweed: isNativeMilkweed(s), methods: suits });
  }
  return out;
}
