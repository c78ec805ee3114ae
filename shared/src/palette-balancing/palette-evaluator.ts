import { BLOOM_PERIODS } from '../types/recommendation.js';
import { recomputingEvaluator, type MixEvaluator, type Objective } from './mix-evaluator.js';
import {
  OBJECTIVE_WEIGHTS,
  SEASON_MONTHS,
  grassTargets,
  seasonMonthMask,
  type ObjectiveSettings,
} from './objective-weights.js';
import type { PaletteItem } from './palette-item.js';

/** Colour and tier sets are held as bit masks: enough bits for every colour a record can name. */
const MAX_MASK_BITS = 30;

/**
 * The mix objective of objective.ts, kept up to date one item at a time: every term is a function
 * of counts (species per period, per genus, per tier, per colour…), so adding or removing an item
 * changes a few counters and reading the value is O(1), where re-evaluating a set costs O(mix
 * size) plus an allocation and a sort. The optimiser makes millions of trial moves on a big
 * catalogue, so this is where its time went.
 *
 * The objective counts each genus's host species once, taking it from the genus's last member in
 * slug order; when two items of one genus disagree on the count (records out of step) the counters
 * cannot reproduce that, so the whole-set fallback is used instead. The fit total is kept by adding
 * and subtracting, so it may drift from a fresh sum in the last bits (~1e-13); the optimiser's
 * improvement threshold (1e-9) is far above that, and it reports the fresh value at the end.
 */
export function paletteEvaluator(
  pool: readonly PaletteItem[],
  settings: ObjectiveSettings,
  objective: Objective<PaletteItem>,
): MixEvaluator {
  return PaletteCounters.build(pool, settings) ?? recomputingEvaluator(pool, objective);
}

class PaletteCounters implements MixEvaluator {
  private fitSum = 0;
  private flowering = 0;
  private grasses = 0;
  private milkweeds = 0;
  private hostSum = 0;
  /** The host term for loggedHostSum: a trial move rarely changes the genera, so the log is reused. */
  private loggedHostSum = 0;
  private hostTerm = 0;
  private repeats = 0;
  private readonly perPeriod = new Int32Array(BLOOM_PERIODS.length);
  private readonly perGenus: Int32Array;
  private readonly perTier = new Int32Array(MAX_MASK_BITS);
  private tiers = 0;
  private readonly perColour = new Int32Array(MAX_MASK_BITS);
  /** Species in flower per season month (April … October), and Σ min(count, target) over them. */
  private readonly perMonth = new Int32Array(SEASON_MONTHS);
  private monthsFilled = 0;
  private colours = 0;
  private readonly grassMin: number;
  private readonly grassMax: number;
  readonly gainBounds: Float64Array;

  private constructor(
    private readonly fit: Float64Array,
    /** Bit 0 flowering, 1 graminoid, 2 milkweed. */
    private readonly flags: Uint8Array,
    private readonly periodMask: Uint8Array,
    private readonly genus: Int32Array,
    private readonly genusHosts: Float64Array,
    private readonly tier: Uint8Array,
    private readonly colourMask: Uint32Array,
    /** Season months in flower as bits (flowering species only). */
    private readonly monthMask: Uint8Array,
    private readonly monarchsGoal: boolean,
    size: number,
  ) {
    this.perGenus = new Int32Array(genusHosts.length);
    ({ min: this.grassMin, max: this.grassMax } = grassTargets(size));
    this.gainBounds = this.boundGains();
  }

  /**
   * What an item adds is at most its fit plus what each term gives for it in an empty mix: every
   * term is concave in its count (the host term in its caterpillar sum), and the two penalties only
   * ever take away.
   */
  private boundGains(): Float64Array {
    const w = OBJECTIVE_WEIGHTS;
    const bounds = new Float64Array(this.fit.length);
    for (let i = 0; i < bounds.length; i++) {
      const f = this.flags[i];
      let periods = 0;
      for (let p = 0; p < BLOOM_PERIODS.length; p++) if (this.periodMask[i] & (1 << p)) periods++;
      let colours = 0;
      for (let m = this.colourMask[i]; m !== 0; m >>>= 1) colours += m & 1;
      let months = 0;
      for (let m = this.monthMask[i]; m !== 0; m >>>= 1) months += m & 1;
      bounds[i] =
        this.fit[i] +
        w.hostWeight * Math.log(1 + this.genusHosts[this.genus[i]] / w.hostScale) +
        w.perPeriodSpecies * periods +
        w.perMonthSpecies * months +
        (f & 1 ? w.perFloweringSpecies : 0) +
        (f & 4 && this.monarchsGoal ? w.milkweed : 0) +
        (f & 2 ? w.perGrass : 0) +
        w.perHeightTier +
        w.perColour * Math.min(colours, w.colourTarget);
    }
    return bounds;
  }

