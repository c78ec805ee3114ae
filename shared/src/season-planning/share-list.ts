import { cp42PeriodsOf } from '../scoring/bloom-periods.js';
import { genusOf } from '../scoring/genus.js';
import { BLOOM_PERIODS, type BloomPeriod } from '../types/recommendation.js';
import type { ShareList, ShareListProposal } from '../types/season.js';
import {
  MOISTURE_LEVELS,
  SUN_LEVELS,
  type Moisture,
  type Species,
  type SowingMethod,
  type StateCode,
  type Sun,
} from '../types/species.js';
import { isHerbaceousPerennial, shareCandidates, type ShareCandidate } from './share-list-candidates.js';
import {
  MILKWEED_WORDS,
  bloomSentence,
  caterpillarWords,
  easeWords,
  methodWords,
  supplyWords,
  wildlifeWords,
  yardWords,
} from './share-list-words.js';
import { seedEaseOf, type SeedEase } from './seed-ease.js';

export interface ShareListInput {
  /** The catalogue (or any list of species records). */
  species: readonly Species[];
  /** The group's EPA Level III ecoregion, e.g. "52". */
  ecoregionCode: string;
  state: StateCode;
  /** The sowing methods the group's growers use. */
  methods: readonly SowingMethod[];
  /** Share of the plants that are native milkweeds, 0–1. */
  milkweedShare: number;
  /** Species to propose. */
  count: number;
  /** Plants the group means to raise in all; default 50 per species. */
  totalPlants?: number;
}

/**
 * Homeground's own weights for choosing a giveaway list (judgement, not a published standard; they
 * are never shown). Ease from seed matters most for volunteer growers; wildlife value next; then
 * the spread of bloom, sun and moisture, each worth most for the first species to cover a part.
 */
const W = {
  ease: { easy: 3, moderate: 1.5, hard: 0 },
  /** Per 10 points of germination above (or below) 50 %. */
  germinationPer10Pct: 0.3,
  shortLived: -0.5,
  /** Caterpillar value, scaled by the species' rank in its layer (0–1). */
  caterpillarRank: 3,
  monarchHost: 1,
  specialistBees: 0.5,
  birds: 0.3,
  supply: { routine: 0.5, 'contract-only': 0, 'field-collection-only': -1, 'none-known': -1 },
  /** Takers' yards are small: a fast spreader disappoints more people than it pleases. */
  aggressive: -1.5,
  toxicOrPets: -0.3,
  /** Over 2 m (6.5 ft): taller than most takers' small beds want. */
  tall: -1.5,
  /** Trees, shrubs, vines, annuals and biennials: only when the herbaceous perennials run out. */
  notHerbaceousPerennial: -6,
  bloomPeriod: 1.5,
  sun: 1.5,
  moisture: 1.2,
  sameGenus: -2,
  /**
   * Native to many states: a widespread plant is common in the trade and in local seed, never a
   * rarity; full credit from 40 states.
   */
  widespread: 2,
} as const;

const WIDESPREAD_STATES = 40;
const TALL_CM = 200;

/** At most this many milkweed species: beyond four the extra ones are the hard-to-raise or scarce ones. */
const MAX_MILKWEED_SPECIES = 4;
const DEFAULT_PLANTS_PER_SPECIES = 50;

interface Scored extends ShareCandidate {
  ease: SeedEase;
  base: number;
  periods: BloomPeriod[];
  caterpillarRank: number;
}

interface Coverage {
  period: Record<BloomPeriod, number>;
  sun: Record<Sun, number>;
  moisture: Record<Moisture, number>;
  genera: Map<string, number>;
  graminoids: number;
  flowering: number;
}

/**
 * Proposes the season's share list: species native to the group's ecoregion and state that its
 * growers can raise from seed, easy ones first, with high wildlife value for their layer, flowering
 * early, mid and late, and a spread of sun and shade, dry and wet, so every taker's yard finds
 * something. Native milkweeds take `milkweedShare` of the plants. Protected species are never proposed.
 */
