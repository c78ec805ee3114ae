import { addDays, daysBetween, earlier, endOfFebruary, isoDate, later, yearOf, type IsoDate } from './calendar-date.js';
import type { CalendarEvent, CalendarWarning, SowingPlan, SpeciesSchedule } from './calendar-types.js';
import { DURATIONS, WINDOWS } from './durations.js';
import { nameOf, sowingDepthWords, winterSowingDetail } from './event-text.js';
import { stratificationOf } from './treatments.js';

/**
 * Winter sowing (covered containers, December–February, M) and outdoor pots over winter (sown in
 * late November, IPN R). Winter does the stratifying: the seed gets its cold from sowing until the
 * containers warm, about 30 days before last frost (M). Seedlings grown outdoors need no hardening.
 */
export function outdoorSchedule(plan: SowingPlan, lastFrost: IsoDate): SpeciesSchedule {
  const { species, method } = plan;
  const slug = species.slug;
  const name = nameOf(species);
  const s = stratificationOf(species);
  const year = yearOf(lastFrost);
  const warming = addDays(lastFrost, -DURATIONS.outdoorSproutBeforeFrostDays);
  const opens = isoDate(year - 1, WINDOWS.winterSowingOpens.month, WINDOWS.winterSowingOpens.day);
  const closes = endOfFebruary(year);
  const coldNeeded = s.coldDays + s.warmDays;
  const warnings: CalendarWarning[] = [];

  let sow: IsoDate;
  if (plan.sowDate) {
    sow = plan.sowDate;
  } else if (method === 'winter-sowing') {
    const latestForCold = addDays(warming, -coldNeeded - DURATIONS.winterSowingMarginDays);
    const middle = isoDate(year, WINDOWS.winterSowingDefault.month, WINDOWS.winterSowingDefault.day);
    sow = later(earlier(middle, latestForCold), opens);
  } else {
    sow = isoDate(year - 1, WINDOWS.dormantSeeding.month, WINDOWS.dormantSeeding.day);
  }
  if (method === 'winter-sowing' && (sow < opens || sow > closes)) {
    warnings.push({ kind: 'outside-window', speciesSlug: slug,
      message: `${name}: ${sow} is outside the winter-sowing window (${opens} to ${closes}).` });
  }
  const coldGiven = daysBetween(sow, warming);
  if (coldGiven < coldNeeded) {
    const short = coldNeeded - coldGiven;
    warnings.push({ kind: 'cold-too-short', speciesSlug: slug, days: short,
      message: `${name} needs ${coldNeeded} days of cold-moist stratification; sown outdoors on ${sow} it gets about ${coldGiven}. ` +
        `Give it ${short} days in the refrigerator first, or sow it earlier.` });
  }

  const events: CalendarEvent[] = [];
  const event = (date: IsoDate, kind: CalendarEvent['kind'], title: string, detail: string) =>
    events.push({ date, kind, title: `${name}: ${title}`, detail, speciesSlug: slug });
  const before = [...s.before, ...s.atSowing].join(' ');
  const how = method === 'winter-sowing'
    ? winterSowingDetail()
    : 'Sow in pots of damp mix and set them outside for the winter, on the ground against a wall, under mesh against mice and squirrels.';
  event(sow, 'sow', method === 'winter-sowing' ? 'winter-sow outdoors' : 'sow pots for outdoors',
    `${before ? `${before} ` : ''}${how} ${sowingDepthWords(species)}`);
  const sprouts = later(addDays(sow, coldNeeded), warming);
  event(sprouts, 'sprouts-expected', 'sprouts expected', 'Seedlings come up as the containers warm; keep them damp, never soggy.');
  if (method === 'winter-sowing') {
    event(addDays(sprouts, DURATIONS.winterSownPotUpAfterDays), 'pot-up', 'pot up', 'Tease the clump apart and move each seedling into its own cell or pot once it has true leaves.');
  }
  const ready = later(addDays(sprouts, DURATIONS.outdoorGrowDays), lastFrost);
  event(ready, 'plant-out', 'ready to plant out', 'Grown outdoors, so already hardened: plant out, or hand over at the plant share.');
  return { speciesSlug: slug, method, sowDate: sow, readyDate: ready, events, warnings };
}
