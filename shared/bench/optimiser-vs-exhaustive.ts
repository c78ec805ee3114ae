import { exhaustiveBest } from '../src/palette-balancing/exhaustive.js';
import { optimiseSelection } from '../src/palette-balancing/optimiser.js';
import { randomInstance } from './random-instances.js';
import { timeOnce } from './timing.js';

/** The optimiser takes well under a millisecond here: repeat it so its total is well above the timer's resolution. */
const REPEATS = 50;

/**
 * The optimiser against brute force on seeded instances: quality (found ÷ optimum) and speed
 * (brute-force time ÷ optimiser time, summed over the instances). Brute force calls the objective
 * on every subset, as exhaustiveBest does in the tests; the optimiser uses its incremental evaluator.
 * Seeds 1…instances.
 */
export function optimiserVsExhaustive(instances: number, minItems: number, maxItems: number, size: number) {
  let minRatio = Infinity;
  let sumRatio = 0;
  let exact = 0;
  let optimiserMs = 0;
  let exhaustiveMs = 0;
  const all = Array.from({ length: instances }, (_, k) => randomInstance(k + 1, minItems, maxItems, size));
  // Both sides run once untimed first, so neither pays for the JIT compiling it.
  for (const { items, objective } of all) {
    optimiseSelection(items, size, objective);
    exhaustiveBest(items, size, objective);
  }
  for (const { items, objective } of all) {
    const found = timeOnce(() => {
      let r = optimiseSelection(items, size, objective);
      for (let k = 1; k < REPEATS; k++) r = optimiseSelection(items, size, objective);
      return r;
    });
    const best = timeOnce(() => exhaustiveBest(items, size, objective));
    optimiserMs += found.ms / REPEATS;
    exhaustiveMs += best.ms;
    const ratio = found.result.value / best.result.value;
    minRatio = Math.min(minRatio, ratio);
    sumRatio += ratio;
    if (Math.abs(found.result.value - best.result.value) < 1e-9) exact++;
  }
  const r4 = (x: number) => Math.round(x * 1e4) / 1e4;
  return {
    instances,
    candidates: `${minItems}-${maxItems}`,
    size,
    minRatio: r4(minRatio),
    meanRatio: r4(sumRatio / instances),
    exactlyOptimal: exact,
    optimiserMs: r4(optimiserMs),
    exhaustiveMs: r4(exhaustiveMs),
    speedup: Math.round(exhaustiveMs / optimiserMs),
  };
}
