import { addDays, isoDate, yearOf } from './calendar-date.js';
import type { CalendarEvent, SowingCalendar, SowingCalendarInput, SowingPlan, SpeciesSchedule } from './calendar-types.js';
import { scheduleWarnings } from './calendar-warnings.js';
import { directSeedSchedule } from './direct-seed-schedule.js';
import { DURATIONS, WINDOWS } from './durations.js';
import { frostWatchDetail, ventDetail, winterSowingDetail } from './event-text.js';
import { indoorSchedule } from './indoor-schedule.js';
import { outdoorSchedule } from './outdoor-schedule.js';

const KIND_ORDER: CalendarEvent['kind'][] = [
  'winter-sowing-window', 'warm-moist-start', 'cms-start', 'check-sprouts', 'sow', 'vent-containers',
  'sprouts-expected', 'pot-up', 'harden-off', 'frost-watch', 'plant-out',
];

// Plain code-unit order, not locale order: the same on every machine.
const compareText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

function scheduleFor(plan: SowingPlan, lastFrost: string): SpeciesSchedule {
  switch (plan.method) {
    case 'indoor-lights':
    case 'soil-blocks':
      return indoorSchedule(plan, lastFrost);
    case 'winter-sowing':
    case 'outdoor-pot-winter':
      return outdoorSchedule(plan, lastFrost);
    case 'direct-seed':
      return directSeedSchedule(plan, lastFrost);
  }
}

/** Events for the whole calendar: the frost date, and the winter-sowing window when it is used. */
function sharedEvents(input: SowingCalendarInput): CalendarEvent[] {
  const events: CalendarEvent[] = [{
    date: input.lastFrost, kind: 'frost-watch', title: 'Average last spring frost', detail: frostWatchDetail(), speciesSlug: null,
  }];
  if (input.plans.some((p) => p.method === 'winter-sowing')) {
    const year = yearOf(input.lastFrost) - 1;
    events.push(
      { date: isoDate(year, WINDOWS.winterSowingOpens.month, WINDOWS.winterSowingOpens.day), kind: 'winter-sowing-window',
        title: 'Winter-sowing window opens (December to February)', detail: winterSowingDetail(), speciesSlug: null },
      { date: addDays(input.lastFrost, -DURATIONS.ventBeforeFrostDays), kind: 'vent-containers',
        title: 'Vent winter-sowing containers on warm days', detail: ventDetail(), speciesSlug: null },
    );
  }
  return events;
}

/**
 * A sowing calendar: dated events for each species and method, worked back from the average last
 * spring frost (and checked against the plant-share date and today). Pure date arithmetic: the
 * same input gives the same calendar. Durations and their sources: durations.ts.
 */
export function buildSowingCalendar(input: SowingCalendarInput): SowingCalendar {
  const schedules = input.plans.map((plan) => {
    const schedule = scheduleFor(plan, input.lastFrost);
    return { ...schedule, warnings: [...schedule.warnings, ...scheduleWarnings(plan, schedule, input.today, input.targetDate)] };
  });
  const events = [...sharedEvents(input), ...schedules.flatMap((s) => s.events)].sort(
    (a, b) =>
      (a.date < b.date ? -1 : a.date > b.date ? 1 : 0) ||
      compareText(a.speciesSlug ?? '', b.speciesSlug ?? '') ||
      KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind),
  );
  return { events, warnings: schedules.flatMap((s) => s.warnings), schedules };
}
