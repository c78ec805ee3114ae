import type { ScorePart } from '../types/recommendation.js';
import type { Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { roundTo } from '../units/conversions.js';
import { isFloweringSpecies } from './bloom-periods.js';
import { countOf } from './plain-words.js';
import { BIRDS_HOST_THRESHOLD, POINTS } from './score-weights.js';
import { PartCache, sharedPart } from './word-cache.js';

const hostParts = new PartCache<number>();

/**
 * Wildlife parts of "why it fits". Host counts are Lepidoptera species per native genus
 * (tallamy-shropshire-2009, as stored in the record): every species of a genus shares its count.
 */
export function hostPlantPart(species: Species): ScorePart | null {
  const count = species.wildlife.lepidopteraGenusCount;
  if (count === null || count === 0) return null;
  const cached = hostParts.get(count);
  if (cached !== undefined) return cached;
  // log10: the first few dozen caterpillar species matter most; 534 (oaks) is not 5× 115.
  const points = roundTo(Math.min(POINTS.hostCap, POINTS.hostPerLog10 * Math.log10(1 + count)), 1);
  const kinds = countOf(count, 'moth or butterfly species', 'moth and butterfly species');
  return hostParts.keep(count, {
    name: 'host-plant',
    points,
    reason: `Hosts the caterpillars of ${kinds} in its genus.`,
  });
}

const MONARCH_PART = sharedPart({
  name: 'monarch-host',
  points: POINTS.monarchHost,
  reason: 'Feeds monarch caterpillars, which eat only milkweeds and a few close relatives.',
});

export function monarchPart(species: Species, site: Site): ScorePart | null {
  if (!site.goals.includes('monarchs') || !species.wildlife.monarchHost) return null;
  return MONARCH_PART;
}

/** Keyed by the record's own words: records of one genus often share them. */
const pollinatorParts = new PartCache<string>();

export function pollinatorPart(species: Species, site: Site): ScorePart | null {
  if (!site.goals.includes('pollinators')) return null;
  return flowersPartOf(species);
}

/** pollinatorPart when pollinators are a goal: it depends on the species alone, so species-facts keeps it. */
export function flowersPartOf(species: Species): ScorePart | null {
  if (!isFloweringSpecies(species)) return null;
  const words = species.wildlife.pollinators;
  return (
    pollinatorParts.get(words) ??
    pollinatorParts.keep(words, { name: 'pollinators', points: POINTS.pollinatorFlowers, reason: words })
  );
}

export function birdsPart(species: Species, site: Site): ScorePart | null {
  if (!site.goals.includes('birds')) return null;
  const reasons: string[] = [];
  let points = 0;
  if (species.wildlife.birds) {
    points += POINTS.birdsFoodOrShelter;
    reasons.push(species.wildlife.birds);
  }
  if ((species.wildlife.lepidopteraGenusCount ?? 0) >= BIRDS_HOST_THRESHOLD) {
    points += POINTS.birdsHostBonus;
    reasons.push('Its many caterpillars are food for nesting birds, which raise their young on them.');
  }
  return points === 0 ? null : { name: 'birds', points, reason: reasons.join(' ') };
}
