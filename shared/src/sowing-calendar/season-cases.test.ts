import { describe, expect, it } from 'vitest';
import { F, makeSpecies } from '../scoring/__tests__/species-fixtures.js';
import type { SowingMethod, Species } from '../types/species.js';
import type { SowingCalendar } from './calendar-types.js';
import { buildSowingCalendar } from './sowing-calendar.js';

/*
 * Hand-worked cases for issue 11. Rules from CHECK-VALUES §4, each named where it is used:
 * - IPN (R): outdoor dormant seeding in late November, or frost-seed by the end of January.
 * - Winter sowing in covered containers, December to February (M, from memory).
 * - Indoor sowing 8–12 weeks before the average last frost (M); we sow 8 weeks before, or earlier
 *   when the species needs longer to make a sturdy plant.
 * - CMS start = sowing date − CMS days (IPN timing advice, D).
 * - Hardening off 7–14 days (M); we plan 10.
 * - Warm-season grass sowing needs soil ≥ 10–13 °C, about 2 weeks after last frost (M).
 * Homeground's own assumptions, from memory: containers warm and seed sprouts ~30 d before the
 * last frost; frost stays likely for a 14-day watch after the average date (a 50 % date); seed sown
 * indoors sprouts in ~7 d; a perennial forb needs ~7 weeks from sprouting to a sturdy plug indoors,
 * 6 outdoors. Pale purple coneflower: ~2 years to a finished 160 ml plug (NPN-ECPA, R).
 */

type Extra = { lastFrost?: string; targetDate?: string; today: string; sowDate?: string };
const cal = (species: Species, method: SowingMethod, x: Extra): SowingCalendar =>
  buildSowingCalendar({
    lastFrost: x.lastFrost ?? '2027-05-10',
    targetDate: x.targetDate,
    today: x.today,
    plans: [{ species, method, sowDate: x.sowDate }],
  });
const on = (c: SowingCalendar, kind: string) => c.events.find((e) => e.kind === kind && e.speciesSlug !== null)?.date;
const kinds = (c: SowingCalendar) => c.warnings.map((w) => w.kind).sort();

// Golden alexanders fixture: 90 d CMS (CHECK-VALUES §1 gives 60–90 d, M). Frost 2027-05-10,
// share 2027-06-12 (second Saturday of June, the demo scenario), today 2027-01-25.
describe('a late start in January, three methods (golden alexanders, 90 d CMS)', () => {
  const late = { today: '2027-01-25', targetDate: '2027-06-12' };

  it('winter sowing: the usual day 2026-12-27 is past, the window runs to Feb 28, so sow today with a shorter cold', () => {
    // usual = containers warm 2027-04-10 (frost − 30 d) − 90 d CMS − 14 d margin = 2026-12-27.
    // sown 2027-01-25: cold until 2027-04-10 = 6 + 28 + 31 + 10 = 75 d, so 15 d short; the
    // refrigerator cannot make that up (it would have to start 2027-01-10, already past).
    const c = cal(F.goldenAlexanders, 'winter-sowing', late);
    expect(on(c, 'sow')).toBe('2027-01-25');
    expect(c.warnings.find((w) => w.kind === 'late-start')!.message).toContain('2026-12-27');
    expect(c.warnings.find((w) => w.kind === 'cold-too-short')).toMatchObject({ days: 15 });
    expect(c.warnings.find((w) => w.kind === 'cold-too-short')!.message).toContain('sowing under lights');
    // sprouts 2027-04-10; + 6 weeks = 2027-05-22; not before the frost watch ends 2027-05-24.
    expect(on(c, 'plant-out')).toBe('2027-05-24');
    expect(kinds(c)).not.toContain('target-too-early');
  });

  it('outdoor pots: the November day is past, but frost-seeding works to Jan 31 (IPN R): sow today', () => {
    const c = cal(F.goldenAlexanders, 'outdoor-pot-winter', late);
    expect(on(c, 'sow')).toBe('2027-01-25');
    expect(c.warnings.find((w) => w.kind === 'late-start')!.message).toContain('until 2027-01-31');
    expect(on(c, 'pot-up')).toBe('2027-05-01'); // sprouts 2027-04-10 + 21 d
    expect(on(c, 'plant-out')).toBe('2027-05-24');
  });

  it('under lights: CMS starts today, sowing 90 d later, ready from the new sowing date, not by the delay', () => {
    // usual sowing 2027-03-15 (frost − 8 weeks), CMS from 2026-12-15: past. CMS 2027-01-25 + 90 d
    // = sow 2027-04-25; + 7 d to sprout + 7 weeks = 2027-06-20 (later than the frost watch end).
    const c = cal(F.goldenAlexanders, 'indoor-lights', late);
    expect(on(c, 'cms-start')).toBe('2027-01-25');
    expect(on(c, 'sow')).toBe('2027-04-25');
    expect(on(c, 'plant-out')).toBe('2027-06-20');
    expect(on(c, 'harden-off')).toBe('2027-06-10'); // − 10 d
    expect(c.warnings.find((w) => w.kind === 'target-too-early')).toMatchObject({ days: 8 }); // 06-12 → 06-20
  });

  it('outdoor pots 12 days late (2026-12-02) still make the share: winter gives the same cold', () => {
    const c = cal(F.wildBergamot, 'outdoor-pot-winter', { today: '2026-12-02', targetDate: '2027-06-12' });
    expect(on(c, 'sow')).toBe('2026-12-02');
    expect(on(c, 'plant-out')).toBe('2027-05-24');
    expect(kinds(c)).toEqual(['late-start']);
    // Ready 19 days before the share: hold and pot on from the ready day.
    expect(on(c, 'pot-on')).toBe('2027-05-24');
  });

  it('a November dormant seeding already past is frost-seeded today, up to the end of January (IPN R)', () => {
    expect(on(cal(F.goldenAlexanders, 'direct-seed', { today: '2026-12-15' }), 'sow')).toBe('2026-12-15');
  });

  it('after the last frost, winter sowing is offered for next season, not on June 1', () => {
    const c = cal(F.wildBergamot, 'winter-sowing', { today: '2027-06-01' });
    expect(on(c, 'sow')).toBe('2028-01-15');
    expect(on(c, 'plant-out')).toBe('2028-05-24'); // 2028-05-10 + 14 d watch
    expect(c.warnings[0]).toMatchObject({ kind: 'next-season' });
    expect(c.warnings[0].message).toContain('sow under lights instead');
    expect(c.events.find((e) => e.kind === 'winter-sowing-window')!.date).toBe('2027-12-01');
  });

  it('a frost date years before today still gives a plan in a future season', () => {
    const c = cal(F.wildBergamot, 'winter-sowing', { today: '2027-06-01', lastFrost: '2024-05-10' });
    expect(on(c, 'sow')).toBe('2028-01-15');
  });

  it('wild bergamot (no pretreatment) under lights from Oct 1 is sown Mar 15 and ready when the frost watch ends', () => {
    const c = cal(F.wildBergamot, 'indoor-lights', { today: '2026-10-01', targetDate: '2027-06-12' });
    expect(on(c, 'sow')).toBe('2027-03-15');
    expect(on(c, 'plant-out')).toBe('2027-05-24');
    expect(c.warnings).toEqual([]);
  });
});

