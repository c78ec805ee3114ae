import { stratificationOf } from '../sowing-calendar/treatments.js';
import type { Species, SowingMethod } from '../types/species.js';

/** How hard a species is for volunteers to raise from seed. */
export type EaseLevel = 'easy' | 'moderate' | 'hard';

export interface SeedEase {
  level: EaseLevel;
  /** Cold-moist days the seed needs (0 when none). */
  coldDays: number;
  /** Warm-moist days before the cold (0 when none): seed that needs both often takes two winters. */
  warmDays: number;
  /** Steps before sowing other than stratifying: scarification, hot water. */
  extraSteps: number;
  germinationRatePct: number;
}

/**
 * Homeground's ease rule for a giveaway (common practice among volunteer growers, not a published
 * scale): seed that sprouts untreated or after up to two months of cold is easy; longer cold, or a
 * seed coat to nick, is moderate; a warm-then-cold double dormancy or more than three months of
 * cold is hard. Germination rate is reported beside it, not folded in.
 */
export function seedEaseOf(species: Species): SeedEase {
  const s = stratificationOf(species);
  const extraSteps = s.before.length;
  const level: EaseLevel =
    s.warmDays > 0 || s.coldDays > 90 ? 'hard' : s.coldDays > 60 || extraSteps > 0 ? 'moderate' : 'easy';
  return {
    level,
    coldDays: s.coldDays,
    warmDays: s.warmDays,
    extraSteps,
    germinationRatePct: species.germination.germinationRatePct,
  };
}

/** Methods that chill the seed outdoors over winter, so cold-moist stratification happens by itself. */
export const OUTDOOR_WINTER_METHODS: readonly SowingMethod[] = ['winter-sowing', 'outdoor-pot-winter', 'direct-seed'];

/** The group's methods that suit the species, in the group's order. */
export function methodsThatSuit(species: Species, methods: readonly SowingMethod[]): SowingMethod[] {
  return methods.filter((m) => species.germination.methods.includes(m));
}
