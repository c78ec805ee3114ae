import type { ScorePart } from '../types/recommendation.js';
import type { RegionContext, Site } from '../types/site.js';
import { MOISTURE_LEVELS, SUN_LEVELS, type Species } from '../types/species.js';
import { squareMetresToSquareFeet } from '../units/conversions.js';
import { formatArea, formatHeightCm, formatHeightRangeCm } from '../units/format-units.js';
import { MOISTURE_WORDS, SUN_WORDS, joinWords, stateName } from './plain-words.js';
import { HEIGHT_NEAR_MISS_FACTOR, POINTS, ROOM } from './score-weights.js';
import { STATE_NEIGHBOURS } from './state-neighbours.js';

/**
 * The checks that decide whether a species can go in the mix at all. Each returns either a part
 * for "why it fits" or a failure; a failure by one step only is a near miss ("also consider").
 */
export type CheckResult = { part: ScorePart } | { failure: string; nearMiss: boolean } | null;

export function checkNative(species: Species, region: RegionContext): CheckResult {
  const here = stateName(region.state);
  if (species.nativeStates.includes(region.state)) {
    return { part: { name: 'native', points: 0, reason: `Native to ${here}.` } };
  }
  const nextDoor = STATE_NEIGHBOURS[region.state].filter((s) => species.nativeStates.includes(s));
  if (nextDoor.length > 0) {
    return {
      failure: `Native next door in ${joinWords(nextDoor.map(stateName))}, but not recorded as native in ${here}.`,
      nearMiss: true,
    };
  }
  return { failure: `Not native to ${here}.`, nearMiss: false };
}

/** Steps between the site's level and the nearest level the species takes (0 = it takes it). */
function stepsAway<T extends string>(levels: readonly T[], wanted: readonly T[], site: T): number {
  const at = levels.indexOf(site);
  return Math.min(...wanted.map((w) => Math.abs(levels.indexOf(w) - at)));
}

export function checkSun(species: Species, site: Site): CheckResult {
  const wants = joinWords(species.sun.map((s) => SUN_WORDS[s]), 'or');
  const steps = stepsAway(SUN_LEVELS, species.sun, site.sun);
  if (steps === 0) {
    return { part: { name: 'sun', points: POINTS.sunMatch, reason: `Grows in ${wants}; your ground has ${SUN_WORDS[site.sun]}.` } };
  }
  return { failure: `Needs ${wants}; your ground has ${SUN_WORDS[site.sun]}.`, nearMiss: steps === 1 };
}

export function checkMoisture(species: Species, site: Site): CheckResult {
  const wants = joinWords(species.moisture.map((m) => MOISTURE_WORDS[m]), 'or');
  const steps = stepsAway(MOISTURE_LEVELS, species.moisture, site.moisture);
  const yours = `your soil is ${MOISTURE_WORDS[site.moisture]}`;
  if (steps === 0) {
    return { part: { name: 'moisture', points: POINTS.moistureMatch, reason: `Takes ${wants} soil; ${yours}.` } };
  }
  return { failure: `Needs ${wants} soil; ${yours}.`, nearMiss: steps === 1 };
}

export function checkHeight(species: Species, site: Site): CheckResult {
  const limit = site.maxHeightCm;
  if (limit === undefined) return null;
  const { min, max } = species.heightCm;
  const grows = `grows ${formatHeightRangeCm(min, max)}`;
  const yours = `your limit is ${formatHeightCm(limit)}`;
  if (max <= limit) {
    return { part: { name: 'height', points: POINTS.heightWithin, reason: `Stays low enough: ${grows}; ${yours}.` } };
  }
  if (min <= limit) {
    return {
      part: { name: 'height', points: POINTS.heightPartlyOver, reason: `Can grow taller than you want: ${grows}; ${yours}.` },
    };
  }
  return { failure: `Too tall: ${grows}; ${yours}.`, nearMiss: min <= limit * HEIGHT_NEAR_MISS_FACTOR };
}

/**
 * Room: a plant's mature footprint (a circle as wide as the narrow end of its spread) against the
 * planting area. A tree wider than the whole bed is out (a near miss if the bed is at least half
 * its footprint); one that would shade a good part of it costs points.
 */
export function checkRoom(species: Species, site: Site): CheckResult {
  const widthCm = species.spreadCm.min;
  const footprintSqFt = squareMetresToSquareFeet(Math.PI * (widthCm / 200) ** 2);
  const across = `grows about ${formatHeightCm(widthCm)} across`;
  const bed = `your ${formatArea(site.areaSqFt)} bed`;
  if (footprintSqFt > site.areaSqFt) {
    return { failure: `Too big: it ${across}, more than ${bed} can hold.`, nearMiss: footprintSqFt <= ROOM.nearMissFactor * site.areaSqFt };
  }
  if (footprintSqFt > ROOM.crowdsShare * site.areaSqFt) {
    return { part: { name: 'room', points: POINTS.crowds, reason: `Big for the space: it ${across} and will shade part of ${bed}.` } };
  }
  return null;
}
