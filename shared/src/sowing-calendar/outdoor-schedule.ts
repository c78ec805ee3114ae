import { addDays, daysBetween, earlier, endOfFebruary, isoDate, later, yearOf, type IsoDate } from './calendar-date.js';
import type { CalendarEvent, CalendarWarning, SowingPlan } from './calendar-types.js';
import { DURATIONS, WINDOWS } from './durations.js';
import {
  cmsDetail,
  nameOf,
  outdoorPotsDetail,
  readyDetail,
  secondSeasonDetail,
  sowingDepthWords,
  warmSoilDetail,
  warmThenColdDetail,
  winterSowingDetail,
} from './event-text.js';
import { readinessOf } from './readiness.js';
import { sameDayNextYear, type ScheduleOutcome, type Season } from './season.js';
import { stratificationOf } from './treatments.js';

const inYearOf = (like: IsoDate, year: number): IsoDate =>
  isoDate(year, Number(like.slice(5, 7)), Number(like.slice(8, 10)));

/**
 * Winter sowing (covered containers, December–February, M) and outdoor pots over winter (sown in
 * late November, IPN R). Winter does the cold-moist stratifying from the dormant-seeding date until
 * the containers warm, about 30 days before last frost (M). Warm-moist days are not cold days: seed
 * that needs warm then cold is sown in late summer so the warm step comes first, otherwise it waits
 * for next summer and sprouts the second spring. Seedlings grown outdoors need no hardening.
 */
