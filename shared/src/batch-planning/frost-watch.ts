import { addDays, type IsoDate } from '../sowing-calendar/calendar-date.js';
import { DURATIONS } from '../sowing-calendar/durations.js';
import type { GrowerMethod } from '../types/batch.js';
import { batchWordsFor } from '../vocabulary/locale/batch-words-in.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';

/** Days before the average last frost that the watch starts: a frost that week is as likely (M, from memory). */
export const FROST_WATCH_LEAD_DAYS = 7;

/**
 * A frost warning for a batch while the frost watch applies: from a week before the average last
 * spring frost until two weeks after it (the calendar's frost watch; the average date is a 50 % date,
 * M), for a batch with seedlings up. Null otherwise.
 */
export function frostWarning(input: {
  method: GrowerMethod;
  lastFrost: IsoDate;
  today: IsoDate;
  seedlingsUp: boolean;
  /** The language of the warning (English when absent). */
  locale?: WordLocale;
}): string | null {
  const from = addDays(input.lastFrost, -FROST_WATCH_LEAD_DAYS);
  const until = addDays(input.lastFrost, DURATIONS.frostWatchDays);
  if (!input.seedlingsUp || input.today < from || input.today > until) return null;
  return batchWordsFor(input.locale).frostWatch(until, input.method);
}
