import type { BloomPeriod, ScorePart } from '../types/recommendation.js';
import {
  MOISTURE_LEVELS,
  SUN_LEVELS,
  US_STATE_CODES,
  type FlowerColour,
  type Moisture,
  type Species,
  type Sun,
} from '../types/species.js';
import { bloomPeriodsOf, isFloweringSpecies } from './bloom-periods.js';
import { genusOf, isNativeMilkweed } from './genus.js';
import { isStructural, layerOf, matureFootprintSqFt, type PlantLayer } from './layers.js';
import { availabilityPart, beePartOf, isLawnOrPathPlant, layeredHostPart, seedEasePart } from './practice-parts.js';
import { ecoregionsOf, moistureOptimumOf, selfSows, sunOptimumOf } from './species-traits.js';
import { flowersPartOf } from './wildlife-parts.js';
import { hostValueOnHerbaceousScale } from './wildlife-value.js';
import { levelListCode } from './word-cache.js';

/**
 * What the engine needs to know about one species that does not depend on the site: worked out
 * once per record instead of on every request. At 30,000 species, re-deriving these (the genus
 * from the name, the layer, the footprint, the parts that name the species alone) was a good part
 * of each request's time and most of its garbage.
 *
 * Keyed by the record object in a WeakMap, so a record that is dropped (a catalogue reload builds
 * new ones) takes its facts with it. Records are never changed in place: the catalogue and the API
 * store treat them as values, so a fact cannot go stale.
 */
export interface SpeciesFacts {
  /**
   * Native states as bits of their index in US_STATE_CODES (0–29 low, 30–59 high): numbers held in
   * the facts themselves, so checking nativity touches no other object.
   */
  nativeLow: number;
  nativeHigh: number;
  /**
   * levelListCode of its sun list with the site level at index `at` in front is
   * `at * sunCodeScale + sunListCode` (likewise moisture): numbers in the facts themselves.
   */
  sunListCode: number;
  sunCodeScale: number;
  moistureListCode: number;
  moistureCodeScale: number;
  /** A protected species (isProtectedSpecies). */
  protected: boolean;
  genus: string;
  layer: PlantLayer;
  /** A shrub, tree or vine (isStructural). */
  structural: boolean;
  /** Mature footprint in ft² (matureFootprintSqFt, as checkRoom measures it). */
  footprintSqFt: number;
  /** An annual or a biennial (lifespanFails). */
  shortLived: boolean;
  /** Aggressive spreader or heavy self-sower (spreaderFails, before the site is asked). */
  unruly: boolean;
  ecoregions: ReadonlySet<string> | undefined;
  /**
   * The same ecoregions as bits of their number (EPA Level III codes are 1–85), held in the facts
   * themselves; null when a code is not a whole number below 128 (then the set decides).
   */
  ecoregionBits: number | null;
  ecoregionBits2: number;
  ecoregionBits3: number;
  ecoregionBits4: number;
  sunOptimum: readonly Sun[];
  moistureOptimum: readonly Moisture[];
  /** Sun and moisture levels taken and at their best, as bits of their index in SUN_LEVELS / MOISTURE_LEVELS. */
  sunBits: number;
  moistureBits: number;
  sunOptimumBits: number;
  moistureOptimumBits: number;
  /** The first sun level the record lists (its main one), as an index in SUN_LEVELS; -1 for none. */
  firstSun: number;
  /** Parts that name the species alone (practice-parts.ts), or null where it earns none. */
  hostPart: ScorePart | null;
  availabilityPart: ScorePart | null;
  seedEasePart: ScorePart | null;
  /** A plant for paths and lawns (isLawnOrPathPlant). */
  lawnOrPath: boolean;
  /** beesPart and pollinatorPart when pollinators are a goal. */
  beePart: ScorePart | null;
  flowersPart: ScorePart | null;
  flowering: boolean;
  /** CP42 periods of its bloom months (empty unless flowering). */
  periods: readonly BloomPeriod[];
  /** Bloom months (empty unless flowering). */
  months: readonly number[];
  hostCountOnHerbaceousScale: number;
  milkweed: boolean;
  graminoid: boolean;
  /** Flower colours (empty unless flowering). */
  colours: readonly FlowerColour[];
}