describe('warm-then-cold seed outdoors: warm days are not cold days', () => {
  const warmCold = makeSpecies({
    slug: 'actaea-racemosa',
    scientificName: 'Actaea racemosa',
    commonNames: ['black cohosh'],
    germination: {
      treatments: [
        { kind: 'warm-moist', days: 90 },
        { kind: 'cold-moist', days: 90 },
      ],
      methods: ['outdoor-pot-winter'],
    },
  });

  it('sown fresh in late summer: 90 warm days to Nov 20, then winter cold; seedlings the first spring', () => {
    // Cold counted from the dormant-seeding date 2026-11-20 (IPN R); 2026-11-20 − 90 d = 2026-08-22.
    const c = cal(warmCold, 'outdoor-pot-winter', { today: '2026-07-01' });
    expect(on(c, 'sow')).toBe('2026-08-22');
    expect(on(c, 'cms-start')).toBe('2026-11-20');
    expect(on(c, 'sprouts-expected')).toBe('2027-04-10'); // Nov 20 → Apr 10 = 141 d of cold ≥ 90
    expect(c.events.find((e) => e.kind === 'sow')!.detail).toContain('90 warm, moist days and then 90 cold');
  });

  it('sown in October: the warm step waits for next summer, so seedlings come the second spring', () => {
    const c = cal(warmCold, 'outdoor-pot-winter', { today: '2026-10-01' });
    expect(on(c, 'warm-moist-start')).toBe('2027-05-10');
    expect(on(c, 'cms-start')).toBe('2027-11-20');
    expect(on(c, 'sprouts-expected')).toBe('2028-04-10');
    expect(kinds(c)).toContain('second-season');
  });

  it('trillium (double dormancy, from memory): first leaf after the second winter, given the spring after', () => {
    const trillium = { ...warmCold, slug: 'trillium-grandiflorum', scientificName: 'Trillium grandiflorum' };
    const c = cal(trillium, 'outdoor-pot-winter', { today: '2026-07-01' });
    expect(on(c, 'sprouts-expected')).toBe('2028-04-10');
    expect(on(c, 'plant-out')).toBe('2029-05-24');
  });
});

