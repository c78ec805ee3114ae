import type { CalendarEvent } from './calendar-types.js';

/**
 * Stable iCalendar UIDs: built from the plan id, the species, the method and the event kind, never
 * from the event's position, so adding or removing a species leaves every other UID as it was and a
 * calendar program replaces updated events instead of duplicating them. A second event with the
 * same key (the same species and method planned twice) gets "-2", "-3", … in calendar order.
 */
export function uidsFor(events: readonly CalendarEvent[], planId = 'plan'): string[] {
  const seen = new Map<string, number>();
  return events.map((e) => {
    const key = `${e.kind}.${e.speciesSlug ?? 'all'}.${e.method ?? 'all'}.${planId}`;
    const n = (seen.get(key) ?? 0) + 1;
    seen.set(key, n);
    return `${n === 1 ? key : `${key}-${n}`}@homeground`;
  });
}
