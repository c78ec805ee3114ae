import { describe, expect, it } from 'vitest';
import { F } from '../scoring/__tests__/species-fixtures.js';
import type { SowingMethod, Species } from '../types/species.js';
import { daysBetween } from './calendar-date.js';
import type { SowingCalendar } from './calendar-types.js';
import { buildSowingCalendar } from './sowing-calendar.js';

const withCms = (days: number): Species => ({
  ...F.showyGoldenrod,
  germination: { ...F.showyGoldenrod.germination, treatments: [{ kind: 'cold-moist', days }] },
});
const cal = (
  species: Species,
  method: SowingMethod,
  extra: { lastFrost?: string; targetDate?: string; today?: string; sowDate?: string } = {},
) =>
  buildSowingCalendar({
    lastFrost: extra.lastFrost ?? '2027-05-10',
    targetDate: extra.targetDate,
    today: extra.today ?? '2026-10-01',
    plans: [{ species, method, sowDate: extra.sowDate }],
  });
const on = (c: SowingCalendar, kind: string) => c.events.find((e) => e.kind === kind && e.speciesSlug !== null)?.date;

// Worked by hand. Rules: indoor sowing 8 weeks before last frost (M, CHECK-VALUES §4);
// CMS start = sowing date − CMS days (IPN, D); hardening off 7–14 d before planting out (UF-HO R / M);
// plants go out after the 2-week frost watch that follows the average last frost (M, from memory).
describe('indoor sowing under lights', () => {
  const c = cal(withCms(60), 'indoor-lights');

  it.each([
    ['cms-start', '2027-01-14'], // 2027-03-15 − 60 d
    ['check-sprouts', '2027-02-11'], // CMS start + 28 d (IPN: start checking at 28–35 d, R)
    ['sow', '2027-03-15'], // 2027-05-10 − 8 weeks
    ['pot-up', '2027-04-12'],
    ['harden-off', '2027-05-14'], // plant-out − 10 d
    ['plant-out', '2027-05-24'], // 2027-05-10 + 14 d frost watch (sow + 7 d to sprout + 7 weeks = 2027-05-10 is earlier)
  ])('%s on %s', (kind, date) => {
    expect(on(c, kind)).toBe(date);
  });

  it('hardening off starts 7–14 days before planting out (M), in UF-HO steps (R)', () => {
    const days = daysBetween(on(c, 'harden-off')!, on(c, 'plant-out')!);
    expect(days).toBeGreaterThanOrEqual(7);
    expect(days).toBeLessThanOrEqual(14);
    expect(c.events.find((e) => e.kind === 'harden-off')!.detail).toContain(
      '1–2 hours on the first day and add about an hour each day',
    );
  });

  it('tells how to stratify (IPN R: 1 part seed to 2–3 parts damp sand or vermiculite; 1–5 °C, D)', () => {
    const d = c.events.find((e) => e.kind === 'cms-start')!.detail;
    expect(d).toContain('2–3 times its volume of damp sand or vermiculite');
    expect(d).toContain('damp paper towel');
    expect(d).toContain('1–5 °C (33–41 °F) for 60 days');
  });

  it('a frost reminder on the last frost date', () => {
    expect(c.events.find((e) => e.kind === 'frost-watch')).toMatchObject({ date: '2027-05-10', speciesSlug: null });
  });
});

describe('dates across year boundaries and leap days (Gregorian arithmetic, X)', () => {
  it('CMS for a mid-January sowing starts in November of the year before (60 d)', () => {
    expect(on(cal(withCms(60), 'indoor-lights', { sowDate: '2027-01-15' }), 'cms-start')).toBe('2026-11-16');
  });

  it('8 weeks before a 2028-04-25 frost is Feb 29 (leap year); in 2027 it is Feb 28', () => {
    expect(on(cal(withCms(30), 'indoor-lights', { lastFrost: '2028-04-25' }), 'sow')).toBe('2028-02-29');
    expect(on(cal(withCms(30), 'indoor-lights', { lastFrost: '2027-04-25' }), 'sow')).toBe('2027-02-28');
  });

  it('30 d CMS before a 2028-03-15 sowing starts 2028-02-14 (over Feb 29)', () => {
    expect(on(cal(withCms(30), 'indoor-lights', { sowDate: '2028-03-15' }), 'cms-start')).toBe('2028-02-14');
  });
});

