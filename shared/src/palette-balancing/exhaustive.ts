import type { Objective } from './mix-evaluator.js';

/** Beyond this many subsets brute force is a mistake, not a benchmark. */
const MAX_SUBSETS = 5_000_000;

function binomial(n: number, k: number): number {
  let r = 1;
  for (let i = 1; i <= k; i++) r = (r * (n - k + i)) / i;
  return r;
}

/**
 * The true optimum by brute force over every `size`-subset, for tests and benchmarks of the
 * optimiser on small candidate lists. Subsets are evaluated in slug order, as the optimiser does.
 */
export function exhaustiveBest<T extends { slug: string }>(
  candidates: readonly T[],
  size: number,
  objective: Objective<T>,
): { chosen: T[]; value: number } {
  const items = [...candidates].sort((a, b) => (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0));
  const k = Math.min(size, items.length);
  if (binomial(items.length, k) > MAX_SUBSETS) {
    throw new Error(`exhaustiveBest: C(${items.length}, ${k}) subsets is too many; use a smaller list`);
  }
  let best: T[] = [];
  let bestValue = -Infinity;
  const pick: T[] = [];
  const walk = (start: number) => {
    if (pick.length === k) {
      const v = objective(pick);
      if (v > bestValue) [best, bestValue] = [[...pick], v];
      return;
    }
    for (let i = start; i <= items.length - (k - pick.length); i++) {
      pick.push(items[i]);
      walk(i + 1);
      pick.pop();
    }
  };
  walk(0);
  return { chosen: best, value: bestValue };
}
