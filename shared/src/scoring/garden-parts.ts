import type { ScorePart } from '../types/recommendation.js';
import type { Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { joinWords } from '../vocabulary/join-words.js';
import { POINTS } from './score-weights.js';
import { sharedPart } from './word-cache.js';

/** Garden-manner parts of "why it fits": soil, deer, spreading, and the garden-type goals. */

export function soilPart(species: Species, site: Site): ScorePart | null {
  if (!site.soilTexture) return null;
  if (species.soilTextures.includes(site.soilTexture)) {
    return { name: 'soil', points: POINTS.soilMatch, reason: `Grows in ${site.soilTexture} soil like yours.` };
  }
  const prefers = joinWords(species.soilTextures, 'or');
  return {
    name: 'soil',
    points: POINTS.soilMismatch,
    reason: `Prefers ${prefers} soil; yours is ${site.soilTexture}.`,
  };
}

const DEER_WORDS = {
  high: 'Deer usually leave it alone.',
  medium: 'Deer browse it now and then.',
  low: 'Deer browse it readily; with many deer around, expect damage unless you fence it.',
} as const;

type Resistance = keyof typeof DEER_WORDS;
const deerParts = (table: Record<Resistance, number>) => ({
  high: sharedPart({ name: 'deer', points: table.high, reason: DEER_WORDS.high }),
  medium: sharedPart({ name: 'deer', points: table.medium, reason: DEER_WORDS.medium }),
  low: sharedPart({ name: 'deer', points: table.low, reason: DEER_WORDS.low }),
});
/** Every part below depends on the site and a trait or two only, so each is made once and shared. */
const DEER_PARTS = { high: deerParts(POINTS.deerHighPressure), medium: deerParts(POINTS.deerMediumPressure) };

export function deerPart(species: Species, site: Site): ScorePart | null {
  if (site.deerPressure === 'low') return null;
  return DEER_PARTS[site.deerPressure][species.deerResistance];
}

const SPREAD_WORDS = {
  clumping: 'Stays in a clump where you plant it.',
  spreading: 'Spreads by roots or seed; give it room.',
  aggressive: 'Spreads hard by roots or seed and can take over a small bed.',
} as const;

const LOW_SPREADER_PARTS = {
  clumping: sharedPart({ name: 'spread', points: POINTS.lowSpreaders.clumping, reason: SPREAD_WORDS.clumping }),
  spreading: sharedPart({ name: 'spread', points: POINTS.lowSpreaders.spreading, reason: SPREAD_WORDS.spreading }),
  aggressive: sharedPart({ name: 'spread', points: POINTS.lowSpreaders.aggressive, reason: SPREAD_WORDS.aggressive }),
};
const AGGRESSIVE_ANYWAY_PART = sharedPart({
  name: 'spread',
  points: POINTS.aggressiveAnyway,
  reason: SPREAD_WORDS.aggressive,
});

export function spreadPart(species: Species, site: Site): ScorePart | null {
  const habit = species.spreadHabit;
  if (site.goals.includes('low-spreaders')) return LOW_SPREADER_PARTS[habit];
  if (habit === 'aggressive') return AGGRESSIVE_ANYWAY_PART;
  return null;
}

const RAIN_GARDEN_TAGGED_PART = sharedPart({
  name: 'rain-garden',
  points: POINTS.rainGardenTagged,
  reason: 'A rain-garden plant: takes standing water after storms and dry spells between them.',
});
const RAIN_GARDEN_SIDES_PART = sharedPart({
  name: 'rain-garden',
  points: POINTS.rainGardenWetAndDry,
  reason: 'Takes both wet and drier soil, so it suits the sides of a rain garden.',
});

export function rainGardenPart(species: Species, site: Site): ScorePart | null {
  if (!site.goals.includes('rain-garden')) return null;
  if (species.tags.includes('rain-garden')) return RAIN_GARDEN_TAGGED_PART;
  const m = species.moisture;
  if (m.includes('wet') && (m.includes('medium') || m.includes('dry'))) return RAIN_GARDEN_SIDES_PART;
  return null;
}

const SHADE_GARDEN_PART = sharedPart({
  name: 'shade-garden',
  points: POINTS.shadeGarden,
  reason: 'Grows in full shade, for your shade garden.',
});

export function shadeGardenPart(species: Species, site: Site): ScorePart | null {
  if (!site.goals.includes('shade-garden') || !species.sun.includes('shade')) return null;
  return SHADE_GARDEN_PART;
}
