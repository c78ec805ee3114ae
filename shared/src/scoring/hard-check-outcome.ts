import type { RegionContext, Site } from '../types/site.js';
import { MOISTURE_LEVELS, SUN_LEVELS, type Species, type StateCode } from '../types/species.js';
import { factsOf, isNativeTo, stepsFromBits } from './species-facts.js';
import { HEIGHT_NEAR_MISS_FACTOR, ROOM } from './score-weights.js';
import { STATE_NEIGHBOURS } from './state-neighbours.js';
import { ecoregionFails, layerVerdict, spreaderFails } from './practice-checks.js';

/** What the hard checks make of a species: eligible, out by one step only (a near miss), or out. */
export type HardCheckOutcome = 'eligible' | 'near-miss' | 'out';

/**
 * The hard checks' verdict (scoreSpecies' `eligible` and `nearMiss`) without building a word: a
 * mix needs full reasons only for the species it can hold, and a ranking drops species that miss
 * by more than one step, which is most of a big catalogue on a shady or wet site. Mirrors the pass
 * and near-miss conditions of each check in hard-checks.ts; hard-checks.test.ts keeps them in step.
 */
export function hardCheckOutcome(
  species: Species,
  site: Site,
  region: RegionContext,
  facts = factsOf(species),
): HardCheckOutcome {
  // Each check adds a failure and whether it was by one step; two failures are always out.
  let failures = 0;
  let nearMiss = false;
  if (!isNativeTo(facts, region.state)) {
    failures++;
    nearMiss = nativeNextDoor(species, region.state);
  }
  const sunSteps = stepsFromBits(facts.sunBits, SUN_LEVELS.indexOf(site.sun));
  if (sunSteps !== 0) {
    if (++failures > 1) return 'out';
    nearMiss = sunSteps === 1;
  }
  const moistureSteps = stepsFromBits(facts.moistureBits, MOISTURE_LEVELS.indexOf(site.moisture));
  if (moistureSteps !== 0) {
    if (++failures > 1) return 'out';
    nearMiss = moistureSteps === 1;
  }
  const limit = site.maxHeightCm;
  if (limit !== undefined && species.heightCm.min > limit) {
    if (++failures > 1) return 'out';
    nearMiss = species.heightCm.min <= limit * HEIGHT_NEAR_MISS_FACTOR;
  }
  const footprint = facts.footprintSqFt;
  if (footprint > site.areaSqFt) {
    if (++failures > 1) return 'out';
    nearMiss = footprint <= ROOM.nearMissFactor * site.areaSqFt;
  }
  if (ecoregionFails(species, region, facts)) {
    if (++failures > 1) return 'out';
    nearMiss = false;
  }
  const layer = layerVerdict(species, site, facts);
  if (layer !== 'pass') {
    if (++failures > 1) return 'out';
    nearMiss = layer === 'near-miss';
  }
  if (facts.shortLived) {
    if (++failures > 1) return 'out';
    nearMiss = true;
  }
  if (spreaderFails(species, site, facts)) {
    if (++failures > 1) return 'out';
    nearMiss = true;
  }
  if (failures === 0) return 'eligible';
  return nearMiss ? 'near-miss' : 'out';
}

function nativeNextDoor(species: Species, state: StateCode): boolean {
  for (const s of STATE_NEIGHBOURS[state]) if (species.nativeStates.includes(s)) return true;
  return false;
}
