import { describe, expect, it } from 'vitest';
import { bloomLabel, bloomRange } from './bloom-label.js';

// Bloom months as the catalogue stores them (species-data/species/*.json, 1 = January). The
// butterfly milkweed row is species-data/species/asclepias-tuberosa.json ([6, 7, 8]).
describe('bloom strip label', () => {
  it.each([
    [[6, 7, 8], 'Blooms Jun–Aug'],
    [[5], 'Blooms May'],
    [[8, 6, 7], 'Blooms Jun–Aug'],
    [[4, 5, 9], 'Blooms Apr–May and Sep'],
    [[3, 5, 7], 'Blooms Mar, May and Jul'],
    [[11, 12, 1, 2], 'Blooms Nov–Feb'],
    [[12, 1], 'Blooms Dec–Jan'],
    [[1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], 'Blooms all year'],
    [[], 'No bloom months recorded'],
  ])('%j reads "%s"', (months, expected) => {
    expect(bloomLabel(months)).toBe(expected);
  });

  it('gives the bare range for the visible text beside the strip', () => {
    expect(bloomRange([7, 8, 9, 10])).toBe('Jul–Oct');
    expect(bloomRange([])).toBe('');
  });
});
