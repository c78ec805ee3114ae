import { seedsToSow } from '../quantities/seed-count.js';
import type { IsoDate } from '../sowing-calendar/calendar-date.js';
import type { GrowerMethod } from '../types/batch.js';
import type { Species } from '../types/species.js';
import { UNIT_WORDS } from '../vocabulary/batch-words.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import { batchSchedule } from './batch-schedule.js';
import { UNIT_OF, unitsFor } from './batch-units.js';

export interface SowMoreInput {
  species: Species;
  /** The method to sow more by (the species' first batch's). */
  method: GrowerMethod;
  /** Plants short of the target at the expected forecast. */
  shortBy: number;
  /** Expected plants ready at the share, for the sentence. */
  expected: number;
  targetPlants: number;
  germinationRatePct: number;
  lossFactor: number;
  lastFrost: IsoDate;
  plantShareDate: IsoDate;
  today: IsoDate;
  /** The sentence's language (English when absent). */
  locale?: WordLocale;
}

/** The values the nudge says, already counted. */
interface NudgeValues {
  expected: number;
  target: number;
  seeds: number;
  units: number;
  unit: keyof typeof UNIT_WORDS;
  start: IsoDate;
}

/** Spanish names of the units a method is counted in, one and many. */
const ES_UNIT_WORDS: Record<keyof typeof UNIT_WORDS, { one: string; many: string }> = {
  pot: { one: 'maceta', many: 'macetas' },
  container: { one: 'recipiente cubierto', many: 'recipientes cubiertos' },
  block: { one: 'bloque de tierra', many: 'bloques de tierra' },
};

/** The whole sentence in each language, values in place (never pieced together from fragments). */
const NUDGE: Record<WordLocale, (v: NudgeValues) => string> = {
  en: (v) => {
    const unit = UNIT_WORDS[v.unit];
    return (
      `At this rate about ${v.expected} of ${v.target} will be ready: sow about ${v.seeds} more seeds ` +
      `(${v.units} more ${v.units === 1 ? unit.one : unit.many}), starting by ${v.start}.`
    );
  },
  es: (v) => {
    const unit = ES_UNIT_WORDS[v.unit];
    return (
      `A este ritmo estarán listas unas ${v.expected} de ${v.target}: siembra unas ${v.seeds} semillas más ` +
      `(${v.units} ${v.units === 1 ? unit.one : unit.many} más) y empieza a más tardar el ${v.start}.`
    );
  },
};

/**
 * A nudge while there is still time: "At this rate about 40 of 120 will be ready: sow about 90 more
 * seeds (9 more covered containers), starting by 2027-03-20." The start date is the sowing calendar's
 * for a batch begun now (its first step: stratifying or sowing); no nudge when such a batch would be
 * ready only after the share, or nothing is short.
 */
export function sowMoreNudge(input: SowMoreInput): string | null {
  if (input.shortBy <= 0) return null;
  const schedule = batchSchedule({
    species: input.species,
    method: input.method,
    lastFrost: input.lastFrost,
    plantShareDate: input.plantShareDate,
    today: input.today,
  });
  if (schedule.readyAfterShare || schedule.readyDate === null) return null;
  const first = schedule.steps.find(
    (s) => s.kind === 'start-warm' || s.kind === 'start-stratifying' || s.kind === 'sow',
  );
  if (!first || first.date < input.today) return null;
  const seeds = seedsToSow(input.shortBy, input.germinationRatePct, input.lossFactor);
  const units = unitsFor(input.method, input.shortBy);
  return NUDGE[input.locale ?? 'en']({
    expected: input.expected,
    target: input.targetPlants,
    seeds,
    units,
    unit: UNIT_OF[input.method],
    start: first.date,
  });
}
