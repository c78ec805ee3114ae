/**
 * Weights and targets of the mix objective (objective.ts), on their own so the constraint report
 * and the incremental evaluator can read them without importing the objective itself.
 * Weights are Homeground's own.
 */
export const OBJECTIVE_WEIGHTS = {
  /** host = hostWeight × ln(1 + Σ over distinct genera of caterpillar species ÷ hostScale). */
  hostWeight: 3,
  hostScale: 50,
  /** Per species in flower in a CP42 period, up to CP42's 3 per period (CP42-IN, R). */
  perPeriodSpecies: 2,
  periodTarget: 3,
  /**
   * Per species in flower in each month from April to October, up to 3 a month: the bloom chart
   * and the design rules judge months, so the mix is balanced on them too (Homeground's weight).
   * At 0.5 more small mixes meet "3 in flower every month" of a part of the season (9 of the 30
   * parts of the published-list sites, from 8 at 0.25); above about 0.75 flowers crowd the ferns
   * out of shade mixes, where garden practice keeps them.
   */
  perMonthSpecies: 0.5,
  monthTarget: 3,
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

/** The months the bloom chart and the design rules judge: April (4) to October (10). */
export const SEASON_FIRST_MONTH = 4;
export const SEASON_MONTHS = 7;

/** A species' months in flower within the season as bits (bit 0 = April … bit 6 = October). */
export function seasonMonthMask(months: readonly number[] | undefined): number {
  let mask = 0;
  for (const m of months ?? [])
    if (m >= SEASON_FIRST_MONTH && m < SEASON_FIRST_MONTH + SEASON_MONTHS) mask |= 1 << (m - SEASON_FIRST_MONTH);
  return mask;
}