export function outdoorSchedule(plan: SowingPlan, season: Season): ScheduleOutcome {
  const { species, method } = plan;
  const slug = species.slug;
  const name = nameOf(species);
  const s = stratificationOf(species);
  const r = readinessOf(species);
  const year = yearOf(season.lastFrost);
  const warming = addDays(season.lastFrost, -DURATIONS.outdoorSproutBeforeFrostDays);
  const opens = isoDate(year - 1, WINDOWS.winterSowingOpens.month, WINDOWS.winterSowingOpens.day);
  const coldStarts = isoDate(year - 1, WINDOWS.outdoorColdStarts.month, WINDOWS.outdoorColdStarts.day);
  // Winter sowing runs to the end of February (M); seed put out in pots or on the ground can still
  // be frost-seeded to the end of January (IPN, R).
  const closes =
    method === 'winter-sowing'
      ? endOfFebruary(year)
      : isoDate(year, WINDOWS.frostSeedingCloses.month, WINDOWS.frostSeedingCloses.day);
  const warnings: CalendarWarning[] = [];

  let usual: IsoDate;
  if (s.warmDays > 0) {
    usual = addDays(coldStarts, -s.warmDays);
  } else if (method === 'winter-sowing') {
    const latestForCold = addDays(warming, -s.coldDays - DURATIONS.winterSowingMarginDays);
    const middle = isoDate(year, WINDOWS.winterSowingDefault.month, WINDOWS.winterSowingDefault.day);
    usual = later(earlier(middle, latestForCold), opens);
  } else {
    usual = isoDate(year - 1, WINDOWS.dormantSeeding.month, WINDOWS.dormantSeeding.day);
  }
  let sow = plan.sowDate ?? usual;
  const isLate = !plan.sowDate && usual < season.today;
  if (isLate) {
    if (season.today > closes) return { seasonPast: true, reason: `the outdoor sowing window closed on ${closes}` };
    sow = season.today;
  }
  if (method === 'winter-sowing' && s.warmDays === 0 && (sow < opens || sow > endOfFebruary(year))) {
    warnings.push({
      kind: 'outside-window',
      speciesSlug: slug,
      method,
      message: `${name}: ${sow} is outside the winter-sowing window (${opens} to ${endOfFebruary(year)}).`,
    });
  }

  const events: CalendarEvent[] = [];
  const event = (date: IsoDate, kind: CalendarEvent['kind'], title: string, detail: string) =>
    events.push({ date, kind, title: `${name}: ${title}`, detail, speciesSlug: slug, method });

  let sprouts: IsoDate;
  let fridgeNote = '';
  if (s.warmDays > 0) {
    // Warm-moist first (late summer and autumn in a damp pot), then winter's cold.
    const warmThisAutumn = daysBetween(sow, coldStarts) >= s.warmDays;
    const coldEnough = daysBetween(coldStarts, warming) >= s.coldDays;
    const firstSpring = warmThisAutumn && coldEnough && !r.doubleDormancy;
    sprouts = firstSpring ? warming : sameDayNextYear(warming);
    const coldFrom = warmThisAutumn ? coldStarts : sameDayNextYear(coldStarts);
    if (!warmThisAutumn) {
      event(
        season.lastFrost,
        'warm-moist-start',
        'summer gives the warm-moist step',
        `Keep the pots outdoors, damp and in light shade through the summer: ${s.warmDays} warm, moist days come before the cold.`,
      );
    }
    event(
      coldFrom,
      'cms-start',
      "winter's cold-moist step begins outdoors",
      `Leave the pots out in the cold and wet: ${s.coldDays} days of cold-moist stratification from now, given by the winter.`,
    );
    fridgeNote = warmThenColdDetail(s.warmDays, s.coldDays, firstSpring, r.doubleDormancy);
    if (!firstSpring) {
      warnings.push({
        kind: 'second-season',
        speciesSlug: slug,
        method,
        message:
          `${name} needs ${s.warmDays} warm then ${s.coldDays} cold days${r.doubleDormancy ? ' and sends up its first leaf only after a second winter' : ''}; ` +
          `sown on ${sow}, expect seedlings in spring ${yearOf(sprouts)}, not ${year}.`,
      });
    }
  } else {
    const coldGiven = daysBetween(sow, warming);
    const short = s.coldDays - coldGiven;
    sprouts = later(warming, addDays(sow, 7));
    if (short > 0) {
      const fridgeFrom = addDays(sow, -short);
      if (fridgeFrom >= season.today) {
        event(
          fridgeFrom,
          'cms-start',
          'start cold-moist stratification in the refrigerator',
          `${cmsDetail(short, s, r.stratifyInLight)} Then sow outdoors on ${sow}: winter gives the rest of the cold.`,
        );
        warnings.push({
          kind: 'cold-too-short',
          speciesSlug: slug,
          method,
          days: short,
          message:
            `${name} needs ${s.coldDays} days of cold-moist stratification; sown outdoors on ${sow} it gets about ${Math.max(coldGiven, 0)}. ` +
            `Give it ${short} days in the refrigerator first, from ${fridgeFrom} (on the calendar).`,
        });
      } else {
        warnings.push({
          kind: 'cold-too-short',
          speciesSlug: slug,
          method,
          days: short,
          message:
            `${name} needs ${s.coldDays} days of cold-moist stratification; sown outdoors on ${sow} it gets about ${Math.max(coldGiven, 0)}. ` +
            `A shorter cold period gives fewer seedlings, and some seed may wait a year; sowing under lights after ${s.coldDays} days in the refrigerator is surer.`,
        });
      }
    }
  }
  if (r.doubleDormancy && s.warmDays === 0) sprouts = later(sprouts, sameDayNextYear(warming));
  if (r.needsWarmSoil)
    sprouts = later(sprouts, addDays(inYearOf(season.lastFrost, yearOf(sprouts)), DURATIONS.warmSoilAfterFrostDays));

  if (isLate) {
    const still =
      s.warmDays > 0
        ? 'sown today, the warm step comes next summer'
        : `${method === 'winter-sowing' ? 'winter sowing' : 'frost-seeding pots outdoors'} still works until ${closes}`;
    warnings.push({
      kind: 'late-start',
      speciesSlug: slug,
      method,
      message: `${name}: the usual sowing day (${usual}) is past, but ${still}. Sow today; seedlings are expected about ${sprouts}.`,
    });
  }

  const before = [...s.before, ...s.atSowing].join(' ');
  const how = method === 'winter-sowing' ? winterSowingDetail() : outdoorPotsDetail();
  const extra = [fridgeNote, r.needsWarmSoil ? warmSoilDetail(r.why) : ''].filter(Boolean).join(' ');
  event(
    sow,
    'sow',
    method === 'winter-sowing' ? 'winter-sow outdoors' : 'sow pots for outdoors',
    `${before ? `${before} ` : ''}${how} ${sowingDepthWords(species)}${extra ? ` ${extra}` : ''}`,
  );
  event(
    sprouts,
    'sprouts-expected',
    'sprouts expected',
    'Seedlings come up as the containers warm; keep them damp, never soggy.',
  );
  if (method === 'winter-sowing') {
    event(
      addDays(sprouts, DURATIONS.winterSownPotUpAfterDays),
      'pot-up',
      'pot up',
      'Tease the clump apart and move each seedling into its own cell or pot once it has true leaves.',
    );
  } else {
    event(
      addDays(sprouts, DURATIONS.outdoorPotUpAfterDays),
      'pot-up',
      'pot up',
      'Where several seedlings share a pot, ease them apart and give each its own 3–4 in (8–10 cm) pot once it has true leaves.',
    );
  }
  const plantOutThatYear = inYearOf(season.plantOutFrom, yearOf(sprouts));
  const grown = later(addDays(sprouts, 7 * r.outdoorWeeks), plantOutThatYear);
  const ready = r.secondSeason ? later(grown, sameDayNextYear(plantOutThatYear)) : grown;
  if (r.secondSeason && !warnings.some((w) => w.kind === 'second-season')) {
    warnings.push({
      kind: 'second-season',
      speciesSlug: slug,
      method,
      message: `${name}: ${secondSeasonDetail(r.why, ready)}`,
    });
  }
  event(ready, 'plant-out', 'ready to plant out or give', readyDetail(r.secondSeason, true));
  return { speciesSlug: slug, method, sowDate: sow, readyDate: ready, events, warnings };
}
