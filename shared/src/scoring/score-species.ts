import type { Coverage, Recommendation, ScorePart, ScoredSpecies } from '../types/recommendation.js';
import type { RegionContext, Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { roundTo } from '../units/conversions.js';
import { bloomGapPart, habitatPart } from './context-parts.js';
import { deerPart, rainGardenPart, shadeGardenPart, soilPart, spreadPart } from './garden-parts.js';
import { ELIGIBLE, OUT, catalogueOutcomes } from './catalogue-outcomes.js';
import { catalogueCoverage } from './coverage.js';
import { compareScored, rankOfKey, scoreKey, slugOrder } from './scored-order.js';

export { compareScored } from './scored-order.js';
import { checkHeight, checkMoisture, checkNative, checkRoom, checkSun, type CheckResult } from './hard-checks.js';
import { birdsPart, monarchPart } from './wildlife-parts.js';
import { gardenUsePart, scalePart, unknownAvailabilityPart } from './practice-parts.js';
import { catalogueFacts, factsOf, type SpeciesFacts } from './species-facts.js';
import { checkEcoregion, checkLayer, checkLifespan, checkSpreader } from './practice-checks.js';
import { acidSoilPart, communityPart, fernPart, regionalPart, thrivesPart, wetlandPart } from './site-fit-parts.js';

export interface ScoringContext {
  /** The mix chosen so far: species that bloom when it has least score higher. */
  currentMix?: readonly Species[];
}

/**
 * Running totals of one species' scoring. One object, reset per species and reused, so that scoring
 * a big catalogue allocates nothing for the totals (this runs once per species on every request).
 */
interface Tally {
  sum: number;
  /** Ties go to the plant that thrives here, then to the one with more wildlife value in its layer. */
  tie: number;
  /** Points of the host-plant and monarch-host parts (the mix objective counts those its own way). */
  host: number;
  /** The failures so far, joined by spaces. */
  failure: string | undefined;
  failures: number;
  /** Whether the last failure was by one step only. */
  nearMiss: boolean;
  /** The parts, when they are wanted; null to sum the points only. */
  parts: ScorePart[] | null;
}

const tally: Tally = { sum: 0, tie: 0, host: 0, failure: undefined, failures: 0, nearMiss: false, parts: null };

/** How a part counts in the tie-break: 10× for how well it thrives, 1× for wildlife value, else not. */
const TIE_THRIVES = 10;
const TIE_WILDLIFE = 1;

function add(p: ScorePart | null, tieWeight = 0): void {
  if (p === null) return;
  tally.sum += p.points;
  if (tieWeight !== 0) tally.tie += tieWeight * p.points;
  if (tally.parts !== null) tally.parts.push(p);
}

function addHost(p: ScorePart | null): void {
  if (p === null) return;
  tally.host += p.points;
  add(p, TIE_WILDLIFE);
}

function take(c: CheckResult): void {
  if (c === null) return;
  if ('part' in c) {
    add(c.part);
    return;
  }
  tally.failure = tally.failure === undefined ? c.failure : `${tally.failure} ${c.failure}`;
  tally.failures++;
  tally.nearMiss = c.nearMiss;
}

/**
 * Scores one species into the tally, part by part in "why it fits" order. The same code serves
 * the full answer (with its parts) and a points-only pass (for species a mix weighs but never
 * shows), so the two cannot disagree.
 */
function tallySpecies(
  species: Species,
  facts: SpeciesFacts,
  site: Site,
  region: RegionContext,
  context: ScoringContext,
  parts: ScorePart[] | null,
): void {
  tally.sum = 0;
  tally.tie = 0;
  tally.host = 0;
  tally.failure = undefined;
  tally.failures = 0;
  tally.nearMiss = false;
  tally.parts = parts;
  const forPollinators = site.goals.includes('pollinators');
  take(checkNative(species, region, facts));
  take(checkSun(species, site, facts));
  take(checkMoisture(species, site, facts));
  take(checkHeight(species, site));
  take(checkRoom(species, site, facts));
  take(checkEcoregion(species, region, facts));
  take(checkLayer(species, site, facts));
  take(checkLifespan(species, facts));
  take(checkSpreader(species, site, facts));
  add(thrivesPart(species, site, facts), TIE_THRIVES);
  add(communityPart(species, site), TIE_THRIVES);
  add(wetlandPart(species, site), TIE_THRIVES);
  add(acidSoilPart(species));
  add(fernPart(species, site));
  add(soilPart(species, site));
  add(habitatPart(species, region));
  add(regionalPart(species, region));
  addHost(facts.hostPart);
  add(forPollinators ? facts.beePart : null, TIE_WILDLIFE);
  add(facts.availabilityPart ?? unknownAvailabilityPart(site));
  add(facts.lawnOrPath ? gardenUsePart(species, site) : null);
  add(facts.seedEasePart);
  add(scalePart(species, site));
  addHost(monarchPart(species, site));
  add(forPollinators ? facts.flowersPart : null);
  add(birdsPart(species, site));
  add(bloomGapPart(species, context.currentMix));
  add(deerPart(species, site));
  add(spreadPart(species, site));
  add(rainGardenPart(species, site));
  add(shadeGardenPart(species, site));
  tally.parts = null;
}

const scratch: ScorePart[] = [];

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
  facts = factsOf(species),
): ScoredSpecies {
  // Parts go to a scratch list, then into a list of their exact length: a ranking keeps one per
  // species, and a list grown by push holds room for 16 (garbage collection copies all of it).
  scratch.length = 0;
  tallySpecies(species, facts, site, region, context, scratch);
  const parts = scratch.slice();
  const score = roundTo(tally.sum, 2);
  const tieBreak = roundTo(tally.tie, 2);
  const slug = species.slug;
  if (tally.failure === undefined) return { slug, score, parts, eligible: true, nearMiss: false, tieBreak };
  // Only a single one-step miss is worth suggesting; two misses is the wrong plant for the spot.
  const nearMiss = tally.failures === 1 && tally.nearMiss;
  return { slug, score, parts, eligible: false, ineligibleReason: tally.failure, nearMiss, tieBreak };
}

