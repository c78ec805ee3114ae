import { describe, expect, it } from 'vitest';
import { mixSizeForArea } from './mix-size.js';

// Homeground's documented rule (mix-size.ts); from 250 ft² a mix holds CP42's 9 flowering species (CP42-IN) plus grasses.
describe('mixSizeForArea', () => {
  it.each([
    [20, 3],
    [50, 5],
    [99, 5],
    [100, 7],
    [249, 7],
    [250, 11],
    [600, 13],
    [1500, 16],
    [5000, 20],
    [43_560, 25],
  ])('%d ft² → %d species', (area, size) => {
    expect(mixSizeForArea(area).size).toBe(size);
  });

  it('explains itself with both units', () => {
    expect(mixSizeForArea(200).reason).toBe(
      '200 ft² (18.6 m²) has room for about 7 species, each in a group of several plants.',
    );
  });
});