const cache = new WeakMap<Species, SpeciesFacts>();

export function factsOf(species: Species): SpeciesFacts {
  const known = cache.get(species);
  if (known !== undefined) return known;
  const facts = workOut(species);
  cache.set(species, facts);
  return facts;
}

const factsByCatalogue = new WeakMap<readonly Species[], readonly SpeciesFacts[]>();

/**
 * Every record's facts, by catalogue index: one lookup per request instead of one per record and
 * check (a WeakMap lookup per species and check was itself a good part of a request at 30,000).
 */
export function catalogueFacts(catalogue: readonly Species[]): readonly SpeciesFacts[] {
  const known = factsByCatalogue.get(catalogue);
  if (known !== undefined) return known;
  const all = catalogue.map(factsOf);
  factsByCatalogue.set(catalogue, all);
  return all;
}

const STATE_INDEX: ReadonlyMap<string, number> = new Map(US_STATE_CODES.map((s, i) => [s, i]));
const STATE_BITS = 30;

/** A state's bit in nativeLow or nativeHigh (the other is 0); both 0 for a code not in US_STATE_CODES. */
export function stateBit(state: string): { low: number; high: number } {
  const at = STATE_INDEX.get(state);
  if (at === undefined) return { low: 0, high: 0 };
  return at < STATE_BITS ? { low: 1 << at, high: 0 } : { low: 0, high: 1 << (at - STATE_BITS) };
}

/** Bits of a list of states, as nativeLow and nativeHigh. */
export function stateBits(states: readonly string[]): { nativeLow: number; nativeHigh: number } {
  let nativeLow = 0;
  let nativeHigh = 0;
  for (const s of states) {
    const { low, high } = stateBit(s);
    nativeLow |= low;
    nativeHigh |= high;
  }
  return { nativeLow, nativeHigh };
}

/** Whether a record is native to a state (its nativeStates include it). */
export function isNativeTo(facts: SpeciesFacts, state: string): boolean {
  const at = STATE_INDEX.get(state);
  if (at === undefined) return false;
  return at < STATE_BITS ? (facts.nativeLow & (1 << at)) !== 0 : (facts.nativeHigh & (1 << (at - STATE_BITS))) !== 0;
}

/** An ecoregion code's number when it is a whole number below 128, else -1. */
export function ecoregionNumber(code: string): number {
  // Canonical numbers only ("52", not "052"), so the bits agree with the set of strings.
  if (!/^(0|[1-9]\d{0,2})$/.test(code)) return -1;
  const n = Number(code);
  return n < 128 ? n : -1;
}

function codeBits(codes: readonly string[]): [number, number, number, number] | null {
  const bits: [number, number, number, number] = [0, 0, 0, 0];
  for (const c of codes) {
    const n = ecoregionNumber(c);
    if (n < 0) return null;
    bits[n >> 5] |= 1 << (n & 31);
  }
  return bits;
}

const ecoregionNumbers = new Map<string, number>();

/** Whether a record lists an ecoregion; undefined when it lists none (state nativity decides). */
export function listsEcoregion(facts: SpeciesFacts, code: string): boolean | undefined {
  if (facts.ecoregions === undefined) return undefined;
  if (facts.ecoregionBits === null) return facts.ecoregions.has(code);
  let n = ecoregionNumbers.get(code);
  if (n === undefined) {
    n = ecoregionNumber(code);
    if (ecoregionNumbers.size < 1024) ecoregionNumbers.set(code, n);
  }
  if (n < 0) return facts.ecoregions.has(code);
  const word = n >> 5;
  const bits =
    word === 0
      ? facts.ecoregionBits
      : word === 1
        ? facts.ecoregionBits2
        : word === 2
          ? facts.ecoregionBits3
          : facts.ecoregionBits4;
  return (bits & (1 << (n & 31))) !== 0;
}