  /** Counters for the pool, or null when they cannot reproduce the objective exactly. */
  static build(pool: readonly PaletteItem[], settings: ObjectiveSettings): PaletteCounters | null {
    const n = pool.length;
    const fit = new Float64Array(n);
    const flags = new Uint8Array(n);
    const periodMask = new Uint8Array(n);
    const genus = new Int32Array(n);
    const tier = new Uint8Array(n);
    const colourMask = new Uint32Array(n);
    const monthMask = new Uint8Array(n);
    const genusIds = new Map<string, number>();
    const hosts: number[] = [];
    const tierIds = new Map<string, number>();
    const colourIds = new Map<string, number>();
    for (let i = 0; i < n; i++) {
      const it = pool[i];
      fit[i] = it.fit;
      flags[i] = (it.flowering ? 1 : 0) | (it.graminoid ? 2 : 0) | (it.milkweed ? 4 : 0);
      for (const p of it.periods) periodMask[i] |= 1 << BLOOM_PERIODS.indexOf(p);
      monthMask[i] = it.flowering ? seasonMonthMask(it.months) : 0;
      let g = genusIds.get(it.genus);
      if (g === undefined) {
        g = hosts.length;
        genusIds.set(it.genus, g);
        hosts.push(it.hostCount);
      } else if (hosts[g] !== it.hostCount) {
        return null;
      }
      genus[i] = g;
      const t = idOf(tierIds, it.tier);
      if (t >= MAX_MASK_BITS) return null;
      tier[i] = t;
      for (const c of it.colours) {
        const id = idOf(colourIds, c);
        if (id >= MAX_MASK_BITS) return null;
        colourMask[i] |= 1 << id;
      }
    }
    return new PaletteCounters(
      fit,
      flags,
      periodMask,
      genus,
      Float64Array.from(hosts),
      tier,
      colourMask,
      monthMask,
      settings.monarchsGoal,
      settings.size,
    );
  }

  // add and remove are written out separately (no shared step with a sign), with the three CP42
  // periods (BLOOM_PERIODS) spelled out as bits 0–2: they are the innermost step of every trial move.
  add(i: number): void {
    this.fitSum += this.fit[i];
    const f = this.flags[i];
    if (f !== 0) {
      if (f & 1) this.flowering++;
      if (f & 2) this.grasses++;
      if (f & 4) this.milkweeds++;
    }
    const pm = this.periodMask[i];
    if (pm & 1) this.perPeriod[0]++;
    if (pm & 2) this.perPeriod[1]++;
    if (pm & 4) this.perPeriod[2]++;
    const target = OBJECTIVE_WEIGHTS.monthTarget;
    for (let m = this.monthMask[i], k = 0; m !== 0; m >>>= 1, k++)
      if (m & 1 && this.perMonth[k]++ < target) this.monthsFilled++;
    // A genus counts its hosts once; every further member is a repeat.
    const g = this.genus[i];
    if (this.perGenus[g]++ === 0) this.hostSum += this.genusHosts[g];
    else this.repeats++;
    if (this.perTier[this.tier[i]]++ === 0) this.tiers++;
    for (let m = this.colourMask[i], c = 0; m !== 0; m >>>= 1, c++)
      if (m & 1 && this.perColour[c]++ === 0) this.colours++;
  }

  remove(i: number): void {
    this.fitSum -= this.fit[i];
    const f = this.flags[i];
    if (f !== 0) {
      if (f & 1) this.flowering--;
      if (f & 2) this.grasses--;
      if (f & 4) this.milkweeds--;
    }
    const pm = this.periodMask[i];
    if (pm & 1) this.perPeriod[0]--;
    if (pm & 2) this.perPeriod[1]--;
    if (pm & 4) this.perPeriod[2]--;
    const target = OBJECTIVE_WEIGHTS.monthTarget;
    for (let m = this.monthMask[i], k = 0; m !== 0; m >>>= 1, k++)
      if (m & 1 && --this.perMonth[k] < target) this.monthsFilled--;
    const g = this.genus[i];
    if (--this.perGenus[g] === 0) this.hostSum -= this.genusHosts[g];
    else this.repeats--;
    if (--this.perTier[this.tier[i]] === 0) this.tiers--;
    for (let m = this.colourMask[i], c = 0; m !== 0; m >>>= 1, c++)
      if (m & 1 && --this.perColour[c] === 0) this.colours--;
  }

  value(): number {
    const w = OBJECTIVE_WEIGHTS;
    const pp = this.perPeriod;
    const t = w.periodTarget;
    const periods = w.perPeriodSpecies * (Math.min(pp[0], t) + Math.min(pp[1], t) + Math.min(pp[2], t));
    if (this.hostSum !== this.loggedHostSum) {
      this.loggedHostSum = this.hostSum;
      this.hostTerm = w.hostWeight * Math.log(1 + this.hostSum / w.hostScale);
    }
    const milkweed = this.monarchsGoal
      ? w.milkweed * Math.min(this.milkweeds, 1) + w.secondMilkweed * Math.min(Math.max(this.milkweeds - 1, 0), 1)
      : 0;
    return (
      this.fitSum +
      this.hostTerm +
      periods +
      w.perMonthSpecies * this.monthsFilled +
      w.perFloweringSpecies * Math.min(this.flowering, w.floweringTarget) +
      milkweed +
      w.perGrass * Math.min(this.grasses, this.grassMin) -
      w.perGrassOver * Math.max(0, this.grasses - this.grassMax) +
      w.perHeightTier * this.tiers +
      w.perColour * Math.min(this.colours, w.colourTarget) -
      w.perRepeatedGenus * this.repeats
    );
  }
}

function idOf(ids: Map<string, number>, key: string): number {
  let id = ids.get(key);
  if (id === undefined) {
    id = ids.size;
    ids.set(key, id);
  }
  return id;
}
