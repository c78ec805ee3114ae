import { describe, expect, it } from 'vitest';
import { sowingCalendarRequestSchema } from './calendar-types.js';

describe('sowingCalendarRequestSchema', () => {
  const ok = {
    lastFrost: '2027-05-10',
    today: '2026-10-01',
    plans: [{ slug: 'zizia-aurea', method: 'winter-sowing' }],
  };

  it('accepts a request', () => {
    expect(sowingCalendarRequestSchema.parse({ ...ok, targetDate: '2027-06-12' }).targetDate).toBe('2027-06-12');
  });

  it.each([
    ['an impossible date', { lastFrost: '2027-02-29' }, 'lastFrost'],
    ['a date with a time', { today: '2026-10-01T00:00:00Z' }, 'today'],
    ['an unknown method', { plans: [{ slug: 'zizia-aurea', method: 'hydroponics' }] }, 'plans'],
    ['no plans', { plans: [] }, 'plans'],
    ['a year past 2200 (iCalendar and CSV writers need a sane year)', { lastFrost: '9999-05-10' }, 'lastFrost'],
    ['a year before 1900', { today: '1899-12-31' }, 'today'],
    ['an unknown field', { colour: 'red' }, ''],
  ])('rejects %s, naming the field', (_what, change, field) => {
    const r = sowingCalendarRequestSchema.safeParse({ ...ok, ...change });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => String(i.path[0] ?? ''))).toContain(field);
  });
});
