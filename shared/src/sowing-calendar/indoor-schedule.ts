import { addDays, earlier, later, type IsoDate } from './calendar-date.js';
import type { CalendarEvent, CalendarWarning, SowingPlan } from './calendar-types.js';
import { DURATIONS } from './durations.js';
import {
  checkSproutsDetail,
  cmsDetail,
  hardenOffDetail,
  nameOf,
  readyDetail,
  secondSeasonDetail,
  sowingDepthWords,
} from './event-text.js';
import { readinessOf } from './readiness.js';
import { type ScheduleOutcome, type Season, sameDayNextYear } from './season.js';
import { stratificationOf } from './treatments.js';

/** Days from sowing indoors to a plant fit to give: sprouting, then the species' weeks (soil blocks save one). */
export function indoorGrowDays(plan: SowingPlan): number {
  const saved = plan.method === 'soil-blocks' ? DURATIONS.soilBlockDaysSaved : 0;
  return DURATIONS.indoorSproutAfterDays + 7 * readinessOf(plan.species).indoorWeeks - saved;
}

/**
 * Indoor sowing under lights or in soil blocks. Sow 8 weeks before the last frost (M), or earlier
 * when the species needs longer to make a sturdy plant; stratify in the refrigerator first: CMS
 * start = sowing date − CMS days (IPN, CHECK-VALUES §4, D), warm-moist days before that. Plants are
 * ready when grown (readiness.ts) and not before the frost watch ends; a late start begins today.
 */
export function indoorSchedule(plan: SowingPlan, season: Season): ScheduleOutcome {
  const { species, method } = plan;
  const slug = species.slug;
  const name = nameOf(species);
  const s = stratificationOf(species);
  const r = readinessOf(species);
  const grow = indoorGrowDays(plan);
  const prepDays = s.warmDays + s.coldDays;
  const warnings: CalendarWarning[] = [];

  const usualSow = earlier(
    addDays(season.lastFrost, -7 * DURATIONS.indoorWeeksBeforeFrost),
    addDays(season.plantOutFrom, -grow),
  );
  let sow = plan.sowDate ?? usualSow;
  if (!plan.sowDate && addDays(sow, -prepDays) < season.today) {
    // Late: start the first step today; readiness follows from the new sowing date, not from the delay.
    sow = addDays(season.today, prepDays);
    if (addDays(sow, grow) > addDays(season.lastFrost, DURATIONS.indoorLatestReadyAfterFrostDays)) {
      return {
        seasonPast: true,
        reason: `sown indoors now, ${name.toLowerCase()} would not be ready until late summer`,
      };
    }
    warnings.push({
      kind: 'late-start',
      speciesSlug: slug,
      method,
      message:
        `${name}: the usual start (${addDays(usualSow, -prepDays)}) is past. Start today and sow on ${sow}; ` +
        `plants are ready about ${later(addDays(sow, grow), season.plantOutFrom)}.`,
    });
  }

  const events: CalendarEvent[] = [];
  const event = (date: IsoDate, kind: CalendarEvent['kind'], title: string, detail: string) =>
    events.push({ date, kind, title: `${name}: ${title}`, detail, speciesSlug: slug, method });

  const cmsStart = addDays(sow, -s.coldDays);
  const before = s.before.length > 0 ? `${s.before.join(' ')} ` : '';
  if (s.warmDays > 0) {
    event(
      addDays(cmsStart, -s.warmDays),
      'warm-moist-start',
      'start warm-moist stratification',
      `${before}Keep the seed in damp sand or vermiculite in a sealed, labelled bag at room temperature for ${s.warmDays} days, then move it to the refrigerator.`,
    );
  }
  if (s.coldDays > 0) {
    event(
      cmsStart,
      'cms-start',
      'start cold-moist stratification',
      `${s.warmDays > 0 ? '' : before}${cmsDetail(s.coldDays, s, r.stratifyInLight)}`,
    );
    if (s.coldDays > DURATIONS.checkSproutsAfterDays) {
      event(
        addDays(cmsStart, DURATIONS.checkSproutsAfterDays),
        'check-sprouts',
        'check for sprouts',
        checkSproutsDetail(),
      );
    }
  }
  // Lamp hours and height: 14–16 h/day, 2–4 in above the seedlings (CHECK-VALUES §4, M, from-memory).
  const where = method === 'soil-blocks' ? 'in mini soil blocks' : 'in cells or small pots';
  const prepAtSow = prepDays === 0 ? before : '';
  const atSowing = s.atSowing.length > 0 ? ` ${s.atSowing.join(' ')}` : '';
  event(
    sow,
    'sow',
    'sow indoors',
    `${prepAtSow}Sow ${where} under lights (14–16 hours a day, lamps 2–4 in / 5–10 cm above the seedlings). ` +
      `${sowingDepthWords(species)}${atSowing}`,
  );
  if (method === 'soil-blocks') {
    event(
      addDays(sow, DURATIONS.potOnBlocksAfterDays),
      'pot-up',
      'move into larger blocks',
      'Set each mini block into a 2 in (5 cm) block once roots show at the sides. Blocks go out whole, with no root disturbance, ' +
        'so the plants skip the setback of transplanting and are ready about a week sooner.',
    );
  } else {
    event(
      addDays(sow, DURATIONS.potUpAfterDays),
      'pot-up',
      'pot up',
      'Move each seedling into its own 3–4 in (8–10 cm) pot once it has its first true leaves.',
    );
  }
  const grown = later(addDays(sow, grow), season.plantOutFrom);
  // A slow species stays in its pot over winter and is ready after the next spring's frost watch.
  const ready = r.secondSeason ? later(grown, sameDayNextYear(season.plantOutFrom)) : grown;
  event(addDays(grown, -DURATIONS.hardenOffDays), 'harden-off', 'begin hardening off', hardenOffDetail());
  if (r.secondSeason) {
    warnings.push({
      kind: 'second-season',
      speciesSlug: slug,
      method,
      message: `${name}: ${secondSeasonDetail(r.why, ready)}`,
    });
  }
  event(ready, 'plant-out', 'ready to plant out or give', readyDetail(r.secondSeason, false));
  return { speciesSlug: slug, method, sowDate: sow, readyDate: ready, events, warnings };
}
