import type { RegionContext, Site } from '../types/site.js';
import { MOISTURE_LEVELS, SUN_LEVELS, US_STATE_CODES, type Species, type StateCode } from '../types/species.js';
import { SMALL_BED_SQ_FT, woodyShare } from './layers.js';
import { HEIGHT_NEAR_MISS_FACTOR, ROOM } from './score-weights.js';
import { factsOf } from './species-facts.js';
import { STATE_NEIGHBOURS } from './state-neighbours.js';

/**
 * hardCheckOutcome for a whole catalogue at once. Every request runs the hard checks on every
 * record, and at 30,000 records following each record's own objects (its states, levels, facts)
 * through memory cost more than the checks. Here the facts the checks read are laid out once per
 * catalogue in flat typed arrays, and one pass over them gives every verdict.
 *
 * The same checks in the same order as hard-check-outcome.ts (see there for why each is what it
 * is); catalogue-outcomes.test.ts keeps the two in step.
 */

/** A verdict per catalogue index. */
export const OUT = 0;
export const NEAR_MISS = 1;
export const ELIGIBLE = 2;

const STRUCTURAL = 1;
const SHORT_LIVED = 2;
const UNRULY = 4;
const HAS_ECOREGIONS = 8;

interface CatalogueTable {
  /** Native states as a bit set over US_STATE_CODES: bits 0–29 and 30–59. */
  nativeLow: Int32Array;
  nativeHigh: Int32Array;
  /** Sun and moisture levels taken, as bit sets over SUN_LEVELS and MOISTURE_LEVELS. */
  sun: Uint8Array;
  moisture: Uint8Array;
  heightMinCm: Float64Array;
  footprintSqFt: Float64Array;
  flags: Uint8Array;
  /** Whether each record lists an ecoregion, by code: made when a code is first asked for. */
  inEcoregion: Map<string, Uint8Array>;
}

const STATE_BITS = 30;
const stateIndex = new Map<string, number>(US_STATE_CODES.map((s, i) => [s, i]));

const tables = new WeakMap<readonly Species[], CatalogueTable>();

function tableOf(catalogue: readonly Species[]): CatalogueTable {
  const known = tables.get(catalogue);
  if (known !== undefined) return known;
  const n = catalogue.length;
  const t: CatalogueTable = {
    nativeLow: new Int32Array(n),
    nativeHigh: new Int32Array(n),
    sun: new Uint8Array(n),
    moisture: new Uint8Array(n),
    heightMinCm: new Float64Array(n),
    footprintSqFt: new Float64Array(n),
    flags: new Uint8Array(n),
    inEcoregion: new Map(),
  };
  for (let i = 0; i < n; i++) {
    const s = catalogue[i];
    const f = factsOf(s);
    for (const state of s.nativeStates) {
      const at = stateIndex.get(state);
      if (at === undefined) continue;
      if (at < STATE_BITS) t.nativeLow[i] |= 1 << at;
      else t.nativeHigh[i] |= 1 << (at - STATE_BITS);
    }
    for (const l of s.sun) t.sun[i] |= 1 << SUN_LEVELS.indexOf(l);
    for (const l of s.moisture) t.moisture[i] |= 1 << MOISTURE_LEVELS.indexOf(l);
    t.heightMinCm[i] = s.heightCm.min;
    t.footprintSqFt[i] = f.footprintSqFt;
    t.flags[i] =
      (f.structural ? STRUCTURAL : 0) |
      (f.shortLived ? SHORT_LIVED : 0) |
      (f.unruly ? UNRULY : 0) |
      (f.ecoregions !== undefined ? HAS_ECOREGIONS : 0);
  }
  tables.set(catalogue, t);
  return t;
}

function membersOf(catalogue: readonly Species[], t: CatalogueTable, code: string): Uint8Array {
  let members = t.inEcoregion.get(code);
  if (members === undefined) {
    members = new Uint8Array(catalogue.length);
    for (let i = 0; i < catalogue.length; i++) members[i] = factsOf(catalogue[i]).ecoregions?.has(code) ? 1 : 0;
    t.inEcoregion.set(code, members);
  }
  return members;
}

