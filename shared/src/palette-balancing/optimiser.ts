import type { Objective } from './objective.js';

/** Improvements smaller than this are float noise, not a better mix (stops swap cycles). */
const EPSILON = 1e-9;
/** A safety stop; real runs settle in a few dozen moves. */
const MAX_MOVES = 10_000;
/** Pair moves refill from the best few outsiders only, which keeps them cheap on a big catalogue. */
const PAIR_REFILL_POOL = 6;

export interface SelectionOptions {
  locked?: readonly string[];
  excluded?: readonly string[];
}

export interface Selection<T> {
  /** Chosen items, in slug order. */
  chosen: T[];
  value: number;
  /** Improving moves (single or pair swaps) made after the greedy pass. */
  swaps: number;
}

const bySlug = <T extends { slug: string }>(a: T, b: T) => (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0);

interface Move { out: number[]; in: number[]; gain: number }

/** Best single swap (one unlocked chosen item out, one outsider in), or null if none improves. */
function bestSingleSwap<T extends { slug: string }>(chosen: T[], rest: T[], value: number, f: Objective<T>, locked: Set<string>): Move | null {
  let best: Move | null = null;
  for (let i = 0; i < chosen.length; i++) {
    if (locked.has(chosen[i].slug)) continue;
    const without = chosen.filter((_, k) => k !== i);
    for (let j = 0; j < rest.length; j++) {
      const gain = f([...without, rest[j]].sort(bySlug)) - value;
      if (gain > (best?.gain ?? EPSILON)) best = { out: [i], in: [j], gain };
    }
  }
  return best;
}

/**
 * Best pair swap (two out, two in). Only tried once no single swap helps; the two incoming items
 * come from the outsiders that would add most to the reduced mix, so the cost stays near one
 * greedy step per pair taken out.
 */
function bestPairSwap<T extends { slug: string }>(chosen: T[], rest: T[], value: number, f: Objective<T>, locked: Set<string>): Move | null {
  let best: Move | null = null;
  for (let a = 0; a < chosen.length; a++) {
    for (let b = a + 1; b < chosen.length; b++) {
      if (locked.has(chosen[a].slug) || locked.has(chosen[b].slug)) continue;
      const reduced = chosen.filter((_, k) => k !== a && k !== b);
      const top = rest
        .map((r, j) => ({ j, v: f([...reduced, r].sort(bySlug)) }))
        .sort((x, y) => y.v - x.v || x.j - y.j)
        .slice(0, PAIR_REFILL_POOL);
      for (let x = 0; x < top.length; x++) {
        for (let y = x + 1; y < top.length; y++) {
          const gain = f([...reduced, rest[top[x].j], rest[top[y].j]].sort(bySlug)) - value;
          if (gain > (best?.gain ?? EPSILON)) best = { out: [a, b], in: [top[x].j, top[y].j], gain };
        }
      }
    }
  }
  return best;
}

/**
 * Chooses `size` items maximising `objective`: greedy (add the item with the largest gain) from the
 * locked items, then local search until no move improves: best single swap, and when none helps,
 * the best pair swap. Ties go to the smaller slug and sets are always evaluated in slug order, so
 * the same input gives the same answer in any input order.
 */
export function optimiseSelection<T extends { slug: string }>(
  candidates: readonly T[], size: number, objective: Objective<T>, options: SelectionOptions = {},
): Selection<T> {
  const excluded = new Set(options.excluded ?? []);
  const seen = new Set<string>();
  const pool = [...candidates].sort(bySlug).filter((c) => !excluded.has(c.slug) && !seen.has(c.slug) && seen.add(c.slug));
  const locked = new Set(options.locked ?? []);
  let chosen = pool.filter((c) => locked.has(c.slug));
  let rest = pool.filter((c) => !locked.has(c.slug));

  while (chosen.length < size && rest.length > 0) {
    let best = 0;
    let bestValue = -Infinity;
    for (let i = 0; i < rest.length; i++) {
      const v = objective([...chosen, rest[i]].sort(bySlug));
      if (v > bestValue + EPSILON) [best, bestValue] = [i, v];
    }
    chosen = [...chosen, rest[best]].sort(bySlug);
    rest = rest.filter((_, i) => i !== best);
  }

  let value = objective(chosen);
  let swaps = 0;
  while (swaps < MAX_MOVES) {
    const move = bestSingleSwap(chosen, rest, value, objective, locked) ?? bestPairSwap(chosen, rest, value, objective, locked);
    if (move === null) break;
    const leaving = chosen.filter((_, k) => move.out.includes(k));
    chosen = [...chosen.filter((_, k) => !move.out.includes(k)), ...rest.filter((_, k) => move.in.includes(k))].sort(bySlug);
    rest = [...rest.filter((_, k) => !move.in.includes(k)), ...leaving].sort(bySlug);
    value = objective(chosen);
    swaps++;
  }
  return { chosen, value, swaps };
}
