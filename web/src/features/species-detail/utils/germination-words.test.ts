import { describe, expect, it } from 'vitest';
import { mmToInchWords, sowingDepthWords, treatmentWords } from './germination-words.js';

// Inch fractions: 1 in = 25.4 mm exactly (international inch, 1959), so ⅛ in = 3.175 mm.
describe('sowing depth in plain words', () => {
  it.each([
    [3, '⅛ in'],
    [6, '¼ in'],
    [10, '⅜ in'],
    [13, '½ in'],
    [25, '1 in'],
    [1, '⅛ in'],
  ])('%i mm reads as %s', (mm, words) => {
    expect(mmToInchWords(mm)).toBe(words);
  });

  it('says to surface sow seed that needs light', () => {
    expect(sowingDepthWords({ needsLight: true, sowingDepthMm: 0 })).toMatch(/surface sow.*do not cover/i);
  });

  // Butterfly milkweed is sown 6 mm deep (species-data/species/asclepias-tuberosa.json).
  it('gives the depth in mm and inches side by side', () => {
    expect(sowingDepthWords({ needsLight: false, sowingDepthMm: 6 })).toBe('Sow 6 mm (¼ in) deep.');
  });
});

describe('treatment steps', () => {
  // Butterfly milkweed: cold-moist 30 days (species-data/species/asclepias-tuberosa.json).
  it('explains cold-moist stratification with the days and the refrigerator', () => {
    const step = treatmentWords({ kind: 'cold-moist', days: 30 });
    expect(step.title).toBe('Cold-moist stratification, 30 days');
    expect(step.body).toMatch(/damp sand.*paper towel/);
    expect(step.body).toMatch(/refrigerator, not the freezer, for 30 days \(about 4 weeks\)/);
  });

  it('keeps the record’s own note beside the plain words', () => {
    expect(treatmentWords({ kind: 'scarification', note: 'Nick the seed coat.' }).note).toBe('Nick the seed coat.');
  });
});