describe("the species' own stratification length", () => {
  it('swamp milkweed fixture: its 30 d record (≥ 7 d minimum, NPN-ASIN R) sets the CMS start', () => {
    const c = cal(F.swampMilkweed, 'indoor-lights');
    const days = daysBetween(on(c, 'cms-start')!, on(c, 'sow')!);
    expect(days).toBe(30);
    expect(days).toBeGreaterThanOrEqual(7);
  });

  it('no CMS step (wild bergamot): no stratification events', () => {
    const c = cal(F.wildBergamot, 'indoor-lights');
    expect(on(c, 'cms-start')).toBeUndefined();
    const sow = c.events.find((e) => e.kind === 'sow')!.detail;
    expect(sow).toContain('Needs light to germinate');
    expect(sow).toContain('do not cover it');
  });

  it('scarify first, inoculate at sowing (wild lupine, JEH96)', () => {
    const sow = cal(F.wildLupine, 'indoor-lights').events.find((e) => e.kind === 'sow')!.detail;
    expect(sow).toMatch(/^Nick the seed coat\./);
    expect(sow).toContain('rhizobial inoculant');
  });

  it('a cold step with no length gets the 60 d default (IPN R) and says so', () => {
    const s = {
      ...F.showyGoldenrod,
      germination: { ...F.showyGoldenrod.germination, treatments: [{ kind: 'cold-moist' as const }] },
    };
    const c = cal(s, 'indoor-lights');
    expect(daysBetween(on(c, 'cms-start')!, on(c, 'sow')!)).toBe(60);
    expect(c.events.find((e) => e.kind === 'cms-start')!.detail).toContain('The record gives no length');
  });
});

describe('warnings', () => {
  it('a plant share before plants can be ready, with the day count', () => {
    const c = cal(withCms(60), 'indoor-lights', { targetDate: '2027-05-10' });
    expect(c.warnings).toContainEqual(expect.objectContaining({ kind: 'target-too-early', days: 14 }));
    expect(c.warnings[0].message).toContain('ready about 2027-05-24, 14 days later');
  });

  it('no warning when the plant share is after the ready date (second Saturday of June)', () => {
    expect(cal(withCms(60), 'indoor-lights', { targetDate: '2027-06-12' }).warnings).toEqual([]);
  });

  it('a sowing date the grower chose, with a step already past: the days, and no made-up knock-on date', () => {
    const c = cal(withCms(60), 'indoor-lights', { today: '2027-02-03', sowDate: '2027-03-15' });
    const w = c.warnings.find((x) => x.kind === 'start-in-past')!;
    expect(w.days).toBe(20); // CMS start 2027-01-14 → 2027-02-03
    expect(w.message).toContain('leave the sowing date empty');
  });

  it('a method the record does not list', () => {
    const s = { ...F.wildLupine, germination: { ...F.wildLupine.germination, methods: ['direct-seed' as const] } };
    expect(cal(s, 'soil-blocks').warnings.map((w) => w.kind)).toContain('method-unusual');
  });
});

describe('winter sowing, outdoor pots and direct seeding', () => {
  it('winter sowing: mid-January by default, inside the Dec–Feb window (M), no fridge step', () => {
    const c = cal(withCms(60), 'winter-sowing');
    expect(on(c, 'sow')).toBe('2027-01-15');
    expect(on(c, 'cms-start')).toBeUndefined();
    expect(c.events.find((e) => e.kind === 'winter-sowing-window')!.date).toBe('2026-12-01');
    expect(on(c, 'sprouts-expected')).toBe('2027-04-10'); // containers warm ~30 d before frost (M)
  });

  it('winter sowing moves earlier for a long cold need (90 d) and warns when winter is too short', () => {
    expect(on(cal(withCms(90), 'winter-sowing'), 'sow')).toBe('2026-12-27'); // 2027-04-10 − 90 − 14
    const c = cal(withCms(150), 'winter-sowing');
    expect(on(c, 'sow')).toBe('2026-12-01');
    expect(c.warnings).toContainEqual(expect.objectContaining({ kind: 'cold-too-short', days: 20 }));
  });

  it('outdoor pots are sown in late November (IPN R) of the year before', () => {
    expect(on(cal(withCms(60), 'outdoor-pot-winter'), 'sow')).toBe('2026-11-20');
  });

  it('direct seeding: dormant seeding for cold-needing seed, warm soil for the rest; no pots for a share', () => {
    expect(on(cal(withCms(60), 'direct-seed'), 'sow')).toBe('2026-11-20');
    expect(on(cal(F.wildBergamot, 'direct-seed'), 'sow')).toBe('2027-05-24');
    const spring = cal(withCms(60), 'direct-seed', { sowDate: '2027-04-20' });
    expect(on(spring, 'cms-start')).toBe('2027-02-19');
    expect(cal(F.wildBergamot, 'direct-seed', { targetDate: '2027-06-12' }).warnings.map((w) => w.kind)).toEqual([
      'not-for-share',
    ]);
  });
});

describe('determinism', () => {
  it('same input → same calendar; events in date order', () => {
    const input = {
      lastFrost: '2027-05-10',
      today: '2026-10-01',
      plans: [
        { species: F.swampMilkweed, method: 'indoor-lights' as const },
        { species: F.goldenAlexanders, method: 'winter-sowing' as const },
        { species: F.wildLupine, method: 'direct-seed' as const },
      ],
    };
    const a = buildSowingCalendar(input);
    expect(buildSowingCalendar(input)).toEqual(a);
    const dates = a.events.map((e) => e.date);
    expect([...dates].sort()).toEqual(dates);
  });
});
