import { BLOOM_PERIODS } from '../types/recommendation.js';
import { OBJECTIVE_WEIGHTS, grassTargets, type ObjectiveSettings } from './objective-weights.js';
import type { PaletteItem } from './palette-item.js';

/**
 * How many of the best (by fit) candidates the swap search keeps, in all and per need. The trade-off:
 * a mix can only gain from a species outside this set if it beats, on fit, every kept species that
 * serves the same needs; the optimiser's last single-swap pass over every candidate catches any such
 * species that helps on its own. In exchange the search costs the same at 300 species as at 30,000.
 * On the real catalogue the narrowed search reaches the same objective as the full one (bench/).
 */
export const POOL_LIMITS = {
  /** Best overall: three times the mix, at least 30. */
  bestPerMixSpecies: 3,
  bestMin: 30,
  /** Per CP42 bloom period: the period's target and as many again, so swaps have a choice. */
  perPeriod: OBJECTIVE_WEIGHTS.periodTarget * 2,
  perHeightTier: 3,
  perColour: 2,
  /** Grasses and sedges beyond the share's maximum. */
  extraGrasses: 3,
  milkweeds: 3,
  /** The best of every genus: the host term counts each genus once, so variety needs the choice. */
  perGenus: 1,
} as const;

/** Fit descending, then slug: a total order, so the kept set does not depend on the input order. */
function better(a: PaletteItem, b: PaletteItem): boolean {
  return a.fit > b.fit || (a.fit === b.fit && a.slug < b.slug);
}

/** The best `limit` items offered, kept best first; offering is O(1) once full and not better than the last. */
class TopItems {
  readonly items: PaletteItem[] = [];

  constructor(private readonly limit: number) {}

  offer(item: PaletteItem): void {
    const kept = this.items;
    if (kept.length === this.limit && !better(item, kept[kept.length - 1])) return;
    let at = kept.length < this.limit ? kept.length : kept.length - 1;
    kept[at] = item;
    while (at > 0 && better(item, kept[at - 1])) {
      kept[at] = kept[at - 1];
      kept[--at] = item;
    }
  }
}

/** One TopItems per key (a tier, colour or genus), created on first use. */
class TopItemsByKey {
  readonly byKey = new Map<string, TopItems>();

  constructor(private readonly limit: number) {}

  offer(key: string, item: PaletteItem): void {
    let top = this.byKey.get(key);
    if (top === undefined) this.byKey.set(key, (top = new TopItems(this.limit)));
    top.offer(item);
  }
}

/**
 * The candidates worth searching for a mix of `settings.size`: the best by fit, plus, per need the
 * objective rewards, the best few that meet it (each bloom period, height tier, flower colour,
 * grasses, native milkweeds, and each genus), so every need the full list could meet can still be
 * met. One pass with small top-k lists instead of sorting the whole list: best first, ties by slug.
 */
export function narrowCandidates(items: readonly PaletteItem[], settings: ObjectiveSettings): PaletteItem[] {
  const L = POOL_LIMITS;
  const best = new TopItems(Math.max(L.bestMin, L.bestPerMixSpecies * settings.size));
  const periods = BLOOM_PERIODS.map(() => new TopItems(L.perPeriod));
  const tiers = new TopItemsByKey(L.perHeightTier);
  const colours = new TopItemsByKey(L.perColour);
  const genera = new TopItemsByKey(L.perGenus);
  const grasses = new TopItems(grassTargets(settings.size).max + L.extraGrasses);
  const milkweeds = new TopItems(L.milkweeds);
  for (const it of items) {
    best.offer(it);
    for (const p of it.periods) periods[BLOOM_PERIODS.indexOf(p)].offer(it);
    tiers.offer(it.tier, it);
    for (const c of it.colours) colours.offer(c, it);
    genera.offer(it.genus, it);
    if (it.graminoid) grasses.offer(it);
    if (it.milkweed) milkweeds.offer(it);
  }
  const keep = new Set<PaletteItem>();
  for (const top of [best, ...periods, grasses, milkweeds]) for (const it of top.items) keep.add(it);
  for (const group of [tiers, colours, genera])
    for (const top of group.byKey.values()) for (const it of top.items) keep.add(it);
  return [...keep].sort((a, b) => (better(a, b) ? -1 : better(b, a) ? 1 : 0));
}
