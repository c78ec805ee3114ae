import type { Recommendation, ScorePart, ScoredSpecies } from '../types/recommendation.js';
import type { RegionContext, Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { roundTo } from '../units/conversions.js';
import { bloomGapPart, habitatPart } from './context-parts.js';
import { deerPart, rainGardenPart, shadeGardenPart, soilPart, spreadPart } from './garden-parts.js';
import { hardCheckOutcome } from './hard-check-outcome.js';
import { catalogueCoverage } from './coverage.js';
import { checkHeight, checkMoisture, checkNative, checkRoom, checkSun, type CheckResult } from './hard-checks.js';
import { birdsPart, monarchPart, pollinatorPart } from './wildlife-parts.js';
import { availabilityPart, beesPart, layeredHostPart, scalePart, seedEasePart } from './practice-parts.js';
import { checkEcoregion, checkLayer, checkLifespan, checkSpreader } from './practice-checks.js';
import { acidSoilPart, communityPart, fernPart, regionalPart, thrivesPart, wetlandPart } from './site-fit-parts.js';

export interface ScoringContext {
  /** The mix chosen so far: species that bloom when it has least score higher. */
  currentMix?: readonly Species[];
}

/**
 * Scores one species for a site, with "why it fits" in words. A species not native to the state,
 * or on the wrong sun, moisture, height or size for the bed, is not eligible; when it misses by one step only
 * (see hard-checks) it is a near miss the caller may show as "also consider".
 */
export function scoreSpecies(
  species: Species,
  site: Site,
  region: RegionContext,
  context: ScoringContext = {},
): ScoredSpecies {
  // Parts and failures are collected in place, without closures or intermediate arrays: this runs
  // once per catalogue species on every request, and garbage was most of its cost at 30,000.
  const parts: ScorePart[] = [];
  const verdict: Verdict = { failure: undefined, failures: 0, nearMiss: false };
  takeCheck(checkNative(species, region), parts, verdict);
  takeCheck(checkSun(species, site), parts, verdict);
  takeCheck(checkMoisture(species, site), parts, verdict);
  takeCheck(checkHeight(species, site), parts, verdict);
  takeCheck(checkRoom(species, site), parts, verdict);
  takeCheck(checkEcoregion(species, region), parts, verdict);
  takeCheck(checkLayer(species, site), parts, verdict);
  takeCheck(checkLifespan(species), parts, verdict);
  takeCheck(checkSpreader(species, site), parts, verdict);
  addPart(thrivesPart(species, site), parts);
  addPart(communityPart(species, site), parts);
  addPart(wetlandPart(species, site), parts);
  addPart(acidSoilPart(species), parts);
  addPart(fernPart(species, site), parts);
  addPart(soilPart(species, site), parts);
  addPart(habitatPart(species, region), parts);
  addPart(regionalPart(species, region), parts);
  addPart(layeredHostPart(species), parts);
  addPart(beesPart(species, site), parts);
  addPart(availabilityPart(species), parts);
  addPart(seedEasePart(species), parts);
  addPart(scalePart(species, site), parts);
  addPart(monarchPart(species, site), parts);
  addPart(pollinatorPart(species, site), parts);
  addPart(birdsPart(species, site), parts);
  addPart(bloomGapPart(species, context.currentMix), parts);
  addPart(deerPart(species, site), parts);
  addPart(spreadPart(species, site), parts);
  addPart(rainGardenPart(species, site), parts);
  addPart(shadeGardenPart(species, site), parts);

  let sum = 0;
  let tie = 0;
  for (const p of parts) {
    sum += p.points;
    // Ties go to the plant that thrives here, then to the one with more wildlife value in its layer.
    if (p.name === 'thrives' || p.name === 'community' || p.name === 'wetland-class') tie += 10 * p.points;
    else if (p.name === 'host-plant' || p.name === 'bees' || p.name === 'monarch-host') tie += p.points;
  }
  const score = roundTo(sum, 2);
  const tieBreak = roundTo(tie, 2);
  const slug = species.slug;
  if (verdict.failure === undefined) return { slug, score, parts, eligible: true, nearMiss: false, tieBreak };
  // Only a single one-step miss is worth suggesting; two misses is the wrong plant for the spot.
  const nearMiss = verdict.failures === 1 && verdict.nearMiss;
  return { slug, score, parts, eligible: false, ineligibleReason: verdict.failure, nearMiss, tieBreak };
}

interface Verdict {
  /** The failures so far, joined by spaces. */
  failure: string | undefined;
  failures: number;
  /** Whether the last failure was by one step only. */
  nearMiss: boolean;
}

function takeCheck(c: CheckResult, parts: ScorePart[], verdict: Verdict): void {
  if (c === null) return;
  if ('part' in c) {
    parts.push(c.part);
    return;
  }
  verdict.failure = verdict.failure === undefined ? c.failure : `${verdict.failure} ${c.failure}`;
  verdict.failures++;
  verdict.nearMiss = c.nearMiss;
}

function addPart(p: ScorePart | null, parts: ScorePart[]): void {
  if (p) parts.push(p);
}

/**
 * Score descending; ties to the species that thrives here rather than copes, then to more wildlife
 * value within its layer (tieBreak); only then the slug, so the same input always gives the same order.
 */
export function compareScored(a: ScoredSpecies, b: ScoredSpecies): number {
  return b.score - a.score || (b.tieBreak ?? 0) - (a.tieBreak ?? 0) || (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0);
}

/** Ranks a species list for a site: eligible species, and near misses to "also consider". */
export function recommend(
  speciesList: readonly Species[],
  site: Site,
  region: RegionContext,
  context: ScoringContext = {},
): Recommendation {
  const ranked: ScoredSpecies[] = [];
  const alsoConsider: ScoredSpecies[] = [];
  const coverage = catalogueCoverage(speciesList, region);
  if (!coverage.covered) return { ranked, alsoConsider, coverage };
  for (const s of speciesList) {
    // Species out by more than a step are dropped unseen: no reasons to build for them.
    if (hardCheckOutcome(s, site, region) === 'out') continue;
    const r = scoreSpecies(s, site, region, context);
    if (r.eligible) ranked.push(r);
    else if (r.nearMiss) alsoConsider.push(r);
  }
  return { ranked: ranked.sort(compareScored), alsoConsider: alsoConsider.sort(compareScored), coverage };
}
