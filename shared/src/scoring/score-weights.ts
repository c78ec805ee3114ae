/**
 * Points for each part of "why it fits". These are Homeground's own weights, chosen so that the
 * ground itself (sun, moisture) matters most, wildlife value next, and garden manners (deer, spread,
 * height) nudge the order. They only rank species for one site; they are not a published scale.
 */
export const POINTS = {
  /** In range: it grows here. How well it thrives is graded apart (site-fit-parts.ts). */
  sunMatch: 1,
  moistureMatch: 1,
  soilMatch: 1,
  soilMismatch: -1,
  habitatMatch: 2,
  /** Host value = hostPerLog10 × log10(1 + genus caterpillar species), capped: 115 species → 4.1. */
  hostPerLog10: 2,
  hostCap: 5,
  /** Extra when birds are a goal and the genus hosts many caterpillars (nestlings eat caterpillars). */
  birdsHostBonus: 1,
  birdsFoodOrShelter: 1,
  monarchHost: 4,
  pollinatorFlowers: 1,
  bloomGapMost: 2,
  bloomGapSome: 1,
  heightWithin: 1,
  heightPartlyOver: -1,
  crowds: -2,
  deerHighPressure: { high: 2, medium: 0, low: -2 },
  deerMediumPressure: { high: 1, medium: 0, low: -1 },
  lowSpreaders: { clumping: 1, spreading: -1, aggressive: -3 },
  /** Without the low-spreaders goal an aggressive spreader still gets a small warning. */
  aggressiveAnyway: -1,
  rainGardenTagged: 2,
  rainGardenWetAndDry: 1,
  shadeGarden: 2,
} as const;

/** Room rule: over crowdsShare of the bed costs points; a footprint up to nearMissFactor × the bed is a near miss. */
export const ROOM = { crowdsShare: 0.25, nearMissFactor: 2 } as const;

/** A one-step miss this much over the height limit still counts as "also consider". */
export const HEIGHT_NEAR_MISS_FACTOR = 1.25;

/** Genus host counts at or above this earn the birds bonus (Solidago, Symphyotrichum, oaks…). */
export const BIRDS_HOST_THRESHOLD = 20;
