import {
  type Habitat,
  MOISTURE_LEVELS,
  type Moisture,
  SOIL_TEXTURES,
  type SoilTexture,
  SUN_LEVELS,
  type Sun,
} from '../types/species.js';
import { capitalise, wordsInOrder } from './join-words.js';

/**
 * Words for where a plant grows. Lower case, as they sit inside a sentence ("dry part shade");
 * `capitalise` them for an option or a heading. One wording per value: a filter, a fact card, a
 * species page and a "why it fits" reason all say "part shade", never "part sun".
 */

export const SUN_WORDS = {
  full: 'full sun',
  part: 'part shade',
  shade: 'shade',
} as const satisfies Record<Sun, string>;

export const MOISTURE_WORDS = {
  dry: 'dry',
  medium: 'medium-moist',
  wet: 'wet',
} as const satisfies Record<Moisture, string>;

/** As a noun after "Soil:" or "Grows in …"; "rocky" alone is an adjective, so it says "rocky soil". */
export const SOIL_TEXTURE_WORDS = {
  sand: 'sand',
  loam: 'loam',
  clay: 'clay',
  rocky: 'rocky soil',
} as const satisfies Record<SoilTexture, string>;

/** Plant communities in everyday words (the trade's names, hyphens dropped). */
export const HABITAT_WORDS = {
  prairie: 'prairie',
  'sand-prairie': 'sand prairie',
  'wet-prairie': 'wet prairie',
  savanna: 'savanna',
  'open-woodland': 'open woodland',
  forest: 'forest',
  'floodplain-forest': 'floodplain forest',
  wetland: 'wetland',
  marsh: 'marsh',
  'fen-bog': 'fen or bog',
  streambank: 'streambank',
  glade: 'glade',
  'rock-outcrop': 'rock outcrop',
  dune: 'dune',
  'coastal-plain': 'coastal plain',
  'pine-barrens': 'pine barrens',
  'old-field': 'old field',
  'shortgrass-prairie': 'shortgrass prairie',
  'mixed-grass-prairie': 'mixed-grass prairie',
} as const satisfies Record<Habitat, string>;

/** ['shade', 'full'] → "Full sun or shade": light in the order a grower reads it, brightest first. */
export function sunPhrase(sun: readonly Sun[]): string {
  return capitalise(wordsInOrder(sun, SUN_LEVELS, SUN_WORDS, 'or'));
}

/** ['wet', 'medium'] → "Medium-moist or wet soil". */
export function moisturePhrase(moisture: readonly Moisture[]): string {
  return capitalise(`${wordsInOrder(moisture, MOISTURE_LEVELS, MOISTURE_WORDS, 'or')} soil`);
}

/** ['clay', 'sand'] → "Sand or clay". */
export function soilPhrase(soils: readonly SoilTexture[]): string {
  return capitalise(wordsInOrder(soils, SOIL_TEXTURES, SOIL_TEXTURE_WORDS, 'or'));
}

/** "dry shade", "wet part shade", "medium-moist full sun": how a grower names a spot. */
export function describeGround(sun: Sun, moisture: Moisture): string {
  return `${MOISTURE_WORDS[moisture]} ${SUN_WORDS[sun]}`;
}

/**
 * Light and soil in the fewest words, for a pot label: ['part', 'full'], ['medium', 'dry'] →
 * "full sun/part shade · dry/medium-moist". Same words as everywhere else, brightest and driest first.
 */
export function siteShortWords(sun: readonly Sun[], moisture: readonly Moisture[]): string {
  const inOrder = <T extends string>(values: readonly T[], order: readonly T[], words: Record<T, string>) =>
    order
      .filter((v) => values.includes(v))
      .map((v) => words[v])
      .join('/');
  return [inOrder(sun, SUN_LEVELS, SUN_WORDS), inOrder(moisture, MOISTURE_LEVELS, MOISTURE_WORDS)]
    .filter((part) => part !== '')
    .join(' · ');
}
