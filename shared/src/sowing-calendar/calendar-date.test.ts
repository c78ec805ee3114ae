import { describe, expect, it } from 'vitest';
import { addDays, daysBetween, endOfFebruary, isIsoDate, toDayNumber } from './calendar-date.js';

// Gregorian calendar arithmetic (X): worked by hand.
describe('calendar dates (UTC day numbers, no time zones)', () => {
  it.each([
    ['2027-05-10', -56, '2027-03-15'],
    ['2027-03-15', -60, '2027-01-14'],
    ['2027-01-15', -60, '2026-11-16'],
    ['2028-04-25', -56, '2028-02-29'],
    ['2027-04-25', -56, '2027-02-28'],
    ['2026-12-31', 1, '2027-01-01'],
    ['2028-02-28', 1, '2028-02-29'],
    ['2100-02-28', 1, '2100-03-01'],
  ])('%s %+d days = %s', (from, days, to) => {
    expect(addDays(from, days)).toBe(to);
    expect(daysBetween(from, to)).toBe(days);
  });

  it.each(['2027-02-29', '2027-13-01', '2027-5-10', 'May 10', '2027-04-31'])('rejects %s', (bad) => {
    expect(isIsoDate(bad)).toBe(false);
    expect(() => toDayNumber(bad)).toThrow(RangeError);
  });

  it('knows leap Februaries', () => {
    expect(endOfFebruary(2028)).toBe('2028-02-29');
    expect(endOfFebruary(2027)).toBe('2027-02-28');
    expect(endOfFebruary(2000)).toBe('2000-02-29');
  });
});