/** A species' score without its words: what a mix needs of the many candidates it never shows. */
export interface ScorePoints {
  /** As scoreSpecies' `score`. */
  score: number;
  /** As scoreSpecies' `tieBreak`. */
  tieBreak: number;
  /** Points of its host-plant and monarch-host parts. */
  hostPoints: number;
}

/**
 * scoreSpecies' numbers without its parts (same code, same order of sums, so the same numbers).
 * `into` is filled and returned, so a caller scoring many species can reuse one object.
 */
export function scorePoints(
  species: Species,
  site: Site,
  region: RegionContext,
  context: ScoringContext = {},
  into: ScorePoints = { score: 0, tieBreak: 0, hostPoints: 0 },
  facts = factsOf(species),
): ScorePoints {
  tallySpecies(species, facts, site, region, context, null);
  into.score = roundTo(tally.sum, 2);
  into.tieBreak = roundTo(tally.tie, 2);
  into.hostPoints = tally.host;
  return into;
}

/** How many of each list `recommend` returns with their reasons; all when not given. */
export interface RecommendLimits {
  ranked?: number;
  alsoConsider?: number;
}

/**
 * Ranks a species list for a site: eligible species, and near misses to "also consider". Every
 * species is ranked, but "why it fits" is built only for those returned (`limits`, e.g. the few
 * dozen a page shows): at 30,000 species, keeping reasons for 20,000 was most of the cost.
 */
export function recommend(
  speciesList: readonly Species[],
  site: Site,
  region: RegionContext,
  context: ScoringContext = {},
  limits: RecommendLimits = {},
): Recommendation {
  const coverage = catalogueCoverage(speciesList, region);
  if (!coverage.covered) return { ranked: [], alsoConsider: [], coverage };
  const { ranks, indexAt } = slugOrder(speciesList);
  const facts = catalogueFacts(speciesList);
  // Without limits every species is returned with its reasons, so they are built in the one pass.
  const everything = limits.ranked === undefined && limits.alsoConsider === undefined;
  const built: ScoredSpecies[] = everything ? new Array<ScoredSpecies>(speciesList.length) : [];
  const rankedKeys: number[] = [];
  const alsoKeys: number[] = [];
  const points: ScorePoints = { score: 0, tieBreak: 0, hostPoints: 0 };
  const outcomes = catalogueOutcomes(speciesList, site, region);
  for (let i = 0; i < speciesList.length; i++) {
    const outcome = outcomes[i];
    // Species out by more than a step are dropped unseen: no reasons to build for them.
    if (outcome === OUT) continue;
    const s = speciesList[i];
    let score: number;
    let tieBreak: number;
    if (everything) {
      const r = (built[ranks[i]] = scoreSpecies(s, site, region, context, facts[i]));
      score = r.score;
      tieBreak = r.tieBreak ?? 0;
    } else {
      ({ score, tieBreak } = scorePoints(s, site, region, context, points, facts[i]));
    }
    const key = scoreKey(score, tieBreak, ranks[i]);
    if (Number.isNaN(key)) return recommendByComparator(speciesList, site, region, context, limits, coverage);
    (outcome === ELIGIBLE ? rankedKeys : alsoKeys).push(key);
  }
  const best = (keys: number[], limit = Infinity): ScoredSpecies[] => {
    const sorted = Float64Array.from(keys).sort();
    const out: ScoredSpecies[] = [];
    for (let k = 0; k < sorted.length && k < limit; k++) {
      const rank = rankOfKey(sorted[k]);
      const i = indexAt[rank];
      out.push(everything ? built[rank] : scoreSpecies(speciesList[i], site, region, context, facts[i]));
    }
    return out;
  };
  return { ranked: best(rankedKeys, limits.ranked), alsoConsider: best(alsoKeys, limits.alsoConsider), coverage };
}

/** recommend by scoring everything and sorting with compareScored: for scores beyond the sort keys' range. */
function recommendByComparator(
  speciesList: readonly Species[],
  site: Site,
  region: RegionContext,
  context: ScoringContext,
  limits: RecommendLimits,
  coverage: Coverage,
): Recommendation {
  const ranked: ScoredSpecies[] = [];
  const alsoConsider: ScoredSpecies[] = [];
  for (const s of speciesList) {
    const r = scoreSpecies(s, site, region, context);
    if (r.eligible) ranked.push(r);
    else if (r.nearMiss) alsoConsider.push(r);
  }
  return {
    ranked: ranked.sort(compareScored).slice(0, limits.ranked),
    alsoConsider: alsoConsider.sort(compareScored).slice(0, limits.alsoConsider),
    coverage,
  };
}
