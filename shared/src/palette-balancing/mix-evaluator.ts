/**
 * A mix objective: items (in slug order) → value to maximise. `evaluator`, when present, gives the
 * same value incrementally (add or remove one item in O(1)), which the optimiser uses for its
 * millions of trial moves; without it the optimiser re-evaluates whole sets. Declared here, not in
 * objective.ts, so that objective.ts → palette-evaluator.ts → mix-evaluator.ts has no way back.
 */
export interface Objective<T> {
  (items: readonly T[]): number;
  evaluator?: (pool: readonly T[]) => MixEvaluator;
}

/**
 * A mix under construction, over a fixed pool of candidates named by their index in it (the pool
 * is in slug order). The optimiser tries each move by adding and removing items and reading the
 * value, then undoing, so no trial builds or sorts an array.
 */
export interface MixEvaluator {
  add(index: number): void;
  remove(index: number): void;
  /** The objective of the items now in the mix. */
  value(): number;
  /**
   * Optional: per pool item, an upper bound on what adding it can add to any mix without it. Lets
   * a search skip items that cannot beat the best move found so far, without trying them.
   */
  readonly gainBounds?: Float64Array;
}

/**
 * The fallback for an objective with no incremental form: keeps the mix as a sorted index list and
 * re-evaluates the whole set (in slug order, as the objective expects) on every read. Exact but
 * O(mix size) per read, which is fine for the small lists such objectives are used on.
 */
export function recomputingEvaluator<T>(pool: readonly T[], objective: Objective<T>): MixEvaluator {
  const members: number[] = [];
  const items: T[] = [];
  return {
    add(index) {
      let at = members.length;
      while (at > 0 && members[at - 1] > index) at--;
      members.splice(at, 0, index);
    },
    remove(index) {
      const at = members.indexOf(index);
      if (at >= 0) members.splice(at, 1);
    },
    value() {
      items.length = members.length;
      for (let k = 0; k < members.length; k++) items[k] = pool[members[k]];
      return objective(items);
    },
  };
}
