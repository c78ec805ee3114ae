import type { Species, TreatmentStep } from '../types/species.js';
import { DURATIONS } from './durations.js';

export interface Stratification {
  /** Cold-moist days the seed needs (0 when none). */
  coldDays: number;
  /** True when the record gives a cold-moist step without a length, so the default was used. */
  coldDaysAssumed: boolean;
  /** The record's own words on the cold step, if any. */
  coldNote?: string;
  /** Warm-moist days before the cold (0 when none). */
  warmDays: number;
  /** Plain-words steps to do before stratifying or sowing (scarification, hot water). */
  before: string[];
  /** Plain-words steps at sowing (inoculant). */
  atSowing: string[];
}

const DEFAULT_NOTES: Partial<Record<TreatmentStep['kind'], string>> = {
  scarification: 'Nick or sand the seed coat (scarification) so water can get in.',
  // BH05 (R): 85 °C water, gains level off beyond 2 minutes (Baptisia australis).
  'hot-water': 'Dip the seed in hot water, about 85 °C (185 °F), for 2 minutes, then drain.',
  inoculant: 'Coat the seed with the matching rhizobial inoculant just before sowing.',
};

/** The species' own pre-sowing treatments, as the calendar needs them. */
export function stratificationOf(species: Species): Stratification {
  const s: Stratification = { coldDays: 0, coldDaysAssumed: false, warmDays: 0, before: [], atSowing: [] };
  for (const step of species.germination.treatments) {
    const note = step.note ?? DEFAULT_NOTES[step.kind];
    if (step.kind === 'cold-moist') {
      s.coldDays += step.days ?? DURATIONS.defaultColdMoistDays;
      s.coldDaysAssumed ||= step.days === undefined;
      s.coldNote ??= step.note;
    } else if (step.kind === 'warm-moist') {
      // No record gives a warm step without its length yet; 30 d is a placeholder (from-memory).
      s.warmDays += step.days ?? 30;
    } else if (step.kind === 'inoculant') {
      if (note) s.atSowing.push(note);
    } else if (step.kind !== 'none' && note) {
      s.before.push(note);
    }
  }
  return s;
}
