import type { Moisture, StateCode, Sun } from '../types/species.js';
import { STATE_NAMES } from './state-names.js';

/** Small phrase helpers so every reason reads the same way (DESIGN.md voice). */

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

export function monthName(month: number): string {
  return MONTHS[month - 1];
}

/** [8, 9, 10] → "Aug–Oct"; [4, 5, 9] → "Apr–May and Sep". Runs of months join with a dash. */
export function formatMonths(months: readonly number[]): string {
  const sorted = [...new Set(months)].sort((a, b) => a - b);
  const runs: string[] = [];
  let start = 0;
  for (let i = 1; i <= sorted.length; i++) {
    if (i < sorted.length && sorted[i] === sorted[i - 1] + 1) continue;
    const first = sorted[start];
    const last = sorted[i - 1];
    runs.push(first === last ? monthName(first) : `${monthName(first)}–${monthName(last)}`);
    start = i;
  }
  return joinWords(runs);
}

/** ["a", "b", "c"] → "a, b and c" (or "a, b or c"). */
export function joinWords(words: readonly string[], conjunction: 'and' | 'or' = 'and'): string {
  if (words.length <= 1) return words.join('');
  return `${words.slice(0, -1).join(', ')} ${conjunction} ${words[words.length - 1]}`;
}

export const SUN_WORDS: Record<Sun, string> = { full: 'full sun', part: 'part shade', shade: 'shade' };
export const MOISTURE_WORDS: Record<Moisture, string> = { dry: 'dry', medium: 'medium-moist', wet: 'wet' };

/** "dry shade", "wet part shade", "medium-moist full sun": how a grower names a spot. */
export function describeGround(sun: Sun, moisture: Moisture): string {
  return `${MOISTURE_WORDS[moisture]} ${SUN_WORDS[sun]}`;
}

export function stateName(code: StateCode): string {
  return STATE_NAMES[code];
}

/** Counts with their noun: 1 → "1 late bloomer", 3 → "3 late bloomers". */
export function countOf(n: number, singular: string, plural = `${singular}s`): string {
  return `${n} ${n === 1 ? singular : plural}`;
}
