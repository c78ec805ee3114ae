import type { StateCode } from '../types/species.js';
import { STATE_NAMES } from './state-names.js';

/**
 * Small phrase helpers so every reason reads the same way (DESIGN.md voice). Words for the
 * catalogue's codes (sun, moisture, months …) live in `../vocabulary/`.
 */

export function stateName(code: StateCode): string {
  return STATE_NAMES[code];
}

/** Counts with their noun: 1 → "1 late bloomer", 3 → "3 late bloomers". */
export function countOf(n: number, singular: string, plural = `${singular}s`): string {
  return `${n} ${n === 1 ? singular : plural}`;
}
