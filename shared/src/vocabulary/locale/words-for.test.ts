import { describe, expect, it } from 'vitest';
import { wordsFor } from './words-for.js';

// Spanish gardening words and calendar abbreviations are from-memory (ordinary usage in the US and
// Mexico); list joins come from Intl.ListFormat (CLDR), which writes "u" before an o-sound.
describe('wordsFor', () => {
  const es = wordsFor('es');
  const en = wordsFor('en');

  it('keeps English as the catalogue says it', () => {
    expect(en.sunPhrase(['shade', 'full'])).toBe('Full sun or shade');
    expect(en.bloomWords([6, 7, 8])).toBe('Blooms Jun–Aug');
  });

  it.each([
    [es.sunPhrase(['shade', 'full']), 'Pleno sol o sombra'],
    [es.moisturePhrase(['wet', 'medium']), 'Suelo fresco o húmedo'],
    [es.bloomWords([6, 7, 8]), 'Florece jun–ago'],
    [es.bloomWords([4, 5, 9]), 'Florece abr–may y sept'],
    [es.bloomWords([]), 'Sin meses de floración registrados'],
    [es.formatMonths([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]), 'todo el año'],
    [es.describeGround('part', 'dry'), 'media sombra y suelo seco'],
    [es.siteShortWords(['part', 'full'], ['medium', 'dry']), 'pleno sol/media sombra · seco/fresco'],
    [es.treatmentShortWords({ kind: 'cold-moist', days: 60 }), 'estrat. fría 60 d'],
    [es.sowingDepthSentence({ needsLight: false, sowingDepthMm: 6 }), 'Siembra a 6 mm (¼ pulg.) de profundidad.'],
    [es.join(['siete', 'ocho'], 'or'), 'siete u ocho'],
  ])('Spanish phrase "%s"', (actual, expected) => {
    expect(actual).toBe(expected);
  });

  it('has a Spanish caution for every kind the English table has', () => {
    expect(Object.keys(es.caution).sort()).toEqual(Object.keys(en.caution).sort());
    expect(es.caution['sap-irritant'].sentence).toBe('Su savia puede irritar la piel y los ojos.');
  });
});
