import { describe, expect, it } from 'vitest';
import { mmToInchWords, sowingDepthSentence } from './sowing-depth.js';

// Inch fractions: 1 in = 25.4 mm exactly (international inch, 1959), so ⅛ in = 3.175 mm.
describe('sowing depth in plain words', () => {
  it.each([
    [3, '⅛ in'],
    [6, '¼ in'],
    [10, '⅜ in'],
    [13, '½ in'],
    [25, '1 in'],
    [1, '⅛ in'],
    [38, '1 ½ in'],
  ])('%i mm reads as %s', (mm, words) => {
    expect(mmToInchWords(mm)).toBe(words);
  });

  it('says to surface sow seed that needs light', () => {
    expect(sowingDepthSentence({ needsLight: true, sowingDepthMm: 0 })).toMatch(/surface sow.*do not cover/i);
    expect(sowingDepthSentence({ needsLight: false, sowingDepthMm: 0 })).toBe(
      'Surface sow, pressing the seed onto the soil.',
    );
  });

  // Butterfly milkweed is sown 6 mm deep (species-data/species/asclepias-tuberosa.json).
  it('gives the depth in mm and inches side by side', () => {
    expect(sowingDepthSentence({ needsLight: false, sowingDepthMm: 6 })).toBe('Sow 6 mm (¼ in) deep.');
  });
});
