import type { IsoDate } from '../sowing-calendar/calendar-date.js';

/**
 * The ISO 8601 week of a calendar day, as "2027-W11": weeks start on Monday and week 1 is the one
 * with the year's first Thursday, so 1–3 January can belong to the previous year's last week. The
 * weekly summary is sent once per such week.
 */
export function isoWeek(day: IsoDate): string {
  const d = new Date(`${day}T00:00:00Z`);
  const weekday = d.getUTCDay() || 7; // Monday 1 … Sunday 7
  // The Thursday of the same week decides the week's year.
  const thursday = new Date(d);
  thursday.setUTCDate(d.getUTCDate() + 4 - weekday);
  const year = thursday.getUTCFullYear();
  const firstOfYear = Date.UTC(year, 0, 1);
  const week = Math.floor((thursday.getTime() - firstOfYear) / 86_400_000 / 7) + 1;
  return `${year}-W${String(week).padStart(2, '0')}`;
}
