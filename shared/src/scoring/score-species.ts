import type { Recommendation, ScorePart, ScoredSpecies } from '../types/recommendation.js';
import type { RegionContext, Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { roundTo } from '../units/conversions.js';
import { bloomGapPart, habitatPart } from './context-parts.js';
import { deerPart, rainGardenPart, shadeGardenPart, soilPart, spreadPart } from './garden-parts.js';
import { checkHeight, checkMoisture, checkNative, checkRoom, checkSun, type CheckResult } from './hard-checks.js';
import { birdsPart, hostPlantPart, monarchPart, pollinatorPart } from './wildlife-parts.js';

export interface ScoringContext {
  /** The mix chosen so far: species that bloom when it has least score higher. */
  currentMix?: readonly Species[];
}

/**
 * Scores one species for a site, with "why it fits" in words. A species not native to the state,
 * or on the wrong sun, moisture, height or size for the bed, is not eligible; when it misses by one step only
 * (see hard-checks) it is a near miss the caller may show as "also consider".
 */
export function scoreSpecies(species: Species, site: Site, region: RegionContext, context: ScoringContext = {}): ScoredSpecies {
  const checks: CheckResult[] = [
    checkNative(species, region),
    checkSun(species, site),
    checkMoisture(species, site),
    checkHeight(species, site),
    checkRoom(species, site),
  ];
  const parts: ScorePart[] = [];
  const failures: { failure: string; nearMiss: boolean }[] = [];
  for (const c of checks) {
    if (c === null) continue;
    if ('part' in c) parts.push(c.part);
    else failures.push(c);
  }
  const soft = [
    soilPart(species, site),
    habitatPart(species, region),
    hostPlantPart(species),
    monarchPart(species, site),
    pollinatorPart(species, site),
    birdsPart(species, site),
    bloomGapPart(species, context.currentMix),
    deerPart(species, site),
    spreadPart(species, site),
    rainGardenPart(species, site),
    shadeGardenPart(species, site),
  ];
  for (const p of soft) if (p) parts.push(p);

  const score = roundTo(parts.reduce((sum, p) => sum + p.points, 0), 2);
  const eligible = failures.length === 0;
  return {
    slug: species.slug,
    score,
    parts,
    eligible,
    ...(eligible ? {} : { ineligibleReason: failures.map((f) => f.failure).join(' ') }),
    // Only a single one-step miss is worth suggesting; two misses is the wrong plant for the spot.
    nearMiss: failures.length === 1 && failures[0].nearMiss,
  };
}

/** Score descending, then slug: the same input always gives the same order. */
export function compareScored(a: ScoredSpecies, b: ScoredSpecies): number {
  return b.score - a.score || (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0);
}

/** Ranks a species list for a site: eligible species, and near misses to "also consider". */
export function recommend(speciesList: readonly Species[], site: Site, region: RegionContext, context: ScoringContext = {}): Recommendation {
  const scored = speciesList.map((s) => scoreSpecies(s, site, region, context));
  return {
    ranked: scored.filter((s) => s.eligible).sort(compareScored),
    alsoConsider: scored.filter((s) => !s.eligible && s.nearMiss).sort(compareScored),
  };
}
