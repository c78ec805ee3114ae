import { addDays, type IsoDate } from '../sowing-calendar/calendar-date.js';
import { DURATIONS } from '../sowing-calendar/durations.js';
import type { GrowerMethod } from '../types/batch.js';
import { FROST_NIGHT_WORDS } from '../vocabulary/batch-words.js';

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
}): string | null {
  const from = addDays(input.lastFrost, -FROST_WATCH_LEAD_DAYS);
  const until = addDays(input.lastFrost, DURATIONS.frostWatchDays);
  if (!input.seedlingsUp || input.today < from || input.today > until) return null;
  return (
    `Frost watch until ${until}: a late frost is still possible. On clear, still nights when frost is forecast, ` +
    `${FROST_NIGHT_WORDS[input.method]}. Check your local forecast.`
  );
}
