import { sowingDepthSentence } from '../vocabulary/sowing-depth.js';
import type { Species } from '../types/species.js';
import { DURATIONS } from './durations.js';
import type { Stratification } from './treatments.js';

/** The words on calendar events, in one place so they read alike. */

export function nameOf(species: Species): string {
  const n = species.commonNames[0];
  return n.charAt(0).toUpperCase() + n.slice(1);
}

/** CMS medium and temperature (IPN R: 1 part seed to 2–3 parts damp sand or vermiculite; 1–5 °C, D). */
export function cmsDetail(days: number, s: Stratification, inLight = false): string {
  // ROM05 (R): Echinacea stratified under 16–24 h of light beat stratification in darkness.
  const light = inLight
    ? ' This seed stratifies better in light: use a clear bag or lidded tray and keep it where light reaches it ' +
      '(under a lamp in a cold room or a refrigerator that stays lit), not in the dark.'
    : '';
  const assumed = s.coldDaysAssumed
    ? ` The record gives no length; ${DURATIONS.defaultColdMoistDays} days suits many prairie species.`
    : '';
  const own = s.coldNote ? ` ${s.coldNote}` : '';
  return (
    'Mix the seed with 2–3 times its volume of damp sand or vermiculite (damp, not dripping when squeezed), ' +
    'or fold it in a damp paper towel. Seal it in a labelled bag and keep it in the refrigerator at ' +
    `1–5 °C (33–41 °F) for ${days} days.${assumed}${own}${light}`
  );
}

export function checkSproutsDetail(): string {
  return 'Look every few days from now on, and sow at once any seed that has sprouted.';
}

/** Where the seed goes, in the vocabulary's one wording (also on fact cards and species pages). */
export function sowingDepthWords(species: Species): string {
  return sowingDepthSentence(species.germination);
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
    'old sheets handy and cover young plants on clear, still nights when frost is forecast. Plants go out when the watch ends.'
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

export function frostWatchEndDetail(): string {
  return 'Two weeks past the average last frost, a late frost is much less likely: plants hardened off can go out now.';
}

export function winterSowingEndsDetail(): string {
  return 'Seed sown outdoors from now on gets too little winter cold. For seed that needs cold, stratify it in the refrigerator and sow under lights instead.';
}

export function outdoorPotsDetail(): string {
  return 'Sow in pots of damp mix and set them outside for the winter, on the ground against a wall, under mesh against mice and squirrels.';
}

/** Outdoors, warm-moist days come from late summer and autumn, not from winter (they are not cold days). */
export function warmThenColdDetail(
  warmDays: number,
  coldDays: number,
  firstSpring: boolean,
  doubleDormancy: boolean,
): string {
  const when = firstSpring
    ? 'Sown now, the late-summer warmth gives the warm step and the winter the cold: seedlings the first spring.'
    : doubleDormancy
      ? 'It makes a root after the first winter and its first leaf only after the second: expect nothing to show for over a year.'
      : 'Sown this late, the warm step comes next summer and the cold the winter after: seedlings the second spring.';
  return `This seed needs ${warmDays} warm, moist days and then ${coldDays} cold, moist days. ${when} Keep the pots damp and labelled the whole time.`;
}

export function warmSoilDetail(why: string): string {
  return `Expect it late: ${why}.`;
}

export function secondSeasonDetail(why: string, ready: string): string {
  return `${why}. Keep it potted on through summer and winter (sink the pots in the ground or mulch them); it is ready to give about ${ready}.`;
}

export function readyDetail(secondSeason: boolean, grownOutdoors: boolean): string {
  const how = grownOutdoors ? 'Grown outdoors, so already hardened' : 'Hardened off';
  const age = secondSeason ? ' and in its second spring' : '';
  return `${how}${age}, with roots holding the pot together: plant out, or hand over at the plant share.`;
}

export function potOnDetail(share: string): string {
  return (
    `Ready before the share on ${share}: hold the plants outdoors in light shade and water often. If roots circle the bottom, ` +
    'move them into a pot one size up. Dampen dry potting mix before you handle it, and work outdoors or wear a dust mask.'
  );
}

export function collectPotsDetail(): string {
  return 'Gather pots, trays and boxes for carrying plants to the share; ask members to bring back clean pots.';
}

export function labelPotsDetail(): string {
  return 'Label every pot with its common and scientific name and any caution (toxic sap or seeds); print pot labels from Homeground.';
}

export function plantShareDetail(): string {
  return 'Plant share day: bring the plants, the labels and the reservation list.';
}
