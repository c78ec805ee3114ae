import type { Species } from '../types/species.js';
import { cmToInches, roundTo } from '../units/conversions.js';
import { DURATIONS } from './durations.js';
import type { Stratification } from './treatments.js';

/** The words on calendar events, in one place so they read alike. */

export function nameOf(species: Species): string {
  const n = species.commonNames[0];
  return n.charAt(0).toUpperCase() + n.slice(1);
}

/** CMS medium and temperature (IPN R: 1 part seed to 2–3 parts damp sand or vermiculite; 1–5 °C, D). */
export function cmsDetail(days: number, s: Stratification): string {
  const assumed = s.coldDaysAssumed
    ? ` The record gives no length; ${DURATIONS.defaultColdMoistDays} days suits many prairie species.`
    : '';
  const own = s.coldNote ? ` ${s.coldNote}` : '';
  return (
    'Mix the seed with 2–3 times its volume of damp sand or vermiculite (damp, not dripping when squeezed), ' +
    'or fold it in a damp paper towel. Seal it in a labelled bag and keep it in the refrigerator at ' +
    `1–5 °C (33–41 °F) for ${days} days.${assumed}${own}`
  );
}

export function checkSproutsDetail(): string {
  return 'Look every few days from now on, and sow at once any seed that has sprouted.';
}

export function sowingDepthWords(species: Species): string {
  const g = species.germination;
  if (g.needsLight || g.sowingDepthMm === 0) return 'Press the seed onto the surface and do not cover it: it needs light to germinate.';
  const inches = roundTo(cmToInches(g.sowingDepthMm / 10), 2);
  return `Cover it ${g.sowingDepthMm} mm (${inches} in) deep.`;
}

/** UF-HO (R): begin 1–2 h a day in shade, add about 1 h a day, then full sun; 7–14 days in all (M). */
export function hardenOffDetail(): string {
  return (
    'Set the plants outside in shade for 1–2 hours on the first day and add about an hour each day, ' +
    `then move them into sun. Bring them in if frost threatens. Plan on ${DURATIONS.hardenOffDays} days (7–14 is usual).`
  );
}

export function frostWatchDetail(): string {
  return (
    'This is the average date: about half of years still bring a later frost. For two weeks, keep frost cloth or ' +
    'old sheets handy and cover young plants on clear, still nights when frost is forecast.'
  );
}

export function winterSowingDetail(): string {
  return (
    'Winter sowing: sow in covered containers (lidded trays or milk jugs with drainage holes and air holes), ' +
    'set outside in sun, snow and rain. Winter gives the seed its cold-moist stratification.'
  );
}

export function ventDetail(): string {
  return 'Open covered containers on warm days (highs around 70–75 °F / 21–24 °C) and close them again before a frost.';
}
