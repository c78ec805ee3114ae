import { joinWords } from './join-words.js';

/** A calendar month as the catalogue stores it: 1 = January … 12 = December. */
export type MonthNumber = 1 | 2 | 3 | 4 | 5 | 6 | 7 | 8 | 9 | 10 | 11 | 12;

export const MONTH_NUMBERS: readonly MonthNumber[] = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12];

export interface MonthWords {
  /** As people write it on seed packets and calendars: "Sep". */
  short: string;
  long: string;
  /** One letter, printed under a bloom strip. */
  initial: string;
}

export const MONTH_WORDS = {
  1: { short: 'Jan', long: 'January', initial: 'J' },
  2: { short: 'Feb', long: 'February', initial: 'F' },
  3: { short: 'Mar', long: 'March', initial: 'M' },
  4: { short: 'Apr', long: 'April', initial: 'A' },
  5: { short: 'May', long: 'May', initial: 'M' },
  6: { short: 'Jun', long: 'June', initial: 'J' },
  7: { short: 'Jul', long: 'July', initial: 'J' },
  8: { short: 'Aug', long: 'August', initial: 'A' },
  9: { short: 'Sep', long: 'September', initial: 'S' },
  10: { short: 'Oct', long: 'October', initial: 'O' },
  11: { short: 'Nov', long: 'November', initial: 'N' },
  12: { short: 'Dec', long: 'December', initial: 'D' },
} as const satisfies Record<MonthNumber, MonthWords>;

/** 9 → "Sep". */
export function monthShort(month: number): string {
  return MONTH_WORDS[month as MonthNumber].short;
}

/** 9 → "September". */
export function monthLong(month: number): string {
  return MONTH_WORDS[month as MonthNumber].long;
}

/** Kept under its old name: scoring reasons call it. */
export const monthName = monthShort;

/**
 * Runs of consecutive months (1–12), each as [first, last]. December runs on into January, so a
 * winter bloomer ([11, 12, 1, 2]) is one run, Nov–Feb, not two. Runs are in order of their start.
 */
export function monthRuns(months: readonly number[]): [number, number][] {
  const sorted = [...new Set(months)].filter((m) => m >= 1 && m <= 12).sort((a, b) => a - b);
  if (sorted.length === 0) return [];
  if (sorted.length === 12) return [[1, 12]];
  const runs: [number, number][] = [];
  for (const m of sorted) {
    const last = runs[runs.length - 1];
    if (last && m === last[1] + 1) last[1] = m;
    else runs.push([m, m]);
  }
  if (runs.length > 1 && runs[0][0] === 1 && runs[runs.length - 1][1] === 12) {
    const first = runs.shift()!;
    runs[runs.length - 1][1] = first[1];
  }
  return runs.sort((a, b) => a[0] - b[0]);
}

/**
 * Months as a phrase: [8, 9, 10] → "Aug–Oct"; [4, 5, 9] → "Apr–May and Sep"; [11, 12, 1] →
 * "Nov–Jan"; all twelve → "all year"; none → "".
 */
export function formatMonths(months: readonly number[]): string {
  const runs = monthRuns(months);
  if (runs.length === 1 && runs[0][0] === 1 && runs[0][1] === 12) return 'all year';
  return joinWords(runs.map(([a, b]) => (a === b ? monthShort(a) : `${monthShort(a)}–${monthShort(b)}`)));
}

/** "Blooms Jun–Aug", "Blooms all year", or "No bloom months recorded": cards, strips and pages alike. */
export function bloomWords(bloomMonths: readonly number[]): string {
  const range = formatMonths(bloomMonths);
  return range === '' ? 'No bloom months recorded' : `Blooms ${range}`;
}
