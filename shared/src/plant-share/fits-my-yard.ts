import type { ScoredSpecies } from '../types/recommendation.js';
import type { RegionContext, Site } from '../types/site.js';
import type { Moisture, Species, Sun } from '../types/species.js';
import { compareScored, scoreSpecies } from '../scoring/score-species.js';
import type { ShareSpeciesFit, YardFit } from './answers.js';

/** The parts of "why it fits" that are about the yard (the share's species are all local already). */
const YARD_PARTS: ReadonlySet<string> = new Set([
  'sun',
  'moisture',
  'thrives',
  'community',
  'wetland-class',
  'acid-soil',
]);

const FIT_ORDER: Record<YardFit, number> = { thrives: 0, grows: 1, 'near-miss': 2, 'not-for-this-yard': 3 };

/**
 * "Fits my yard": ranks the species on offer for a taker's sun and moisture with the engine's own
 * site fit (scoreSpecies), and says why in words. The yard is taken as a roomy bed that allows shrubs
 * and spreaders, so only sun and moisture decide; the answer is a fit word and a rank, never a score.
 */
export function rankForYard(
  species: readonly Species[],
  yard: { sun: Sun; moisture: Moisture },
  region: RegionContext,
): Map<string, ShareSpeciesFit> {
  const site: Site = {
    sun: yard.sun,
    moisture: yard.moisture,
    areaSqFt: 1000,
    deerPressure: 'low',
    goals: [],
    woodyPlants: true,
    spreaders: true,
  };
  const scored = species.map((s) => {
    const r = scoreSpecies(s, site, region);
    return { r, fit: fitOf(r) };
  });
  scored.sort((a, b) => FIT_ORDER[a.fit] - FIT_ORDER[b.fit] || compareScored(a.r, b.r));
  return new Map(scored.map(({ r, fit }, i) => [r.slug, { fit, rank: i + 1, why: whyOf(r) }] as const));
}

function fitOf(r: ScoredSpecies): YardFit {
  if (r.eligible) return r.parts.some((p) => p.name === 'thrives') ? 'thrives' : 'grows';
  return r.nearMiss ? 'near-miss' : 'not-for-this-yard';
}

function whyOf(r: ScoredSpecies): string[] {
  const why = r.parts.filter((p) => YARD_PARTS.has(p.name)).map((p) => p.reason);
  if (!r.eligible && r.ineligibleReason) why.unshift(r.ineligibleReason);
  return [...new Set(why)];
}
