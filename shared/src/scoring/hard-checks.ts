import type { ScorePart } from '../types/recommendation.js';
import type { RegionContext, Site } from '../types/site.js';
import { MOISTURE_LEVELS, SUN_LEVELS, type Species } from '../types/species.js';
import { squareMetresToSquareFeet } from '../units/conversions.js';
import { formatArea, formatHeightCm, formatHeightRangeCm } from '../units/format-units.js';
import { stateName } from './plain-words.js';
import { joinWords } from '../vocabulary/join-words.js';
import { MOISTURE_WORDS, SUN_WORDS } from '../vocabulary/site-words.js';
import { HEIGHT_NEAR_MISS_FACTOR, POINTS, ROOM } from './score-weights.js';
import { STATE_NEIGHBOURS } from './state-neighbours.js';
import { factsOf, isNativeTo, stepsFromBits } from './species-facts.js';
import { Interned, WordCache } from './word-cache.js';

/**
 * The checks that decide whether a species can go in the mix at all. Each returns either a part
 * for "why it fits" or a failure; a failure by one step only is a near miss ("also consider").
 * hard-check-outcome.ts gives the same verdict without the words.
 */
export type CheckResult = { part: ScorePart } | { failure: string; nearMiss: boolean } | null;

/** Passing results are the same for every species with the same key, so each is made once (frozen). */
const passes = new Interned<string | number, CheckResult>();
const failures = new WordCache<string | number>();

function passed(key: string | number, part: ScorePart): CheckResult {
  return passes.keep(key, Object.freeze({ part: Object.freeze(part) }));
}

export function checkNative(species: Species, region: RegionContext, facts = factsOf(species)): CheckResult {
  const state = region.state;
  if (isNativeTo(facts, state)) {
    return passes.get(state) ?? passed(state, { name: 'native', points: 0, reason: `Native to ${stateName(state)}.` });
  }
  const nextDoor = STATE_NEIGHBOURS[state].filter((s) => species.nativeStates.includes(s));
  if (nextDoor.length > 0) {
    const key = `${state}<${nextDoor.join(',')}`;
    const failure =
      failures.get(key) ??
      failures.keep(
        key,
        `Native next door in ${joinWords(nextDoor.map(stateName))}, but not recorded as native in ${stateName(state)}.`,
      );
    return { failure, nearMiss: true };
  }
  const key = `!${state}`;
  return { failure: failures.get(key) ?? failures.keep(key, `Not native to ${stateName(state)}.`), nearMiss: false };
}

/** Steps between the site's level and the nearest level the species takes (0 = it takes it). */
export function stepsAway<T extends string>(levels: readonly T[], wanted: readonly T[], site: T): number {
  const at = levels.indexOf(site);
  let steps = Infinity;
  for (const w of wanted) steps = Math.min(steps, Math.abs(levels.indexOf(w) - at));
  return steps;
}

function sunWanted(species: Species): string {
  return joinWords(
    species.sun.map((s) => SUN_WORDS[s]),
    'or',
  );
}

// Numeric keys: sun codes are multiples of 4, moisture codes 4k + 2; a pass is the code + 1.
export function checkSun(species: Species, site: Site, facts = factsOf(species)): CheckResult {
  const at = SUN_LEVELS.indexOf(site.sun);
  const steps = stepsFromBits(facts.sunBits, at);
  const code = (at * facts.sunCodeScale + facts.sunListCode) * 4;
  const ground = SUN_WORDS[site.sun];
  if (steps === 0) {
    return (
      passes.get(code + 1) ??
      passed(code + 1, {
        name: 'sun',
        points: POINTS.sunMatch,
        reason: `Grows in ${sunWanted(species)}; your ground has ${ground}.`,
      })
    );
  }
  const failure = failures.get(code) ?? failures.keep(code, `Needs ${sunWanted(species)}; your ground has ${ground}.`);
  return { failure, nearMiss: steps === 1 };
}

function moistureWanted(species: Species): string {
  return joinWords(
    species.moisture.map((m) => MOISTURE_WORDS[m]),
    'or',
  );
}

export function checkMoisture(species: Species, site: Site, facts = factsOf(species)): CheckResult {
  const at = MOISTURE_LEVELS.indexOf(site.moisture);
  const steps = stepsFromBits(facts.moistureBits, at);
  const code = (at * facts.moistureCodeScale + facts.moistureListCode) * 4 + 2;
  const yours = MOISTURE_WORDS[site.moisture];
  if (steps === 0) {
    return (
      passes.get(code + 1) ??
      passed(code + 1, {
        name: 'moisture',
        points: POINTS.moistureMatch,
        reason: `Takes ${moistureWanted(species)} soil; your soil is ${yours}.`,
      })
    );
  }
  const failure =
    failures.get(code) ?? failures.keep(code, `Needs ${moistureWanted(species)} soil; your soil is ${yours}.`);
  return { failure, nearMiss: steps === 1 };
}

function heightWords(min: number, max: number, limit: number): string {
  return `grows ${formatHeightRangeCm(min, max)}; your limit is ${formatHeightCm(limit)}`;
}

export function checkHeight(species: Species, site: Site): CheckResult {
  const limit = site.maxHeightCm;
  if (limit === undefined) return null;
  const { min, max } = species.heightCm;
  if (max <= limit) {
    // Height words name the species' own range, so they are rarely shared: no cache.
    return {
      part: {
        name: 'height',
        points: POINTS.heightWithin,
        reason: `Stays low enough: ${heightWords(min, max, limit)}.`,
      },
    };
  }
  if (min <= limit) {
    const reason = `Can grow taller than you want: ${heightWords(min, max, limit)}.`;
    return { part: { name: 'height', points: POINTS.heightPartlyOver, reason } };
  }
  return { failure: `Too tall: ${heightWords(min, max, limit)}.`, nearMiss: min <= limit * HEIGHT_NEAR_MISS_FACTOR };
}

/** The mature footprint in ft²: a circle as wide as the narrow end of the spread. */
export function footprintSqFtOf(species: Species): number {
  return squareMetresToSquareFeet(Math.PI * (species.spreadCm.min / 200) ** 2);
}

/**
 * Room: a plant's mature footprint against the planting area. A tree wider than the whole bed is
 * out (a near miss if the bed is at least half its footprint); one that would shade a good part of
 * it costs points. Words only for those few: most plants fit and need none.
 */
export function checkRoom(species: Species, site: Site, facts = factsOf(species)): CheckResult {
  const widthCm = species.spreadCm.min;
  const footprintSqFt = facts.footprintSqFt;
  if (footprintSqFt > site.areaSqFt) {
    return {
      failure: `Too big: it grows about ${formatHeightCm(widthCm)} across, more than your ${formatArea(site.areaSqFt)} bed can hold.`,
      nearMiss: footprintSqFt <= ROOM.nearMissFactor * site.areaSqFt,
    };
  }
  if (footprintSqFt > ROOM.crowdsShare * site.areaSqFt) {
    const reason = `Big for the space: it grows about ${formatHeightCm(widthCm)} across and will shade part of your ${formatArea(site.areaSqFt)} bed.`;
    return { part: { name: 'room', points: POINTS.crowds, reason } };
  }
  return null;
}
