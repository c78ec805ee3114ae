import { buildSowingCalendar } from '../sowing-calendar/sowing-calendar.js';
import type { CalendarEvent } from '../sowing-calendar/calendar-types.js';
import type { IsoDate } from '../sowing-calendar/calendar-date.js';
import type { GrowerMethod } from '../types/batch.js';
import type { Species, TreatmentStep } from '../types/species.js';
import type { BatchStepKind } from '../vocabulary/batch-words.js';
import type { TreatmentKind } from '../vocabulary/seed-words.js';
import { stepDetailIn, warningIn } from './step-details-in.js';
import { batchWordsFor } from '../vocabulary/locale/batch-words-in.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import { wordsFor } from '../vocabulary/locale/words-for.js';

/** One dated step of a batch. */
export interface BatchStep {
  kind: BatchStepKind;
  date: IsoDate;
  title: string;
  /** What to do, from the sowing calendar's wording. */
  detail: string;
}

/** A seed treatment of a batch, with where it happens. */
export interface BatchTreatment {
  kind: TreatmentKind;
  /** Days of a moist step; null for the others. */
  days: number | null;
  /** Moist steps: in the refrigerator (indoor methods, or a top-up before sowing out) or outdoors by winter. */
  where: 'refrigerator' | 'outdoors' | null;
  title: string;
  how: string;
}

export interface BatchSchedule {
  sowDate: IsoDate;
  /** When plants are fit to give; after the share date when the species is slow. */
  readyDate: IsoDate | null;
  readyAfterShare: boolean;
  steps: BatchStep[];
  treatments: BatchTreatment[];
  warnings: string[];
}

export interface BatchScheduleInput {
  species: Species;
  method: GrowerMethod;
  /** The batch's own sowing date; otherwise the calendar's. */
  sowDate?: IsoDate;
  lastFrost: IsoDate;
  plantShareDate: IsoDate;
  today: IsoDate;
  /**
   * The language of step titles, details, treatments and warnings (English when absent).
   */
  locale?: WordLocale;
}

/** The batch step a sowing-calendar event is (events without one are not a batch's step). */
export const STEP_OF: Partial<Record<CalendarEvent['kind'], BatchStepKind>> = {
  'warm-moist-start': 'start-warm',
  'cms-start': 'start-stratifying',
  'check-sprouts': 'check-sprouts',
  sow: 'sow',
  'vent-containers': 'vent-containers',
  'sprouts-expected': 'sprouts-expected',
  'pot-up': 'pot-up',
  'harden-off': 'harden-off',
  'frost-watch': 'frost-watch',
  'plant-out': 'ready',
};

const OUTDOOR: readonly GrowerMethod[] = ['outdoor-pot-winter', 'winter-sowing'];

/**
 * A batch's dated steps and treatments, from the sowing calendar for its one species and method
 * (dates back-scheduled from the last frost and checked against the plant share; see
 * sowing-calendar.ts). Outdoor stratifying is done by winter unless the calendar adds days in the
 * refrigerator first.
 */
export function batchSchedule(input: BatchScheduleInput): BatchSchedule {
  const calendar = buildSowingCalendar({
    lastFrost: input.lastFrost,
    targetDate: input.plantShareDate,
    today: input.today,
    plans: [{ species: input.species, method: input.method, ...(input.sowDate && { sowDate: input.sowDate }) }],
  });
  const schedule = calendar.schedules[0];
  const outdoor = OUTDOOR.includes(input.method);
  const steps: BatchStep[] = [];
  for (const e of calendar.events) {
    const kind = STEP_OF[e.kind];
    if (!kind) continue;
    // Venting is for covered containers only; the frost watch concerns every batch with plants outdoors.
    if (kind === 'vent-containers' && input.method !== 'winter-sowing') continue;
    steps.push({
      kind,
      date: e.date,
      title: batchWordsFor(input.locale).step[kind],
      detail: stepDetailIn(e.detail, input.species, input.locale ?? 'en'),
    });
  }
  const fridgeTopUp = schedule.events.some((e) => e.kind === 'cms-start') && outdoor;
  const treatments = input.species.germination.treatments.map((t) =>
    treatmentOf(t, outdoor, fridgeTopUp, input.locale ?? 'en'),
  );
  return {
    sowDate: schedule.sowDate,
    readyDate: schedule.readyDate,
    readyAfterShare: schedule.readyDate !== null && schedule.readyDate > input.plantShareDate,
    steps,
    treatments,
    warnings: schedule.warnings.map((w) => warningIn(w.message, input.locale ?? 'en')),
  };
}

function treatmentOf(t: TreatmentStep, outdoor: boolean, fridgeTopUp: boolean, locale: WordLocale): BatchTreatment {
  const w = wordsFor(locale);
  const title = w.treatmentTitle(t);
  const moist = t.kind === 'cold-moist' || t.kind === 'warm-moist';
  if (!moist) return { kind: t.kind, days: null, where: null, title, how: w.treatmentHow(t) };
  const days = t.days ?? null;
  if (t.kind === 'cold-moist' && outdoor && !fridgeTopUp)
    return { kind: t.kind, days, where: 'outdoors', title, how: batchWordsFor(locale).winterStratifies };
  return { kind: t.kind, days, where: t.kind === 'cold-moist' ? 'refrigerator' : null, title, how: w.treatmentHow(t) };
}