/** Steps from a site level (index) to the nearest level in a bit set of three levels; 9 for none. */
function stepsFrom(levels: number, at: number): number {
  let steps = 9;
  for (let j = 0; j < 3; j++) if (levels & (1 << j)) steps = Math.min(steps, Math.abs(j - at));
  return steps;
}

/** Bit set of states: [low, high]. */
function stateBits(states: readonly StateCode[]): [number, number] {
  let low = 0;
  let high = 0;
  for (const s of states) {
    const at = stateIndex.get(s);
    if (at === undefined) continue;
    if (at < STATE_BITS) low |= 1 << at;
    else high |= 1 << (at - STATE_BITS);
  }
  return [low, high];
}

/**
 * The hard checks' verdict (OUT, NEAR_MISS or ELIGIBLE) for every record of `catalogue`, by index:
 * hardCheckOutcome of each, in one pass.
 */
export function catalogueOutcomes(catalogue: readonly Species[], site: Site, region: RegionContext): Uint8Array {
  const t = tableOf(catalogue);
  const n = catalogue.length;
  const out = new Uint8Array(n);
  const [stateLow, stateHigh] = stateBits([region.state]);
  const [nextLow, nextHigh] = stateBits(STATE_NEIGHBOURS[region.state] ?? []);
  // Steps by level set (0–7), worked out once for this site rather than per record.
  const sunAt = SUN_LEVELS.indexOf(site.sun);
  const moistureAt = MOISTURE_LEVELS.indexOf(site.moisture);
  const sunSteps = new Uint8Array(8);
  const moistureSteps = new Uint8Array(8);
  for (let m = 0; m < 8; m++) {
    sunSteps[m] = stepsFrom(m, sunAt);
    moistureSteps[m] = stepsFrom(m, moistureAt);
  }
  const limit = site.maxHeightCm;
  const area = site.areaSqFt;
  const woodyRoom = woodyShare(area) * area;
  const unrulyFails = !(site.spreaders || area >= SMALL_BED_SQ_FT);
  const code = region.ecoregionCode;
  const members = code === undefined ? null : membersOf(catalogue, t, code);

  for (let i = 0; i < n; i++) {
    let failures = 0;
    let nearMiss = false;
    if ((t.nativeLow[i] & stateLow) === 0 && (t.nativeHigh[i] & stateHigh) === 0) {
      failures++;
      nearMiss = (t.nativeLow[i] & nextLow) !== 0 || (t.nativeHigh[i] & nextHigh) !== 0;
    }
    const sun = sunSteps[t.sun[i]];
    if (sun !== 0) {
      if (++failures > 1) continue;
      nearMiss = sun === 1;
    }
    const moisture = moistureSteps[t.moisture[i]];
    if (moisture !== 0) {
      if (++failures > 1) continue;
      nearMiss = moisture === 1;
    }
    const heightMin = t.heightMinCm[i];
    if (limit !== undefined && heightMin > limit) {
      if (++failures > 1) continue;
      nearMiss = heightMin <= limit * HEIGHT_NEAR_MISS_FACTOR;
    }
    const footprint = t.footprintSqFt[i];
    if (footprint > area) {
      if (++failures > 1) continue;
      nearMiss = footprint <= ROOM.nearMissFactor * area;
    }
    const flags = t.flags[i];
    if (members !== null && flags & HAS_ECOREGIONS && members[i] === 0) {
      if (++failures > 1) continue;
      nearMiss = false;
    }
    if (flags & STRUCTURAL) {
      if (!site.woodyPlants) {
        if (++failures > 1) continue;
        nearMiss = false;
      } else if (!(footprint <= woodyRoom || footprint > area)) {
        if (++failures > 1) continue;
        nearMiss = true;
      }
    }
    if (flags & SHORT_LIVED) {
      if (++failures > 1) continue;
      nearMiss = true;
    } else if (unrulyFails && flags & UNRULY) {
      if (++failures > 1) continue;
      nearMiss = true;
    }
    out[i] = failures === 0 ? ELIGIBLE : nearMiss ? NEAR_MISS : OUT;
  }
  return out;
}
