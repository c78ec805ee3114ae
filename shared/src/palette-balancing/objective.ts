import { BLOOM_PERIODS, type ObjectiveTerm } from '../types/recommendation.js';
import type { PaletteItem } from './palette-item.js';

/**
 * The mix objective: what "balanced" means, as one number to maximise: the species' own fit plus
 * concave (diminishing-returns) terms of the mix's counts, so adding a species never helps a term
 * more than it would have helped a smaller mix. That makes it submodular, and monotone apart from
 * two small penalties (too many grasses, repeated genera): the case where greedy selection plus
 * swaps comes close to the optimum (see optimiser.test.ts). Weights are Homeground's own.
 */
export const OBJECTIVE_WEIGHTS = {
  /** host = hostWeight × ln(1 + Σ over distinct genera of caterpillar species ÷ hostScale). */
  hostWeight: 3,
  hostScale: 50,
  /** Per species in flower in a CP42 period, up to CP42's 3 per period (CP42-IN, R). */
  perPeriodSpecies: 2,
  periodTarget: 3,
  /** Per flowering species up to CP42's 9 in a full mix (CP42-IN, R). */
  perFloweringSpecies: 1,
  floweringTarget: 9,
  /** A native milkweed when monarchs are a goal (E327136Z2: ≥ 1 native Asclepias, R); a second adds a little. */
  milkweed: 8,
  secondMilkweed: 2,
  /** Per grass or sedge up to the share's minimum; a penalty per species over its maximum. */
  perGrass: 4,
  perGrassOver: 2,
  perHeightTier: 1.5,
  /** Per distinct flower colour, up to colourTarget colours. */
  perColour: 0.5,
  colourTarget: 6,
  /** Penalty per extra species of a genus already in the mix: variety of plants, not eight milkweeds. */
  perRepeatedGenus: 1,
} as const;

export interface ObjectiveSettings {
  size: number;
  monarchsGoal: boolean;
}

/**
 * Grasses and sedges: about a fifth to two fifths of the species (Homeground's rule, common
 * practice in prairie-style plantings: enough to knit the soil between forbs, not so many that they
 * crowd out flowers). Mixes under 4 species do not need one.
 */
export function grassTargets(size: number): { min: number; max: number } {
  if (size < 4) return { min: 0, max: 1 };
  const min = Math.max(1, Math.round(size * 0.2));
  return { min, max: Math.max(min, Math.floor(size * 0.4)) };
}

export function objectiveTerms(items: readonly PaletteItem[], settings: ObjectiveSettings): ObjectiveTerm[] {
  const w = OBJECTIVE_WEIGHTS;
  let fit = 0;
  let flowering = 0;
  let grasses = 0;
  let milkweeds = 0;
  const perPeriod = { early: 0, mid: 0, late: 0 };
  const genera = new Map<string, number>();
  let repeats = 0;
  const tiers = new Set<string>();
  const colours = new Set<string>();
  for (const it of items) {
    fit += it.fit;
    if (it.flowering) flowering++;
    if (it.graminoid) grasses++;
    if (it.milkweed) milkweeds++;
    for (const p of it.periods) perPeriod[p]++;
    if (genera.has(it.genus)) repeats++;
    genera.set(it.genus, it.hostCount);
    tiers.add(it.tier);
    for (const c of it.colours) colours.add(c);
  }
  let hostSum = 0;
  for (const count of genera.values()) hostSum += count;
  const grass = grassTargets(settings.size);
  const milkweedValue = w.milkweed * Math.min(milkweeds, 1) + w.secondMilkweed * Math.min(Math.max(milkweeds - 1, 0), 1);
  const periodValue = BLOOM_PERIODS.reduce((s, p) => s + w.perPeriodSpecies * Math.min(perPeriod[p], w.periodTarget), 0);
  return [
    { name: 'fit', value: fit },
    { name: 'host-plants', value: w.hostWeight * Math.log(1 + hostSum / w.hostScale) },
    { name: 'bloom-periods', value: periodValue },
    { name: 'flowering-count', value: w.perFloweringSpecies * Math.min(flowering, w.floweringTarget) },
    { name: 'milkweed', value: settings.monarchsGoal ? milkweedValue : 0 },
    { name: 'grasses', value: w.perGrass * Math.min(grasses, grass.min) - w.perGrassOver * Math.max(0, grasses - grass.max) },
    { name: 'height-tiers', value: w.perHeightTier * tiers.size },
    { name: 'colours', value: w.perColour * Math.min(colours.size, w.colourTarget) },
    { name: 'genus-variety', value: -w.perRepeatedGenus * repeats },
  ];
}

export type Objective<T> = (items: readonly T[]) => number;

export function makeObjective(settings: ObjectiveSettings): Objective<PaletteItem> {
  return (items) => objectiveTerms(items, settings).reduce((s, t) => s + t.value, 0);
}
