import type { StateCode } from '../types/species.js';
import { STATE_NAMES } from './state-names.js';

/**
 * Small phrase helpers so every reason reads the same way (DESIGN.md voice). Words for the
 * catalogue's codes (sun, moisture, months …) live in `../vocabulary/`.
 */

export function stateName(code: StateCode): string {
  return STATE_NAMES[code];
}

/**
 * The state's name as it starts an entry in a list: "the District of Columbia" reads well in a
 * sentence, but a list shows and sorts it as "District of Columbia", under D.
 */
export function stateListName(code: StateCode): string {
  return STATE_NAMES[code].replace(/^the /, '').replace(/^./, (c) => c.toUpperCase());
}

/** Codes in alphabetical order of their list names (DC between Delaware and Florida). */
export function byStateListName(codes: readonly StateCode[]): StateCode[] {
  return [...codes].sort((a, b) => stateListName(a).localeCompare(stateListName(b), 'en-US'));
}

/** Counts with their noun: 1 → "1 late bloomer", 3 → "3 late bloomers". */
export function countOf(n: number, singular: string, plural = `${singular}s`): string {
  return `${n} ${n === 1 ? singular : plural}`;
}
