import { wordsFor } from '@homeground/shared';
import { describe, expect, it } from 'vitest';
import { createI18n } from '../../../lib/i18n/index.js';
import { fixtureMix } from '../testing/mix-fixtures.js';
import { mixCsv } from './export-csv.js';
import { mixRows } from './mix-rows.js';

// Quantities, roles, bloom months and heights are the hand-built fixture's (testing/mix-fixtures.ts);
// quoting follows RFC 4180; 30–90 cm is 12–35 in at 2.54 cm to the inch.
describe('mix CSV', () => {
  it('has one line per species with its role, bloom, height, plants, spacing in both units, seeds and weight', () => {
    const mix = fixtureMix();
    mix.species['test-mid'] = { ...mix.species['test-mid'], commonName: 'bergamot, "test" kind' };
    const lines = mixCsv(mixRows(mix, [], []), createI18n('en').getFixedT('en', 'mix'), wordsFor('en'))
      .trimEnd()
      .split('\r\n');
    expect(lines[0]).toBe(
      'Scientific name,Common name,Role in the mix,Bloom months,Height (in),Height (cm),Plants,Spacing (in),Spacing (cm),Seeds to sow,Seed weight (g),Seed weight (oz)',
    );
    expect(lines[1]).toBe(
      'Testia prima,early test aster,one of 3 early bloomers,Apr–Jun,12–35,30–90,10,18,46,30,0.05,0.0018',
    );
    expect(lines[3]).toBe(
      'Testia tertia,"bergamot, ""test"" kind",middle of the bed,Jun–Aug,12–35,30–90,12,18,46,36,0.05,0.0018',
    );
    // Months that skip one read as two runs; the phrase's comma-free "and" keeps the cell unquoted.
    expect(lines[4]).toMatch(/^Testia quarta,late test goldenrod,middle of the bed,Jul–Aug and Oct,12–35,30–90,/);
    // No seed weight known: the weight cells stay empty rather than 0.
    expect(lines[5]).toBe('Testcarex quinta,test sedge,middle of the bed,May–Jun and Sep,12–35,30–90,14,18,46,42,,');
  });

  // The headers and month names follow the page's language (es catalogue, shared Spanish month words);
  // the numbers stay spreadsheet-plain.
  it('writes a Spanish file when the page is in Spanish', () => {
    const lines = mixCsv(mixRows(fixtureMix(), [], []), createI18n('es').getFixedT('es', 'mix'), wordsFor('es'))
      .trimEnd()
      .split('\r\n');
    expect(lines[0]).toBe(
      'Nombre científico,Nombre común,Papel en la mezcla,Meses de floración,Altura (in),Altura (cm),Plantas,Distancia (in),Distancia (cm),Semillas a sembrar,Peso de la semilla (g),Peso de la semilla (oz)',
    );
    expect(lines[1]).toMatch(/^Testia prima,early test aster,[^,]+,abr–jun,12–35,30–90,10,18,46,30,0.05,0.0018$/);
  });
});
