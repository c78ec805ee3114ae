import { addDays, later, type IsoDate } from './calendar-date.js';
import type { CalendarEvent, SowingPlan, SpeciesSchedule } from './calendar-types.js';
import { DURATIONS } from './durations.js';
import { checkSproutsDetail, cmsDetail, hardenOffDetail, nameOf, sowingDepthWords } from './event-text.js';
import { stratificationOf } from './treatments.js';

/**
 * Indoor sowing under lights or in soil blocks. Sow 8 weeks before the last frost (M) unless the
 * grower picked a date; stratify in the refrigerator first: CMS start = sowing date − CMS days
 * (IPN, CHECK-VALUES §4, D). Plants are ready when 8 weeks old (M) and not before the last frost,
 * after 10 days of hardening off.
 */
export function indoorSchedule(plan: SowingPlan, lastFrost: IsoDate): SpeciesSchedule {
  const { species, method } = plan;
  const slug = species.slug;
  const name = nameOf(species);
  const s = stratificationOf(species);
  const sow = plan.sowDate ?? addDays(lastFrost, -7 * DURATIONS.indoorWeeksBeforeFrost);
  const events: CalendarEvent[] = [];
  const event = (date: IsoDate, kind: CalendarEvent['kind'], title: string, detail: string) =>
    events.push({ date, kind, title: `${name}: ${title}`, detail, speciesSlug: slug });

  const cmsStart = addDays(sow, -s.coldDays);
  const before = s.before.length > 0 ? `${s.before.join(' ')} ` : '';
  if (s.warmDays > 0) {
    event(addDays(cmsStart, -s.warmDays), 'warm-moist-start', 'start warm-moist stratification',
      `${before}Keep the seed damp at room temperature for ${s.warmDays} days, then move it to the refrigerator.`);
  }
  if (s.coldDays > 0) {
    event(cmsStart, 'cms-start', 'start cold-moist stratification', `${s.warmDays > 0 ? '' : before}${cmsDetail(s.coldDays, s)}`);
    if (s.coldDays > DURATIONS.checkSproutsAfterDays) {
      event(addDays(cmsStart, DURATIONS.checkSproutsAfterDays), 'check-sprouts', 'check for sprouts', checkSproutsDetail());
    }
  }
  // Lamp hours and height: 14–16 h/day, 2–4 in above the seedlings (CHECK-VALUES §4, M, from-memory).
  const where = method === 'soil-blocks' ? 'in mini soil blocks' : 'in cells or small pots';
  const prepAtSow = s.coldDays === 0 && s.warmDays === 0 ? before : '';
  const atSowing = s.atSowing.length > 0 ? ` ${s.atSowing.join(' ')}` : '';
  event(sow, 'sow', 'sow indoors',
    `${prepAtSow}Sow ${where} under lights (14–16 hours a day, lamps 2–4 in / 5–10 cm above the seedlings). ` +
      `${sowingDepthWords(species)}${atSowing}`);
  if (method === 'soil-blocks') {
    event(addDays(sow, DURATIONS.potOnBlocksAfterDays), 'pot-up', 'move into larger blocks',
      'Set each mini block into a 2 in (5 cm) block once roots show at the sides.');
  } else {
    event(addDays(sow, DURATIONS.potUpAfterDays), 'pot-up', 'pot up',
      'Move each seedling into its own 3–4 in (8–10 cm) pot once it has its first true leaves.');
  }
  const ready = later(addDays(sow, DURATIONS.indoorGrowDays), lastFrost);
  event(addDays(ready, -DURATIONS.hardenOffDays), 'harden-off', 'begin hardening off', hardenOffDetail());
  event(ready, 'plant-out', 'ready to plant out', 'Hardened off and past the average last frost: plant out, or hand over at the plant share.');
  return { speciesSlug: slug, method, sowDate: sow, readyDate: ready, events, warnings: [] };
}
