import { describe, expect, it } from 'vitest';
import { makeSpecies } from '../scoring/__tests__/species-fixtures.js';
import { careSheetFor } from './care-sheet.js';

// Butterfly milkweed's sap caution: milky sap that irritates eyes is the usual handling caution for
// Asclepias (common practice, from memory); the words are Homeground's own (vocabulary tables).
const milkweed = makeSpecies({
  slug: 'asclepias-tuberosa',
  scientificName: 'Asclepias tuberosa',
  commonNames: ['butterfly milkweed'],
  sun: ['full'],
  moisture: ['dry', 'medium'],
  cautions: [
    { kind: 'sap-irritant', text: 'Milky sap irritates eyes: wash hands after handling.', source: 'from-memory' },
  ],
});

describe('careSheetFor', () => {
  it('keeps the English care sheet as it was', () => {
    const en = careSheetFor(milkweed, 'en');
    expect(en.cautions).toEqual(['Irritating sap: Milky sap irritates eyes: wash hands after handling.']);
    expect(en.spacing).toMatch(/^Plant \d+ in \(\d+ cm\) apart\.$/);
  });

  it('says the sheet in Spanish, the caution in Spanish first and the record sentence marked as English', () => {
    const es = careSheetFor(milkweed, 'es');
    expect(es.commonName).toBe('butterfly milkweed');
    expect(es.cautions).toEqual([
      'Savia irritante: Su savia puede irritar la piel y los ojos. En la ficha (en inglés): Milky sap irritates eyes: wash hands after handling.',
    ]);
    expect(es.spacing).toMatch(/^Planta a \d+ in \(\d+ cm\) de distancia\.$/);
    expect(es.sun).toMatch(/^Mejor a /);
  });
});
