import { addDays, endOfFebruary, isoDate, yearOf } from './calendar-date.js';
import type {
  CalendarEvent,
  CalendarWarning,
  SowingCalendar,
  SowingCalendarInput,
  SowingPlan,
  SpeciesSchedule,
} from './calendar-types.js';
import { scheduleWarnings } from './calendar-warnings.js';
import { directSeedSchedule } from './direct-seed-schedule.js';
import { DURATIONS, WINDOWS } from './durations.js';
import {
  collectPotsDetail,
  frostWatchDetail,
  frostWatchEndDetail,
  labelPotsDetail,
  nameOf,
  plantShareDetail,
  potOnDetail,
  ventDetail,
  winterSowingDetail,
  winterSowingEndsDetail,
} from './event-text.js';
import { indoorSchedule } from './indoor-schedule.js';
import { outdoorSchedule } from './outdoor-schedule.js';
import { isSeasonPast, nextSeason, seasonOf, type ScheduleOutcome, type Season } from './season.js';

const KIND_ORDER: CalendarEvent['kind'][] = [
  'winter-sowing-window',
  'warm-moist-start',
  'cms-start',
  'check-sprouts',
  'sow',
  'vent-containers',
  'winter-sowing-window-ends',
  'sprouts-expected',
  'pot-up',
  'harden-off',
  'frost-watch',
  'frost-watch-end',
  'plant-out',
  'pot-on',
  'collect-pots',
  'label-pots',
  'plant-share',
];

// Plain code-unit order, not locale order: the same on every machine.
const compareText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

function scheduleFor(plan: SowingPlan, season: Season): ScheduleOutcome {
  switch (plan.method) {
    case 'indoor-lights':
    case 'soil-blocks':
      return indoorSchedule(plan, season);
    case 'winter-sowing':
    case 'outdoor-pot-winter':
      return outdoorSchedule(plan, season);
    case 'direct-seed':
      return directSeedSchedule(plan, season);
  }
}

/**
 * This season's schedule, or next season's when the method is past for this one (with a warning
 * that says so and why). `lastFrost` on the result tells which season was used.
 */
function scheduleThisOrNext(plan: SowingPlan, season: Season): { schedule: SpeciesSchedule; lastFrost: string } {
  const outcome = scheduleFor(plan, season);
  if (!isSeasonPast(outcome)) return { schedule: outcome, lastFrost: season.lastFrost };
  // Step a season at a time: a frost date given years before today still ends in a future season.
  let next = nextSeason(season);
  let later = scheduleFor(plan, next);
  while (isSeasonPast(later)) {
    next = nextSeason(next);
    later = scheduleFor(plan, next);
  }
  const warning: CalendarWarning = {
    kind: 'next-season',
    speciesSlug: plan.species.slug,
    method: plan.method,
    message:
      `${nameOf(plan.species)}: too late this season (${outcome.reason}). These dates are for next season, ` +
      `with the last frost about ${next.lastFrost}${plan.method === 'winter-sowing' || plan.method === 'outdoor-pot-winter' ? '; for plants this year, sow under lights instead' : ''}.`,
  };
  return { schedule: { ...later, warnings: [warning, ...later.warnings] }, lastFrost: next.lastFrost };
}

/** Events for the whole calendar: frost date and watch, the winter-sowing window, the share. */
function sharedEvents(input: SowingCalendarInput, winterSowingFrosts: Set<string>): CalendarEvent[] {
  const all = (date: string, kind: CalendarEvent['kind'], title: string, detail: string): CalendarEvent => ({
    date,
    kind,
    title,
    detail,
    speciesSlug: null,
  });
  const events: CalendarEvent[] = [
    all(input.lastFrost, 'frost-watch', 'Average last spring frost: frost watch begins', frostWatchDetail()),
    all(
      addDays(input.lastFrost, DURATIONS.frostWatchDays),
      'frost-watch-end',
      'Frost watch ends: plant out',
      frostWatchEndDetail(),
    ),
  ];
  for (const lastFrost of [...winterSowingFrosts].sort()) {
    const year = yearOf(lastFrost);
    events.push(
      all(
        isoDate(year - 1, WINDOWS.winterSowingOpens.month, WINDOWS.winterSowingOpens.day),
        'winter-sowing-window',
        'Winter-sowing window opens (December to February)',
        winterSowingDetail(),
      ),
      all(endOfFebruary(year), 'winter-sowing-window-ends', 'Winter-sowing window ends', winterSowingEndsDetail()),
      all(
        addDays(lastFrost, -DURATIONS.ventBeforeFrostDays),
        'vent-containers',
        'Vent winter-sowing containers on warm days',
        ventDetail(),
      ),
    );
  }
  if (input.targetDate) {
    events.push(
      all(
        addDays(input.targetDate, -DURATIONS.collectPotsBeforeShareDays),
        'collect-pots',
        'Collect pots and trays for the plant share',
        collectPotsDetail(),
      ),
      all(
        addDays(input.targetDate, -DURATIONS.labelPotsBeforeShareDays),
        'label-pots',
        'Label the pots for the plant share',
        labelPotsDetail(),
      ),
      all(input.targetDate, 'plant-share', 'Plant share', plantShareDetail()),
    );
  }
  return events;
}

/** Hold and pot on plants that are ready well before the share (this season's plans only). */
function holdingEvents(schedule: SpeciesSchedule, name: string, target: string | undefined): CalendarEvent[] {
  if (!target || !schedule.readyDate || schedule.readyDate > target) return [];
  if (schedule.readyDate > addDays(target, -DURATIONS.potOnWhenHeldDays)) return [];
  return [
    {
      date: schedule.readyDate,
      kind: 'pot-on',
      title: `${name}: hold and pot on until the share`,
      detail: potOnDetail(target),
      speciesSlug: schedule.speciesSlug,
      method: schedule.method,
    },
  ];
}

/**
 * A sowing calendar: dated events for each species and method, worked back from the average last
 * spring frost and its 2-week frost watch, forward from today for late starts, and checked against
 * the plant-share date. Pure date arithmetic: the same input gives the same calendar. Durations
 * and their sources: durations.ts; per-species readiness: readiness.ts.
 */
export function buildSowingCalendar(input: SowingCalendarInput): SowingCalendar {
  const season = seasonOf(input.lastFrost, input.today);
  const winterSowingFrosts = new Set<string>();
  const schedules = input.plans.map((plan) => {
    const { schedule, lastFrost } = scheduleThisOrNext(plan, season);
    if (plan.method === 'winter-sowing') winterSowingFrosts.add(lastFrost);
    const thisSeason = lastFrost === input.lastFrost;
    const events = [
      ...schedule.events,
      ...(thisSeason ? holdingEvents(schedule, nameOf(plan.species), input.targetDate) : []),
    ];
    const warnings = [
      ...schedule.warnings,
      ...scheduleWarnings(plan, schedule, input.today, thisSeason ? input.targetDate : undefined),
    ];
    return { ...schedule, events, warnings };
  });
  const events = [...sharedEvents(input, winterSowingFrosts), ...schedules.flatMap((s) => s.events)].sort(
    (a, b) =>
      (a.date < b.date ? -1 : a.date > b.date ? 1 : 0) ||
      compareText(a.speciesSlug ?? '', b.speciesSlug ?? '') ||
      KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) ||
      compareText(a.method ?? '', b.method ?? ''),
  );
  return { events, warnings: schedules.flatMap((s) => s.warnings), schedules };
}
