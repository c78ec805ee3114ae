import { BLOOM_PERIODS, type BloomPeriod } from '../types/recommendation.js';
import type { FlowerColour, GrowthForm, Species } from '../types/species.js';

/**
 * CP42 bloom periods (CP42-IN, CHECK-VALUES §3, R): early = April to 15 June, mid = 15 June to July,
 * late = August to October. Records hold whole months, and the early/mid split falls mid-June, so a
 * species flowering in June counts for both early and mid: we cannot tell which half of June it
 * flowers in, and the rule's own boundary date belongs to both periods. Months outside April–October
 * (e.g. a March ephemeral, a November witch-hazel) count for no CP42 period.
 */
const PERIOD_MONTHS: Record<BloomPeriod, readonly number[]> = {
  early: [4, 5, 6],
  mid: [6, 7],
  late: [8, 9, 10],
};

/** The periods a list of bloom months (1–12) touches, in early → late order. */
export function bloomPeriodsOf(bloomMonths: readonly number[]): BloomPeriod[] {
  // Plain loops: this runs for every candidate of every mix.
  const periods: BloomPeriod[] = [];
  for (const p of BLOOM_PERIODS) {
    for (const m of PERIOD_MONTHS[p]) {
      if (!bloomMonths.includes(m)) continue;
      periods.push(p);
      break;
    }
  }
  return periods;
}

/** The months of one period that a species flowers in (e.g. late for [7, 8, 9] → [8, 9]). */
export function monthsInPeriod(bloomMonths: readonly number[], period: BloomPeriod): number[] {
  return PERIOD_MONTHS[period].filter((m) => bloomMonths.includes(m));
}

export function periodMonths(period: BloomPeriod): readonly number[] {
  return PERIOD_MONTHS[period];
}

/**
 * Growth forms whose flowers count as CP42 "pollinator-friendly flowering species" (wildflowers,
 * legumes, shrubs; CP42-IN). Grasses, sedges (graminoids) and ferns never do, even when a record
 * gives grass flowering months.
 */
const FLOWERING_FORMS: ReadonlySet<GrowthForm> = new Set(['forb', 'shrub', 'vine', 'tree']);

/**
 * Flower colours of wind-pollinated trees (birches, hickories, walnuts: catkins and small
 * petal-less flowers that bees barely visit). Homeground's rule: a tree counts as a flowering
 * species only when its record names some other colour, i.e. it has flowers pollinators can find
 * (a serviceberry's white, a redbud's pink). The record's colours are the only evidence we have, so
 * a wind-pollinated tree recorded with, say, yellow catkins still counts; and a tree with no
 * colours recorded does not. Forbs, shrubs and vines are not judged by colour: many bee flowers
 * are green (e.g. some milkweeds).
 */
const WIND_POLLINATED_COLOURS: ReadonlySet<FlowerColour> = new Set(['green', 'brown']);

type FloweringFacts = Pick<Species, 'growthForm' | 'bloomMonths'> & { flowerColours?: readonly FlowerColour[] };

export function isFloweringSpecies(species: FloweringFacts): boolean {
  if (!FLOWERING_FORMS.has(species.growthForm) || species.bloomMonths.length === 0) return false;
  if (species.growthForm !== 'tree') return true;
  return (species.flowerColours ?? []).some((c) => !WIND_POLLINATED_COLOURS.has(c));
}

/** CP42 periods a species counts for: none unless it is a flowering species. */
export function cp42PeriodsOf(species: FloweringFacts): BloomPeriod[] {
  return isFloweringSpecies(species) ? bloomPeriodsOf(species.bloomMonths) : [];
}