export function proposeShareList(input: ShareListInput): ShareList {
  const count = Math.max(1, Math.floor(input.count));
  const totalPlants = input.totalPlants ?? DEFAULT_PLANTS_PER_SPECIES * count;
  const candidates = shareCandidates(input.species, input.ecoregionCode, input.state, input.methods)
    // Ferns grow from spores, not seed.
    .filter((c) => c.species.growthForm !== 'fern');
  const scored = scoreCandidates(candidates);
  const milkweeds = scored.filter((c) => c.isMilkweed);
  const others = scored.filter((c) => !c.isMilkweed);

  const wantMilkweeds = input.milkweedShare > 0 ? Math.max(1, Math.round(count * input.milkweedShare)) : 0;
  const milkweedSpecies = Math.min(MAX_MILKWEED_SPECIES, milkweeds.length, wantMilkweeds, count - 1);
  const cover = emptyCoverage();
  const picked: { c: Scored; fills: BloomPeriod[] }[] = [];
  pick(milkweeds, milkweedSpecies, cover, picked);
  pick(others, count - picked.length, cover, picked);

  const milkweedPlants = milkweedSpecies > 0 ? Math.round(totalPlants * input.milkweedShare) : 0;
  const milkweedSplit = split(milkweedPlants, milkweedSpecies);
  const otherSplit = split(totalPlants - milkweedPlants, picked.length - milkweedSpecies);
  const proposals: ShareListProposal[] = picked.map(({ c, fills }, i) => ({
    slug: c.species.slug,
    commonName: c.species.commonNames[0],
    scientificName: c.species.scientificName,
    isMilkweed: c.isMilkweed,
    layer: c.layer,
    bloomPeriods: c.periods,
    sunOptimum: c.species.sunOptimum,
    moistureOptimum: c.species.moistureOptimum,
    suggestedPlants: i < milkweedSpecies ? milkweedSplit[i] : otherSplit[i - milkweedSpecies],
    why: whyOf(c, fills),
  }));
  return {
    ecoregionCode: input.ecoregionCode,
    state: input.state,
    methods: [...input.methods],
    milkweedShare: input.milkweedShare,
    totalPlants,
    proposals,
    notes: notesFor(proposals, count, input.milkweedShare, milkweeds.length),
  };
}

function scoreCandidates(candidates: readonly ShareCandidate[]): Scored[] {
  const rankOf = caterpillarRanks(candidates);
  return candidates.map((c) => {
    const s = c.species;
    const ease = seedEaseOf(s);
    const caterpillarRank = rankOf.get(s.slug) ?? 0;
    let base =
      W.ease[ease.level] +
      ((ease.germinationRatePct - 50) / 10) * W.germinationPer10Pct +
      W.caterpillarRank * caterpillarRank;
    base += W.widespread * Math.min(1, s.nativeStates.length / WIDESPREAD_STATES);
    if (s.lifespan === 'short-lived-perennial') base += W.shortLived;
    if (!isHerbaceousPerennial(s)) base += W.notHerbaceousPerennial;
    if (s.wildlife.monarchHost) base += W.monarchHost;
    if (s.wildlife.specialistBees.length > 0) base += W.specialistBees;
    if (s.wildlife.birds) base += W.birds;
    if (s.commercialAvailability) base += W.supply[s.commercialAvailability];
    if (s.cautions.some((k) => k.kind === 'aggressive-spreader') || s.spreadHabit === 'aggressive')
      base += W.aggressive;
    if (s.cautions.some((k) => k.kind === 'toxic-if-eaten' || k.kind === 'pets')) base += W.toxicOrPets;
    if (s.heightCm.max > TALL_CM) base += W.tall;
    return { ...c, ease, base, periods: cp42PeriodsOf(s), caterpillarRank };
  });
}

/** Each candidate's share (0–1) of its layer's candidates with a lower genus caterpillar count. */
function caterpillarRanks(candidates: readonly ShareCandidate[]): Map<string, number> {
  const out = new Map<string, number>();
  for (const layer of ['herbaceous', 'woody'] as const) {
    const inLayer = candidates.filter((c) => c.layer === layer);
    const counts = inLayer.map((c) => c.species.wildlife.lepidopteraGenusCount ?? 0);
    for (const c of inLayer) {
      const own = c.species.wildlife.lepidopteraGenusCount ?? 0;
      const lower = counts.filter((n) => n < own).length;
      out.set(c.species.slug, inLayer.length > 1 ? lower / (inLayer.length - 1) : 0);
    }
  }
  return out;
}

function emptyCoverage(): Coverage {
  return {
    period: { early: 0, mid: 0, late: 0 },
    sun: { full: 0, part: 0, shade: 0 },
    moisture: { dry: 0, medium: 0, wet: 0 },
    genera: new Map(),
    graminoids: 0,
    flowering: 0,
  };
}

