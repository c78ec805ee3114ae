import { BLOOM_PERIODS, type BloomPeriod, type ScorePart } from '../types/recommendation.js';
import type { RegionContext } from '../types/site.js';
import type { Habitat, Species } from '../types/species.js';
import { cp42PeriodsOf, monthsInPeriod } from './bloom-periods.js';
import { countOf, formatMonths, joinWords } from './plain-words.js';
import { POINTS } from './score-weights.js';

/** Parts that depend on where the site is and on the mix so far. */

function habitatWords(h: Habitat): string {
  return h === 'fen-bog' ? 'fen and bog' : h.replace(/-/g, ' ');
}

export function habitatPart(species: Species, region: RegionContext): ScorePart | null {
  const communities = region.ecoregionPlantCommunities;
  if (!communities || communities.length === 0) return null;
  const shared = species.habitats.filter((h) => communities.includes(h));
  if (shared.length > 0) {
    return {
      name: 'habitat',
      points: POINTS.habitatMatch,
      reason: `Belongs to the ${joinWords(shared.map(habitatWords))} plant communities of your ecoregion.`,
    };
  }
  return {
    name: 'habitat',
    points: 0,
    reason: `Grows wild in ${joinWords(species.habitats.map(habitatWords), 'or')}, which are not typical of your ecoregion.`,
  };
}

/** CP42 asks for at least 3 flowering species in each bloom period (CP42-IN, R). */
export const CP42_PER_PERIOD = 3;

/** Flowering species per CP42 period in a mix (a species flowering in two periods counts in both). */
export function countBloomers(mix: readonly Species[]): Record<BloomPeriod, number> {
  const counts: Record<BloomPeriod, number> = { early: 0, mid: 0, late: 0 };
  for (const s of mix) for (const p of cp42PeriodsOf(s)) counts[p]++;
  return counts;
}

const PERIOD_WORDS: Record<BloomPeriod, string> = { early: 'spring', mid: 'early summer', late: 'late summer and fall' };

/**
 * Points for flowering when the current mix is thin: most for the period the mix has least of,
 * some for any other period still short of CP42's 3 species.
 */
export function bloomGapPart(species: Species, currentMix: readonly Species[] | undefined): ScorePart | null {
  if (!currentMix) return null;
  const counts = countBloomers(currentMix.filter((s) => s.slug !== species.slug));
  const periods = cp42PeriodsOf(species).filter((p) => counts[p] < CP42_PER_PERIOD);
  if (periods.length === 0) return null;
  const least = Math.min(...BLOOM_PERIODS.map((p) => counts[p]));
  const thinnest = periods.filter((p) => counts[p] === least);
  if (thinnest.length > 0) {
    const months = formatMonths(thinnest.flatMap((p) => monthsInPeriod(species.bloomMonths, p)));
    return { name: 'bloom-gap', points: POINTS.bloomGapMost, reason: `Blooms ${months}, when your mix has least.` };
  }
  const p = periods[0];
  const months = formatMonths(monthsInPeriod(species.bloomMonths, p));
  return {
    name: 'bloom-gap',
    points: POINTS.bloomGapSome,
    reason: `Blooms ${months}, adding to the ${countOf(counts[p], 'species')} your mix has in flower in ${PERIOD_WORDS[p]}.`,
  };
}
