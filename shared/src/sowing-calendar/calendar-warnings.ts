import type { SowingMethod } from '../types/species.js';
import { SOWING_METHOD_WORDS } from '../vocabulary/seed-words.js';
import { daysBetween, type IsoDate } from './calendar-date.js';
import type { CalendarWarning, SowingPlan, SpeciesSchedule } from './calendar-types.js';
import { nameOf } from './event-text.js';

const METHOD_WORDS = Object.fromEntries(Object.entries(SOWING_METHOD_WORDS).map(([m, w]) => [m, w.phrase])) as Record<
  SowingMethod,
  string
>;

/** Warnings that compare a schedule with the target date, today and the species record. */
export function scheduleWarnings(
  plan: SowingPlan,
  schedule: SpeciesSchedule,
  today: IsoDate,
  target?: IsoDate,
): CalendarWarning[] {
  const slug = plan.species.slug;
  const name = nameOf(plan.species);
  const warnings: CalendarWarning[] = [];

  if (!plan.species.germination.methods.includes(plan.method)) {
    warnings.push({
      kind: 'method-unusual',
      speciesSlug: slug,
      message:
        `${name} is not usually raised by ${METHOD_WORDS[plan.method]}; its record lists ` +
        `${plan.species.germination.methods.map((m) => METHOD_WORDS[m]).join(', ')}.`,
    });
  }
  if (target && schedule.readyDate === null) {
    warnings.push({
      kind: 'not-for-share',
      speciesSlug: slug,
      message: `${name} is sown where it will grow, so there will be no pots of it for the plant share on ${target}.`,
    });
  } else if (target && schedule.readyDate && schedule.readyDate > target) {
    const days = daysBetween(target, schedule.readyDate);
    warnings.push({
      kind: 'target-too-early',
      speciesSlug: slug,
      days,
      message:
        `${name} will not be ready for the plant share on ${target}: plants by ${METHOD_WORDS[plan.method]} ` +
        `are ready about ${schedule.readyDate}, ${days} days later.`,
    });
  }

  // Only a date the grower chose can put a step in the past: default dates start today at the
  // earliest (late starts are worked out from today by each method's schedule).
  const first = schedule.events.reduce<(typeof schedule.events)[number] | undefined>(
    (a, e) => (a && a.date <= e.date ? a : e),
    undefined,
  );
  if (plan.sowDate && first && first.date < today) {
    const days = daysBetween(first.date, today);
    warnings.push({
      kind: 'start-in-past',
      speciesSlug: slug,
      method: plan.method,
      days,
      message:
        `${name}: the first step (${first.title.replace(`${name}: `, '')}) was due on ${first.date}, ${days} days ago. ` +
        'If it is done, carry on; if not, leave the sowing date empty and the calendar plans from today.',
    });
  }
  return warnings.map((w) => ({ ...w, method: plan.method }));
}
