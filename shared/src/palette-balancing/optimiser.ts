import { recomputingEvaluator, type Objective } from './mix-evaluator.js';
import { EPSILON, applyMove, bestPairSwap, bestSingleSwap, type SearchState } from './swap-moves.js';

/**
 * A bound on improving moves, for safety only: each move gains more than EPSILON, so the search
 * ends on its own; on the real catalogue it settles within about a dozen moves, and a bounded
 * number of moves keeps a pathological input from costing more than a bounded time.
 */
const MAX_MOVES = 200;

export interface SelectionOptions<T = unknown> {
  locked?: readonly string[];
  excluded?: readonly string[];
  /**
   * Narrows the outsiders the greedy pass and the swap search try (e.g. narrowCandidates). A final
   * single-swap pass still tries every candidate, so the result has no improving single swap left
   * anywhere; an outsider it brings in joins the narrowed set and the swap search resumes.
   */
  searchPool?: (pool: readonly T[]) => readonly T[];
}

export interface Selection<T> {
  /** Chosen items, in slug order. */
  chosen: T[];
  value: number;
  /** Improving moves (single or pair swaps) made after the greedy pass. */
  swaps: number;
}

const bySlug = <T extends { slug: string }>(a: T, b: T) => (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0);

/**
 * Chooses `size` items maximising `objective`: greedy (add the item with the largest gain) from the
 * locked items, then local search until no move improves: best single swap, and when none helps,
 * the best pair swap. Ties go to the smaller slug and candidates are indexed in slug order, so
 * the same input gives the same answer in any input order. Trials run on the objective's
 * incremental evaluator when it has one (see palette-evaluator.ts).
 */
export function optimiseSelection<T extends { slug: string }>(
  candidates: readonly T[],
  size: number,
  objective: Objective<T>,
  options: SelectionOptions<T> = {},
): Selection<T> {
  const pool = canonicalPool(candidates, options.excluded ?? []);
  const lockedSlugs = new Set(options.locked ?? []);
  const all = pool.map((_, i) => i);
  const narrowed = options.searchPool ? new Set(options.searchPool(pool)) : null;
  let search = narrowed ? all.filter((i) => narrowed.has(pool[i])) : all;

  const s: SearchState = {
    ev: objective.evaluator?.(pool) ?? recomputingEvaluator(pool, objective),
    inMix: new Uint8Array(pool.length),
    locked: new Uint8Array(pool.length),
    chosen: [],
    value: 0,
  };
  for (const i of all) {
    if (!lockedSlugs.has(pool[i].slug)) continue;
    s.locked[i] = 1;
    s.inMix[i] = 1;
    s.ev.add(i);
    s.chosen.push(i);
  }

  while (s.chosen.length < size) {
    const next = bestAddition(s, search);
    if (next < 0 && search !== all) {
      search = all; // the narrowed set ran out: fall back to every candidate
      continue;
    }
    if (next < 0) break;
    s.ev.add(next);
    s.inMix[next] = 1;
    s.chosen = [...s.chosen, next].sort((x, y) => x - y);
  }

  s.value = s.ev.value();
  let swaps = 0;
  for (;;) {
    while (swaps < MAX_MOVES) {
      const move = bestSingleSwap(s, search) ?? bestPairSwap(s, search);
      if (move === null) break;
      applyMove(s, move);
      swaps++;
    }
    if (search === all || swaps >= MAX_MOVES) break;
    const wider = bestSingleSwap(s, all);
    if (wider === null) break;
    applyMove(s, wider);
    swaps++;
    search = [...search, ...wider.in].sort((x, y) => x - y);
  }
  const chosen = s.chosen.map((i) => pool[i]);
  return { chosen, value: objective(chosen), swaps };
}

/**
 * The candidates in slug order, without excluded species or repeated slugs. Mix candidates come
 * already in slug order and unique (buildCandidates), which one look along the list confirms: then
 * the list is taken as it is, without the sort and the set of every slug (a good part of a mix's
 * time at 10,000 candidates).
 */
function canonicalPool<T extends { slug: string }>(candidates: readonly T[], excludedSlugs: readonly string[]): T[] {
  let ordered = excludedSlugs.length === 0;
  for (let i = 1; ordered && i < candidates.length; i++) ordered = candidates[i - 1].slug < candidates[i].slug;
  if (ordered) return candidates.slice();
  const excluded = new Set(excludedSlugs);
  const seen = new Set<string>();
  return [...candidates].sort(bySlug).filter((c) => !excluded.has(c.slug) && !seen.has(c.slug) && seen.add(c.slug));
}

/** The outsider (from `outs`) whose addition gives the largest value; ties to the smaller slug. */
function bestAddition(s: SearchState, outs: readonly number[]): number {
  let best = -1;
  let bestValue = -Infinity;
  for (const j of outs) {
    if (s.inMix[j]) continue;
    s.ev.add(j);
    const v = s.ev.value();
    s.ev.remove(j);
    if (v > bestValue + EPSILON) [best, bestValue] = [j, v];
  }
  return best;
}
