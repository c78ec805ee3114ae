import type { MixEvaluator } from './mix-evaluator.js';

/** Improvements smaller than this are float noise, not a better mix (stops swap cycles). */
export const EPSILON = 1e-9;
/** Far above float rounding in the bounds (~1e-13), far below any gain that matters. */
const BOUND_SLACK = 1e-6;
/** Pair moves refill from the best few outsiders only, which keeps them cheap on a big catalogue. */
const PAIR_REFILL_POOL = 6;

/** The mix being searched: pool indices, `chosen` ascending (= slug order). */
export interface SearchState {
  ev: MixEvaluator;
  inMix: Uint8Array;
  locked: Uint8Array;
  chosen: number[];
  value: number;
}

export interface Move {
  out: number[];
  in: number[];
  gain: number;
}

/**
 * Best single swap (one unlocked chosen item out, one outsider from `outs` in), or null if none
 * improves. Each trial is remove/add on the evaluator and a read: no arrays built.
 */
export function bestSingleSwap(s: SearchState, outs: readonly number[]): Move | null {
  let best: Move | null = null;
  let bestGain = EPSILON;
  const bounds = s.ev.gainBounds;
  for (const i of s.chosen) {
    if (s.locked[i]) continue;
    s.ev.remove(i);
    // gain = (what j adds to the mix without i) − (what i added) ≤ bound[j] − loss; an outsider
    // whose bound cannot beat the best gain so far is skipped untried (BOUND_SLACK covers rounding).
    const loss = s.value - s.ev.value();
    for (const j of outs) {
      if (s.inMix[j]) continue;
      if (bounds && bounds[j] - loss < bestGain - BOUND_SLACK) continue;
      s.ev.add(j);
      const gain = s.ev.value() - s.value;
      s.ev.remove(j);
      if (gain > bestGain) [best, bestGain] = [{ out: [i], in: [j], gain }, gain];
    }
    s.ev.add(i);
  }
  return best;
}

/**
 * Best pair swap (two out, two in). Only tried once no single swap helps; the two incoming items
 * come from the outsiders that would add most to the reduced mix (ties to the smaller slug), so the
 * cost stays near one greedy step per pair taken out.
 */
export function bestPairSwap(s: SearchState, outs: readonly number[]): Move | null {
  let best: Move | null = null;
  let bestGain = EPSILON;
  const topJ = new Int32Array(PAIR_REFILL_POOL);
  const topV = new Float64Array(PAIR_REFILL_POOL);
  const { chosen, ev } = s;
  const bounds = ev.gainBounds;
  for (let a = 0; a < chosen.length; a++) {
    if (s.locked[chosen[a]]) continue;
    for (let b = a + 1; b < chosen.length; b++) {
      if (s.locked[chosen[b]]) continue;
      ev.remove(chosen[a]);
      ev.remove(chosen[b]);
      const reduced = ev.value();
      let count = 0;
      for (const j of outs) {
        if (s.inMix[j]) continue;
        // Once the refill list is full, an outsider whose bound cannot beat its last entry is skipped.
        if (bounds && count === PAIR_REFILL_POOL && reduced + bounds[j] < topV[count - 1] - BOUND_SLACK) continue;
        ev.add(j);
        const v = ev.value();
        ev.remove(j);
        count = insertTop(topJ, topV, count, j, v);
      }
      for (let x = 0; x < count; x++) {
        for (let y = x + 1; y < count; y++) {
          // value(reduced + x + y) ≤ value(reduced + x) + bound[y]: skip pairs that cannot win.
          if (bounds && topV[x] + bounds[topJ[y]] - s.value < bestGain - BOUND_SLACK) continue;
          ev.add(topJ[x]);
          ev.add(topJ[y]);
          const gain = ev.value() - s.value;
          ev.remove(topJ[x]);
          ev.remove(topJ[y]);
          if (gain > bestGain) [best, bestGain] = [{ out: [chosen[a], chosen[b]], in: [topJ[x], topJ[y]], gain }, gain];
        }
      }
      ev.add(chosen[a]);
      ev.add(chosen[b]);
    }
  }
  return best;
}

/**
 * Keeps the best `topJ.length` values seen, best first; an equal value goes after those already
 * kept, so ties go to the earlier (smaller-slug) outsider as a stable sort would.
 */
function insertTop(topJ: Int32Array, topV: Float64Array, count: number, j: number, v: number): number {
  const cap = topJ.length;
  if (count === cap && v <= topV[cap - 1]) return count;
  let at = count < cap ? count : cap - 1;
  while (at > 0 && topV[at - 1] < v) {
    topJ[at] = topJ[at - 1];
    topV[at] = topV[at - 1];
    at--;
  }
  topJ[at] = j;
  topV[at] = v;
  return count < cap ? count + 1 : count;
}

/** Applies a move to the search state: evaluator, membership and the sorted chosen list. */
export function applyMove(s: SearchState, move: Move): void {
  for (const i of move.out) {
    s.ev.remove(i);
    s.inMix[i] = 0;
  }
  for (const j of move.in) {
    s.ev.add(j);
    s.inMix[j] = 1;
  }
  s.chosen = s.chosen
    .filter((i) => s.inMix[i])
    .concat(move.in)
    .sort((x, y) => x - y);
  s.value = s.ev.value();
}
