import { describe, expect, it } from 'vitest';
import type { Site } from '../../types/site.js';
import { ALL_FIXTURES, LARKFIELD } from '../__tests__/species-fixtures.js';
import { scoreSpecies } from '../score-species.js';
import { partsIn, reasonIn } from './reasons-in.js';

// The Spanish words are the shared tables' (vocabulary/locale/spanish-words.ts, from memory as they
// say); what is checked here is that every sentence the engine writes has its Spanish twin.
describe('reasonIn', () => {
  it.each([
    ['Native to Wisconsin.', 'Nativa de Wisconsin.'],
    [
      'Grows in full sun or part shade; your ground has full sun.',
      'Crece a pleno sol o media sombra; tu terreno tiene pleno sol.',
    ],
    ['Takes dry or medium-moist soil; your soil is dry.', 'Aguanta suelo seco o fresco; tu suelo es seco.'],
    ['Blooms Jun–Aug and Oct, when your mix has least.', 'Florece jun–ago y oct, cuando tu mezcla tiene menos.'],
    ['one of 3 early bloomers', 'una de 3 que florecen temprano'],
    ['middle of the bed', 'en medio del arriate'],
    [
      'Late summer and fall (August to October): at least 3 species in flower every month, so something is in flower from spring to frost',
      'Finales del verano y otoño (de agosto a octubre): al menos 3 especies en flor cada mes, para que siempre haya algo en flor de la primavera a las heladas',
    ],
    [
      "Homeground's catalogue holds native plants of the eastern and central United States and does not cover your state yet, so it does not recommend plants there: eastern plants would be the wrong choice. A native-plant society or extension office near you can help.",
      'El catálogo de Homeground reúne plantas nativas del este y el centro de Estados Unidos y todavía no cubre tu estado, así que no recomienda plantas allí: las plantas del este no serían una buena elección. Una sociedad de plantas nativas o la oficina de extensión más cercana pueden ayudarte.',
    ],
    [
      '200 ft² (18.6 m²) has room for about 7 species, each in a group of several plants.',
      'En 200 ft² (18.6 m²) caben unas 7 especies, cada una en un grupo de varias plantas.',
    ],
  ])('%s', (english, spanish) => {
    expect(reasonIn(english, 'es')).toBe(spanish);
    expect(reasonIn(english, 'en')).toBe(english);
  });

  it('leaves a sentence the catalogue wrote as it was, and says the engine sentence after it', () => {
    expect(reasonIn('Cedar waxwings eat the berries.', 'es')).toBe('Cedar waxwings eat the berries.');
    expect(
      reasonIn(
        'Cedar waxwings eat the berries. Its many caterpillars are food for nesting birds, which raise their young on them.',
        'es',
      ),
    ).toBe(
      'Cedar waxwings eat the berries. Sus muchas orugas alimentan a las aves que anidan, que crían a sus polluelos con ellas.',
    );
  });

  // Every part the engine writes for the fixture species on several grounds, said in Spanish: none
  // may come back as the English sentence (a new engine sentence without its twin fails here).
  it('has a Spanish twin for every reason the engine gives the fixtures', () => {
    const sites: Site[] = [
      {
        sun: 'full',
        moisture: 'dry',
        areaSqFt: 60,
        deerPressure: 'high',
        goals: ['monarchs', 'low-spreaders'],
        soilTexture: 'sand',
        maxHeightCm: 80,
      },
      {
        sun: 'part',
        moisture: 'medium',
        areaSqFt: 200,
        deerPressure: 'medium',
        goals: ['pollinators', 'birds'],
        soilTexture: 'clay',
      },
      { sun: 'shade', moisture: 'wet', areaSqFt: 2000, deerPressure: 'low', goals: ['rain-garden', 'shade-garden'] },
    ];
    const untranslated = new Set<string>();
    for (const site of sites) {
      for (const species of ALL_FIXTURES) {
        const scored = scoreSpecies(species, site, LARKFIELD);
        const parts = scored.parts;
        const out = scored.ineligibleReason;
        if (out !== undefined && reasonIn(out, 'es') === out) untranslated.add(out);
        partsIn(parts, 'es').forEach((p, i) => {
          // The catalogue's own notes (pollinators, birds) are its words, not the engine's.
          const catalogueText = p.reason === species.wildlife.pollinators || p.reason === species.wildlife.birds;
          if (p.reason === parts[i].reason && !catalogueText) untranslated.add(p.reason);
        });
      }
    }
    expect([...untranslated]).toEqual([]);
  });
});
