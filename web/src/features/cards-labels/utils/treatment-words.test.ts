import { describe, expect, it } from 'vitest';
import { treatmentSentences, treatmentShort } from './treatment-words.js';

// Inputs mirror species-data records (Asclepias tuberosa: cold-moist 30 d, 6 mm deep;
// a Baptisia-style scarification + inoculant). The abbreviations CMS/WMS are the trade's
// short forms for cold-moist and warm-moist stratification (from-memory).
describe('treatment words', () => {
  it('says how to cold-moist stratify in plain words, then adds the record note', () => {
    const [sentence] = treatmentSentences({
      treatments: [{ kind: 'cold-moist', days: 30, note: 'Chill damp, never dry.' }],
    });
    expect(sentence).toBe(
      'Cold-moist stratification, 30 days: mix the seed with damp sand in a sealed bag in the refrigerator. Chill damp, never dry.',
    );
  });

  it('keeps the order of a warm-then-cold treatment', () => {
    const sentences = treatmentSentences({
      treatments: [
        { kind: 'warm-moist', days: 90 },
        { kind: 'cold-moist', days: 90 },
      ],
    });
    expect(sentences[0]).toMatch(/^Warm-moist stratification, 90 days/);
    expect(sentences[1]).toMatch(/^Cold-moist stratification, 90 days/);
  });

  it('falls back to default words for scarification and says when nothing is needed', () => {
    expect(treatmentSentences({ treatments: [{ kind: 'scarification' }] })[0]).toMatch(/Nick or sand the seed coat/);
    expect(treatmentSentences({ treatments: [{ kind: 'none' }] })[0]).toBe(
      'No treatment needed: sow the seed as it comes.',
    );
    expect(treatmentSentences({ treatments: [{ kind: 'scarification', note: 'Rub on sandpaper.' }] })[0]).toBe(
      'Rub on sandpaper.',
    );
  });

  it.each([
    [{ treatments: [{ kind: 'cold-moist' as const, days: 60 }], needsLight: false, sowingDepthMm: 3 }, 'CMS 60 d'],
    [
      {
        treatments: [
          { kind: 'warm-moist' as const, days: 90 },
          { kind: 'cold-moist' as const, days: 90 },
        ],
        needsLight: false,
        sowingDepthMm: 6,
      },
      'WMS 90 d + CMS 90 d',
    ],
    [
      {
        treatments: [{ kind: 'scarification' as const }, { kind: 'inoculant' as const }],
        needsLight: false,
        sowingDepthMm: 6,
      },
      'scarify + inoculate',
    ],
    [{ treatments: [{ kind: 'none' as const }], needsLight: true, sowingDepthMm: 0 }, 'no treatment · surface sow'],
  ])('labels %j as "%s"', (germination, expected) => {
    expect(treatmentShort(germination)).toBe(expected);
  });
});