describe('readiness per species', () => {
  const pallida = makeSpecies({
    slug: 'echinacea-pallida',
    scientificName: 'Echinacea pallida',
    germination: { treatments: [{ kind: 'cold-moist', days: 60 }], needsLight: true, sowingDepthMm: 0 },
  });

  it('a slow species with a June share: pale purple coneflower needs a second season (NPN-ECPA R: ~2 years)', () => {
    const c = cal(pallida, 'indoor-lights', { today: '2026-10-01', targetDate: '2027-06-12' });
    expect(on(c, 'sow')).toBe('2027-03-15');
    expect(on(c, 'plant-out')).toBe('2028-05-24'); // next spring's frost watch end
    expect(c.warnings.find((w) => w.kind === 'target-too-early')).toMatchObject({ days: 347 }); // 2027-06-12 → 2028-05-24
    // ROM05 (R): Echinacea stratified in light beat stratification in darkness.
    expect(c.events.find((e) => e.kind === 'cms-start')!.detail).toContain('stratifies better in light');
  });

  it('warm-season grass and lupine in outdoor pots sprout in warm soil, ~2 weeks after the frost (M; JEH96 R 24–29 °C)', () => {
    for (const s of [F.littleBluestem, F.wildLupine]) {
      expect(on(cal(s, 'outdoor-pot-winter', { today: '2026-10-01' }), 'sprouts-expected')).toBe('2027-05-24');
    }
  });

  it('soil blocks: one week sooner than cells, with no transplant shock (common practice)', () => {
    // Sown 2027-04-20 (the grower's date), after the frost watch ends (2027-04-15): cells 7 d to sprout
    // + 7 weeks = 56 d → 2027-06-15; blocks 7 d sooner → 2027-06-08.
    const x = { today: '2026-10-01', lastFrost: '2027-04-01', sowDate: '2027-04-20' };
    const c = cal(F.foxgloveBeardtongue, 'soil-blocks', x);
    expect(on(cal(F.foxgloveBeardtongue, 'indoor-lights', x), 'plant-out')).toBe('2027-06-15');
    expect(on(c, 'plant-out')).toBe('2027-06-08');
    expect(c.events.find((e) => e.kind === 'pot-up')!.detail).toContain('no root disturbance');
  });
});

describe('a southern and a northern frost date (showy goldenrod, 60 d CMS)', () => {
  it('south, frost 2027-03-20: winter-sow 2026-12-06 so 60 d of cold fit before the containers warm', () => {
    // warm 2027-02-18 (− 30 d); − 60 d − 14 d margin = 2026-12-06, inside the Dec–Feb window (M).
    const c = cal(F.showyGoldenrod, 'winter-sowing', { today: '2026-10-01', lastFrost: '2027-03-20' });
    expect(on(c, 'sow')).toBe('2026-12-06');
    expect(on(c, 'plant-out')).toBe('2027-04-03'); // sprouts 02-18 + 42 d = 04-01 < watch end 04-03
  });

  it('north, frost 2027-05-31: plant out after the watch, 2027-06-14, two days after a June 12 share', () => {
    const c = cal(F.showyGoldenrod, 'indoor-lights', {
      today: '2026-10-01',
      lastFrost: '2027-05-31',
      targetDate: '2027-06-12',
    });
    expect(on(c, 'sow')).toBe('2027-04-05'); // frost − 8 weeks
    expect(on(c, 'cms-start')).toBe('2027-02-04'); // − 60 d
    expect(on(c, 'plant-out')).toBe('2027-06-14');
    expect(c.warnings.find((w) => w.kind === 'target-too-early')).toMatchObject({ days: 2 });
  });
});

describe('whole-calendar events', () => {
  it('frost watch, its end, the winter-sowing window end and the share with its reminders', () => {
    const c = buildSowingCalendar({
      lastFrost: '2027-05-10',
      today: '2026-10-01',
      targetDate: '2027-06-12',
      plans: [{ species: F.wildBergamot, method: 'winter-sowing' }],
    });
    const whole = Object.fromEntries(c.events.filter((e) => e.speciesSlug === null).map((e) => [e.kind, e.date]));
    expect(whole).toEqual({
      'frost-watch': '2027-05-10',
      'frost-watch-end': '2027-05-24',
      'winter-sowing-window': '2026-12-01',
      'winter-sowing-window-ends': '2027-02-28',
      'vent-containers': '2027-03-29',
      'collect-pots': '2027-05-29',
      'label-pots': '2027-06-09',
      'plant-share': '2027-06-12',
    });
  });

  it('too little cold with time to spare adds the refrigerator step as an event', () => {
    // 150 d CMS, winter-sown 2026-12-01: 130 d of cold to 2027-04-10, so 20 d in the refrigerator from 2026-11-11.
    const long = {
      ...F.showyGoldenrod,
      germination: { ...F.showyGoldenrod.germination, treatments: [{ kind: 'cold-moist' as const, days: 150 }] },
    };
    const c = cal(long, 'winter-sowing', { today: '2026-10-01' });
    expect(on(c, 'cms-start')).toBe('2026-11-11');
    expect(c.warnings.find((w) => w.kind === 'cold-too-short')!.message).toContain('from 2026-11-11 (on the calendar)');
  });
});
