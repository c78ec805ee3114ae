import type { CalendarEvent, SowingCalendar } from '../sowing-calendar/calendar-types.js';
import { calendarToIcs } from '../sowing-calendar/calendar-ics.js';
import type { GrowerMethod } from '../types/batch.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import type { BatchStepKind } from '../vocabulary/batch-words.js';
import type { BatchStep } from './batch-schedule.js';

/** The sowing-calendar kind each batch step came from, so UIDs match the calendar's own. */
const CALENDAR_KIND: Record<BatchStepKind, CalendarEvent['kind']> = {
  'start-warm': 'warm-moist-start',
  'start-stratifying': 'cms-start',
  'check-sprouts': 'check-sprouts',
  sow: 'sow',
  'vent-containers': 'vent-containers',
  'sprouts-expected': 'sprouts-expected',
  'pot-up': 'pot-up',
  'harden-off': 'harden-off',
  'frost-watch': 'frost-watch',
  ready: 'plant-out',
};

/** What the iCalendar file needs of a batch. */
export interface IcsBatch {
  slug: string;
  commonName: string;
  method: GrowerMethod;
  steps: readonly BatchStep[];
  warnings: readonly string[];
}

/**
 * A grower's batches as one iCalendar file (RFC 5545, through the sowing calendar's writer): each
 * step an all-day event titled with the species, UIDs stable per species, method and step, so an
 * updated file replaces its events instead of duplicating them.
 */
export function batchesToIcs(
  batches: readonly IcsBatch[],
  options: { today: string; planId: string; locale?: WordLocale },
): string {
  const events: CalendarEvent[] = batches
    .flatMap((b) =>
      b.steps.map((s) => ({
        date: s.date,
        kind: CALENDAR_KIND[s.kind],
        title: `${b.commonName}: ${s.title}`,
        detail: s.detail,
        speciesSlug: b.slug,
        method: b.method,
      })),
    )
    .sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  const calendar: SowingCalendar = {
    events,
    warnings: batches.flatMap((b) =>
      b.warnings.map((message) => ({ kind: 'late-start' as const, speciesSlug: b.slug, method: b.method, message })),
    ),
    schedules: [],
  };
  return calendarToIcs(calendar, options);
}
