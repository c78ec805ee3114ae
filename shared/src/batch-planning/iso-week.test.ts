import { describe, expect, it } from 'vitest';
import { isoWeek } from './iso-week.js';

// Expected weeks from Python's datetime.date.isocalendar() (the ISO 8601 rule as the standard
// library implements it), run outside this project.
describe('isoWeek', () => {
  it.each([
    ['2027-01-01', '2026-W53'], // a Friday: the last week of 2026, which has 53 weeks
    ['2026-12-31', '2026-W53'],
    ['2024-12-30', '2025-W01'], // a Monday in December opening the next year's first week
    ['2021-01-03', '2020-W53'],
    ['2027-03-15', '2027-W11'],
    ['2026-12-03', '2026-W49'],
  ])('%s is in %s', (day, week) => {
    expect(isoWeek(day)).toBe(week);
  });
});
