import { BLOOM_PERIODS, type BloomPeriod, type ScorePart } from '../types/recommendation.js';
import type { RegionContext } from '../types/site.js';
import { HABITATS, type Habitat, type Species } from '../types/species.js';
import { cp42PeriodsOf, monthsInPeriod } from './bloom-periods.js';
import { countOf } from './plain-words.js';
import { joinWords } from '../vocabulary/join-words.js';
import { formatMonths } from '../vocabulary/months.js';
import { HABITAT_WORDS } from '../vocabulary/site-words.js';
import { POINTS } from './score-weights.js';
import { PartCache, wordListCode } from './word-cache.js';

/** Keys: the shared habitats' code, or minus the record's habitats' code when none is shared. */
const habitatParts = new PartCache<number>();

/** Parts that depend on where the site is and on the mix so far. */

function habitatWords(h: Habitat): string {
  return HABITAT_WORDS[h];
}

export function habitatPart(species: Species, region: RegionContext): ScorePart | null {
  const communities = region.ecoregionPlantCommunities;
  if (!communities || communities.length === 0) return null;
  // The habitats shared with the region, in the record's order, as a number: no array per species.
  let sharedCode = 0;
  let sharedCount = 0;
  for (const h of species.habitats) {
    if (!communities.includes(h)) continue;
    sharedCode = sharedCode * 32 + HABITATS.indexOf(h) + 1;
    sharedCount++;
  }
  if (sharedCount > 0) {
    const key = sharedCount <= 10 ? sharedCode : null;
    const cached = key === null ? undefined : habitatParts.get(key);
    if (cached !== undefined) return cached;
    const shared = species.habitats.filter((h) => communities.includes(h));
    const reason = `Belongs to the ${joinWords(shared.map(habitatWords))} plant communities of your ecoregion.`;
    const part: ScorePart = { name: 'habitat', points: POINTS.habitatMatch, reason };
    return key === null ? part : habitatParts.keep(key, part);
  }
  const code = wordListCode(HABITATS, species.habitats);
  const cached = code === null ? undefined : habitatParts.get(-code);
  if (cached !== undefined) return cached;
  const reason = `Grows wild in ${joinWords(species.habitats.map(habitatWords), 'or')}, which are not typical of your ecoregion.`;
  const part: ScorePart = { name: 'habitat', points: 0, reason };
  return code === null ? part : habitatParts.keep(-code, part);
}

/** CP42 asks for at least 3 flowering species in each bloom period (CP42-IN, R). */
export const CP42_PER_PERIOD = 3;

/** Flowering species per CP42 period in a mix (a species flowering in two periods counts in both). */
export function countBloomers(mix: readonly Species[]): Record<BloomPeriod, number> {
  const counts: Record<BloomPeriod, number> = { early: 0, mid: 0, late: 0 };
  for (const s of mix) for (const p of cp42PeriodsOf(s)) counts[p]++;
  return counts;
}

const PERIOD_WORDS: Record<BloomPeriod, string> = {
  early: 'spring',
  mid: 'early summer',
  late: 'late summer and fall',
};

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
