/**
 * Date-only arithmetic on ISO calendar dates ("2027-05-10"). Dates become whole day numbers
 * counted from 1970-01-01 in UTC, so there are no time zones or daylight-saving jumps; Date.UTC is
 * used only as a pure calendar function, never to read the clock.
 */
export type IsoDate = string;

const ISO = /^(\d{4})-(\d{2})-(\d{2})$/;
const MS_PER_DAY = 86_400_000;

/** Day number of an ISO date; throws on malformed or impossible dates such as 2027-02-29. */
export function toDayNumber(iso: IsoDate): number {
  const m = ISO.exec(iso);
  if (!m) throw new RangeError(`not an ISO date (YYYY-MM-DD): ${iso}`);
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const ms = Date.UTC(y, mo - 1, d);
  const back = new Date(ms);
  if (back.getUTCFullYear() !== y || back.getUTCMonth() !== mo - 1 || back.getUTCDate() !== d) {
    throw new RangeError(`no such date: ${iso}`);
  }
  return ms / MS_PER_DAY;
}

export function fromDayNumber(day: number): IsoDate {
  return new Date(day * MS_PER_DAY).toISOString().slice(0, 10);
}

export function isIsoDate(value: string): boolean {
  try {
    toDayNumber(value);
    return true;
  } catch {
    return false;
  }
}

export function addDays(iso: IsoDate, days: number): IsoDate {
  return fromDayNumber(toDayNumber(iso) + days);
}

/** Days from `from` to `to` (positive when `to` is later). */
export function daysBetween(from: IsoDate, to: IsoDate): number {
  return toDayNumber(to) - toDayNumber(from);
}

export function yearOf(iso: IsoDate): number {
  return Number(iso.slice(0, 4));
}

export function isoDate(year: number, month: number, day: number): IsoDate {
  return fromDayNumber(Date.UTC(year, month - 1, day) / MS_PER_DAY);
}

/** The last day of February in a year (29 in leap years). */
export function endOfFebruary(year: number): IsoDate {
  return addDays(isoDate(year, 3, 1), -1);
}

export const earlier = (a: IsoDate, b: IsoDate): IsoDate => (a <= b ? a : b);
export const later = (a: IsoDate, b: IsoDate): IsoDate => (a >= b ? a : b);
