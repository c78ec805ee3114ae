import { describe, expect, it } from 'vitest';
import { treatmentWords } from './germination-words.js';

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
