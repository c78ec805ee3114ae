import { describe, expect, it } from 'vitest';
import { MIN_SEEDS_FOR_REACHED_RATE, reachedGerminationPct } from './reached-germination.js';

// Germination rate is seedlings over seeds sown: the ordinary definition of a germination
// percentage (common practice, from memory); the minimum sample is our own rule of thumb.
describe('reachedGerminationPct', () => {
  it.each([
    [{ sown: 150, germinated: 81 }, 54],
    [{ sown: 200, germinated: 125 }, 63], // 62.5 rounds up
    [{ sown: 40, germinated: 0 }, 1], // nothing came up: the lowest rate a target can hold
    [{ sown: 60, germinated: 75 }, 100], // more logged up than sown (self-sown extras) caps at 100
    [{ sown: MIN_SEEDS_FOR_REACHED_RATE - 1, germinated: 20 }, null], // too few seeds to say
    [{ sown: 0, germinated: 0 }, null],
  ])('%o → %s', (past, pct) => {
    expect(reachedGerminationPct(past)).toBe(pct);
  });
});
