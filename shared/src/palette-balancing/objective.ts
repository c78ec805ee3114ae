import { BLOOM_PERIODS, type ObjectiveTerm } from '../types/recommendation.js';
import type { Objective } from './mix-evaluator.js';
import {
  OBJECTIVE_WEIGHTS,
  SEASON_MONTHS,
  grassTargets,
  seasonMonthMask,
  type ObjectiveSettings,
} from './objective-weights.js';
import { paletteEvaluator } from './palette-evaluator.js';
import type { PaletteItem } from './palette-item.js';

export { OBJECTIVE_WEIGHTS, grassTargets, type ObjectiveSettings } from './objective-weights.js';

/**
 * The mix objective: what "balanced" means, as one number to maximise: the species' own fit plus
 * concave (diminishing-returns) terms of the mix's counts, so adding a species never helps a term
 * more than it would have helped a smaller mix. That makes it submodular, and monotone apart from
 * two small penalties (too many grasses, repeated genera): the case where greedy selection plus
 * swaps comes close to the optimum (see optimiser.test.ts). Weights are Homeground's own
 * (objective-weights.ts). palette-evaluator.ts computes the same number incrementally.
 */
export function objectiveTerms(items: readonly PaletteItem[], settings: ObjectiveSettings): ObjectiveTerm[] {
  const w = OBJECTIVE_WEIGHTS;
  let fit = 0;
  let flowering = 0;
  let grasses = 0;
  let milkweeds = 0;
  const perPeriod = { early: 0, mid: 0, late: 0 };
  const genera = new Map<string, number>();
  let repeats = 0;
  const perMonth = new Array<number>(SEASON_MONTHS).fill(0);
  const tiers = new Set<string>();
  const colours = new Set<string>();
  for (const it of items) {
    fit += it.fit;
    if (it.flowering) flowering++;
    if (it.graminoid) grasses++;
    if (it.milkweed) milkweeds++;
    for (const p of it.periods) perPeriod[p]++;
    if (it.flowering) {
      const mask = seasonMonthMask(it.months);
      for (let k = 0; k < SEASON_MONTHS; k++) if (mask & (1 << k)) perMonth[k]++;
    }
    if (genera.has(it.genus)) repeats++;
    genera.set(it.genus, it.hostCount);
    tiers.add(it.tier);
    for (const c of it.colours) colours.add(c);
  }
  let hostSum = 0;
  for (const count of genera.values()) hostSum += count;
  const grass = grassTargets(settings.size);
  const milkweedValue =
    w.milkweed * Math.min(milkweeds, 1) + w.secondMilkweed * Math.min(Math.max(milkweeds - 1, 0), 1);
  const periodValue = BLOOM_PERIODS.reduce(
    (s, p) => s + w.perPeriodSpecies * Math.min(perPeriod[p], w.periodTarget),
    0,
  );
  return [
    { name: 'fit', value: fit },
    { name: 'host-plants', value: w.hostWeight * Math.log(1 + hostSum / w.hostScale) },
    { name: 'bloom-periods', value: periodValue },
    {
      name: 'bloom-months',
      value: perMonth.reduce((sum, n) => sum + w.perMonthSpecies * Math.min(n, w.monthTarget), 0),
    },
    { name: 'flowering-count', value: w.perFloweringSpecies * Math.min(flowering, w.floweringTarget) },
    { name: 'milkweed', value: settings.monarchsGoal ? milkweedValue : 0 },
    {
      name: 'grasses',
      value: w.perGrass * Math.min(grasses, grass.min) - w.perGrassOver * Math.max(0, grasses - grass.max),
    },
    { name: 'height-tiers', value: w.perHeightTier * tiers.size },
    { name: 'colours', value: w.perColour * Math.min(colours.size, w.colourTarget) },
    { name: 'genus-variety', value: -w.perRepeatedGenus * repeats },
  ];
}

// The Objective type lives beside the evaluator it names, so the evaluators need not import this file (no cycle).
export type { Objective } from './mix-evaluator.js';

export function makeObjective(settings: ObjectiveSettings): Objective<PaletteItem> {
  const objective: Objective<PaletteItem> = (items) => objectiveTerms(items, settings).reduce((s, t) => s + t.value, 0);
  objective.evaluator = (pool) => paletteEvaluator(pool, settings, objective);
  return objective;
}