/** Bits of the levels in a list, by index in `levels`. */
export function levelBits<T extends string>(levels: readonly T[], list: readonly T[]): number {
  let bits = 0;
  for (const l of list) bits |= 1 << levels.indexOf(l);
  return bits;
}

/**
 * stepsAway over three levels, from bits of the levels taken: STEPS[bits * 3 + at] for the site
 * level at index `at`; Infinity when none is taken, as stepsAway gives.
 */
const STEPS: readonly number[] = Array.from({ length: 8 * 3 }, (_, k) => {
  const bits = Math.floor(k / 3);
  let steps = Infinity;
  for (let j = 0; j < 3; j++) if (bits & (1 << j)) steps = Math.min(steps, Math.abs(j - (k % 3)));
  return steps;
});

export function stepsFromBits(bits: number, at: number): number {
  return STEPS[bits * 3 + at];
}

const NO_PERIODS: readonly BloomPeriod[] = Object.freeze([]);
const NO_MONTHS: readonly number[] = Object.freeze([]);
const NO_COLOURS: readonly FlowerColour[] = Object.freeze([]);

function workOut(species: Species): SpeciesFacts {
  const layer = layerOf(species);
  const flowering = isFloweringSpecies(species);
  const shortLived = species.lifespan === 'annual' || species.lifespan === 'biennial';
  const ecoregions = ecoregionsOf(species);
  const native = stateBits(species.nativeStates);
  const eco = ecoregions === undefined ? null : codeBits(ecoregions);
  // A plain literal, no spread: a spread here gave every facts object a slow, dictionary shape.
  return {
    nativeLow: native.nativeLow,
    nativeHigh: native.nativeHigh,
    sunListCode: levelListCode(SUN_LEVELS, species.sun, SUN_LEVELS[0]),
    sunCodeScale: 4 ** species.sun.length,
    moistureListCode: levelListCode(MOISTURE_LEVELS, species.moisture, MOISTURE_LEVELS[0]),
    moistureCodeScale: 4 ** species.moisture.length,
    protected: species.cautions.some((c) => c.kind === 'protected'),
    genus: genusOf(species),
    layer,
    structural: isStructural(species),
    footprintSqFt: matureFootprintSqFt(species),
    shortLived,
    unruly: species.spreadHabit === 'aggressive' || selfSows(species),
    ecoregions: ecoregions && new Set(ecoregions),
    ecoregionBits: eco === null ? null : eco[0],
    ecoregionBits2: eco === null ? 0 : eco[1],
    ecoregionBits3: eco === null ? 0 : eco[2],
    ecoregionBits4: eco === null ? 0 : eco[3],
    sunOptimum: sunOptimumOf(species),
    moistureOptimum: moistureOptimumOf(species),
    sunBits: levelBits(SUN_LEVELS, species.sun),
    moistureBits: levelBits(MOISTURE_LEVELS, species.moisture),
    sunOptimumBits: levelBits(SUN_LEVELS, sunOptimumOf(species)),
    moistureOptimumBits: levelBits(MOISTURE_LEVELS, moistureOptimumOf(species)),
    firstSun: species.sun.length > 0 ? SUN_LEVELS.indexOf(species.sun[0]) : -1,
    hostPart: layeredHostPart(species),
    availabilityPart: availabilityPart(species),
    seedEasePart: seedEasePart(species),
    lawnOrPath: isLawnOrPathPlant(species),
    beePart: beePartOf(species),
    flowersPart: flowersPartOf(species),
    flowering,
    periods: flowering ? Object.freeze(bloomPeriodsOf(species.bloomMonths)) : NO_PERIODS,
    months: flowering ? Object.freeze([...species.bloomMonths]) : NO_MONTHS,
    hostCountOnHerbaceousScale: hostValueOnHerbaceousScale(species),
    milkweed: isNativeMilkweed(species),
    graminoid: species.growthForm === 'graminoid',
    colours: flowering ? Object.freeze([...species.flowerColours]) : NO_COLOURS,
  };
}
