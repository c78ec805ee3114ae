import type { ScorePart } from '../types/recommendation.js';
import type { Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { joinWords } from './plain-words.js';
import { POINTS } from './score-weights.js';

/** Garden-manner parts of "why it fits": soil, deer, spreading, and the garden-type goals. */

export function soilPart(species: Species, site: Site): ScorePart | null {
  if (!site.soilTexture) return null;
  if (species.soilTextures.includes(site.soilTexture)) {
    return { name: 'soil', points: POINTS.soilMatch, reason: `Grows in ${site.soilTexture} soil like yours.` };
  }
  const prefers = joinWords(species.soilTextures, 'or');
  return { name: 'soil', points: POINTS.soilMismatch, reason: `Prefers ${prefers} soil; yours is ${site.soilTexture}.` };
}

const DEER_WORDS = {
  high: 'Deer usually leave it alone.',
  medium: 'Deer browse it now and then.',
  low: 'Deer browse it readily; with many deer around, expect damage unless you fence it.',
} as const;

export function deerPart(species: Species, site: Site): ScorePart | null {
  if (site.deerPressure === 'low') return null;
  const table = site.deerPressure === 'high' ? POINTS.deerHighPressure : POINTS.deerMediumPressure;
  return { name: 'deer', points: table[species.deerResistance], reason: DEER_WORDS[species.deerResistance] };
}

const SPREAD_WORDS = {
  clumping: 'Stays in a clump where you plant it.',
  spreading: 'Spreads by roots or seed; give it room.',
  aggressive: 'Spreads hard by roots or seed and can take over a small bed.',
} as const;

export function spreadPart(species: Species, site: Site): ScorePart | null {
  const habit = species.spreadHabit;
  if (site.goals.includes('low-spreaders')) {
    return { name: 'spread', points: POINTS.lowSpreaders[habit], reason: SPREAD_WORDS[habit] };
  }
  if (habit === 'aggressive') return { name: 'spread', points: POINTS.aggressiveAnyway, reason: SPREAD_WORDS[habit] };
  return null;
}

export function rainGardenPart(species: Species, site: Site): ScorePart | null {
  if (!site.goals.includes('rain-garden')) return null;
  if (species.tags.includes('rain-garden')) {
    return {
      name: 'rain-garden',
      points: POINTS.rainGardenTagged,
      reason: 'A rain-garden plant: takes standing water after storms and dry spells between them.',
    };
  }
  const m = species.moisture;
  if (m.includes('wet') && (m.includes('medium') || m.includes('dry'))) {
    return {
      name: 'rain-garden',
      points: POINTS.rainGardenWetAndDry,
      reason: 'Takes both wet and drier soil, so it suits the sides of a rain garden.',
    };
  }
  return null;
}

export function shadeGardenPart(species: Species, site: Site): ScorePart | null {
  if (!site.goals.includes('shade-garden') || !species.sun.includes('shade')) return null;
  return { name: 'shade-garden', points: POINTS.shadeGarden, reason: 'Grows in full shade, for your shade garden.' };
}
