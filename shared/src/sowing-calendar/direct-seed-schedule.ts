import { addDays, isoDate, yearOf, type IsoDate } from './calendar-date.js';
import { type CalendarWarning, type CalendarEvent, type SowingPlan } from './calendar-types.js';
import type { ScheduleOutcome, Season } from './season.js';
import { DURATIONS, WINDOWS } from './durations.js';
import { cmsDetail, nameOf, sowingDepthWords } from './event-text.js';
import { stratificationOf } from './treatments.js';

/**
 * Direct seeding where the plants will grow. Seed that needs cold goes out as a dormant seeding in
 * late November, or frost-seeded by the end of January (IPN, R), so winter stratifies it; seed that
 * needs none waits for warm soil, about 2 weeks after last frost (M). A spring sowing date chosen
 * by the grower for cold-needing seed gets refrigerator stratification first (CMS start = sowing
 * date − CMS days, D). There are no pots, so no ready date. A late start frost-seeds until the end
 * of January, then stratifies in the refrigerator from today for a spring sowing; spring sowings
 * stop 60 days after the frost date, when summer heat dries seedlings out (M, from-memory).
 */
export function directSeedSchedule(plan: SowingPlan, season: Season): ScheduleOutcome {
  const lastFrost = season.lastFrost;
  const { species, method } = plan;
  const slug = species.slug;
  const name = nameOf(species);
  const s = stratificationOf(species);
  const year = yearOf(lastFrost);
  const needsCold = s.coldDays + s.warmDays > 0;
  const dormant = isoDate(year - 1, WINDOWS.dormantSeeding.month, WINDOWS.dormantSeeding.day);
  const usual = needsCold ? dormant : addDays(lastFrost, DURATIONS.warmSoilAfterFrostDays);
  const frostSeedCloses = isoDate(year, WINDOWS.frostSeedingCloses.month, WINDOWS.frostSeedingCloses.day);
  const springCloses = addDays(lastFrost, 60);
  let sow = plan.sowDate ?? usual;
  const warnings: CalendarWarning[] = [];
  if (!plan.sowDate && usual < season.today) {
    sow =
      needsCold && season.today <= frostSeedCloses
        ? season.today
        : addDays(season.today, needsCold ? s.coldDays + s.warmDays : 0);
    if (sow > springCloses)
      return { seasonPast: true, reason: `spring sowing where it will grow ends about ${springCloses}` };
    warnings.push({
      kind: 'late-start',
      speciesSlug: slug,
      method,
      message:
        `${nameOf(species)}: the usual sowing day (${usual}) is past. ` +
        (sow === season.today && needsCold
          ? `Frost-seeding still works until ${frostSeedCloses}: sow today.`
          : `Sow on ${sow}${needsCold ? ', after stratifying in the refrigerator from today' : ''}.`),
    });
  }
  const month = Number(sow.slice(5, 7));
  const winterSown = month >= 11 || month <= 2;
  const events: CalendarEvent[] = [];
  const event = (date: IsoDate, kind: CalendarEvent['kind'], title: string, detail: string) =>
    events.push({ date, kind, title: `${name}: ${title}`, detail, speciesSlug: slug, method });
  const before = s.before.length > 0 ? `${s.before.join(' ')} ` : '';

  if (needsCold && !winterSown) {
    event(
      addDays(sow, -s.coldDays - s.warmDays),
      'cms-start',
      'start cold-moist stratification',
      `${before}${cmsDetail(s.coldDays, s)}`,
    );
  }
  const how =
    needsCold && winterSown
      ? 'Dormant seeding: scatter the seed on bare, weeded soil and press it in; winter stratifies it. Frost-seeding still works to the end of January.'
      : 'Sow on bare, weeded soil once it is warm, and keep it damp until seedlings are up.';
  const prep = needsCold && !winterSown ? '' : before;
  const atSowing = s.atSowing.length > 0 ? ` ${s.atSowing.join(' ')}` : '';
  event(sow, 'sow', 'sow where it will grow', `${prep}${how} ${sowingDepthWords(species)}${atSowing}`);
  return { speciesSlug: slug, method, sowDate: sow, readyDate: null, events, warnings };
}