/** What adding a species brings to the list as it stands: the spread parts, worth most when first. */
function spreadGain(c: Scored, cover: Coverage): number {
  // The least-covered period counts: a June–August bloomer names all three periods (June sits on
  // the early/mid boundary), so summing would favour long bloomers over the ones that fill a gap.
  let gain = 0;
  for (const p of c.periods) gain = Math.max(gain, W.bloomPeriod / (1 + cover.period[p]));
  let sun = 0;
  for (const s of c.species.sunOptimum) sun = Math.max(sun, W.sun / (1 + cover.sun[s]));
  let moisture = 0;
  for (const m of c.species.moistureOptimum) moisture = Math.max(moisture, W.moisture / (1 + cover.moisture[m]));
  return gain + sun + moisture + W.sameGenus * (cover.genera.get(genusOf(c.species)) ?? 0);
}

/** Greedy: each round takes the candidate that adds most; ties go to the slug, so the answer never varies. */
function pick(
  pool: readonly Scored[],
  n: number,
  cover: Coverage,
  picked: { c: Scored; fills: BloomPeriod[] }[],
): void {
  const left = [...pool];
  // One grass or sedge for every six species: takers want flowers, but a bunchgrass knits a bed together.
  const maxGraminoids = Math.max(1, Math.round((picked.length + n) / 6));
  for (let k = 0; k < n && left.length > 0; k++) {
    let best = -1;
    let bestValue = -Infinity;
    left.forEach((c, i) => {
      if (c.species.growthForm === 'graminoid' && cover.graminoids >= maxGraminoids) return;
      const value = c.base + spreadGain(c, cover);
      if (value > bestValue || (value === bestValue && c.species.slug < left[best].species.slug)) {
        best = i;
        bestValue = value;
      }
    });
    if (best < 0) return;
    const [c] = left.splice(best, 1);
    const fills = cover.flowering > 0 ? c.periods.filter((p) => cover.period[p] === 0) : [];
    take(c, cover);
    picked.push({ c, fills });
  }
}

function take(c: Scored, cover: Coverage): void {
  for (const p of c.periods) cover.period[p]++;
  for (const s of c.species.sunOptimum) cover.sun[s]++;
  for (const m of c.species.moistureOptimum) cover.moisture[m]++;
  const genus = genusOf(c.species);
  cover.genera.set(genus, (cover.genera.get(genus) ?? 0) + 1);
  if (c.species.growthForm === 'graminoid') cover.graminoids++;
  if (c.periods.length > 0) cover.flowering++;
}

/** `total` in `n` whole parts, the first ones a plant larger when it does not divide evenly. */
function split(total: number, n: number): number[] {
  if (n <= 0) return [];
  const each = Math.floor(total / n);
  return Array.from({ length: n }, (_, i) => each + (i < total - each * n ? 1 : 0));
}

function whyOf(c: Scored, fills: readonly BloomPeriod[]): string[] {
  const why: string[] = [];
  if (c.isMilkweed) why.push(MILKWEED_WORDS);
  why.push(easeWords(c.ease, c.methods), methodWords(c.methods));
  const caterpillars = caterpillarWords(c.species, c.layer, c.caterpillarRank);
  if (caterpillars) why.push(caterpillars);
  why.push(...wildlifeWords(c.species));
  const bloom = bloomSentence(c.species, c.periods, fills);
  if (bloom) why.push(bloom);
  why.push(yardWords(c.species));
  const supply = supplyWords(c.species);
  if (supply) why.push(supply);
  return why;
}

function notesFor(
  proposals: readonly ShareListProposal[],
  count: number,
  milkweedShare: number,
  milkweedsAvailable: number,
): string[] {
  const notes: string[] = [];
  if (proposals.length < count) {
    notes.push(
      `Only ${proposals.length} species native here suit your growers' methods; add a method to widen the choice.`,
    );
  }
  if (milkweedShare > 0 && milkweedsAvailable === 0)
    notes.push("No native milkweed here suits your growers' methods, so the list has none.");
  for (const p of BLOOM_PERIODS) {
    if (!proposals.some((x) => x.bloomPeriods.includes(p)))
      notes.push(`Nothing on the list flowers in the ${p === 'mid' ? 'midsummer' : p} period.`);
  }
  const has = (sun: readonly Sun[], moisture: readonly Moisture[]) =>
    proposals.some(
      (x) => x.sunOptimum.some((s) => sun.includes(s)) && x.moistureOptimum.some((m) => moisture.includes(m)),
    );
  if (!has(['part', 'shade'], MOISTURE_LEVELS))
    notes.push('Nothing on the list is at its best in shade: takers with shady yards will find little.');
  if (!has(SUN_LEVELS, ['wet']))
    notes.push('Nothing on the list is at its best in wet soil: takers with wet spots will find little.');
  if (!has(SUN_LEVELS, ['dry']))
    notes.push('Nothing on the list is at its best in dry soil: takers with dry spots will find little.');
  return notes;
}
