import { describe, expect, it } from 'vitest';
import { fixtureMix } from '../testing/mix-fixtures.js';
import { mixCsv } from './export-csv.js';
import { mixRows } from './mix-rows.js';

// Quantities are the hand-built fixture's; quoting follows RFC 4180.
describe('mix CSV', () => {
  it('has one line per species with plants, spacing in both units, seeds and weight', () => {
    const mix = fixtureMix();
    mix.species['test-mid'] = { ...mix.species['test-mid'], commonName: 'bergamot, "test" kind' };
    const lines = mixCsv(mixRows(mix, [], []))
      .trimEnd()
      .split('\r\n');
    expect(lines[0]).toBe(
      'Scientific name,Common name,Plants,Spacing (in),Spacing (cm),Seeds to sow,Seed weight (g),Seed weight (oz)',
    );
    expect(lines[1]).toBe('Testia prima,early test aster,10,18,46,30,0.05,0.0018');
    expect(lines[3]).toBe('Testia tertia,"bergamot, ""test"" kind",12,18,46,36,0.05,0.0018');
    // No seed weight known: the weight cells stay empty rather than 0.
    expect(lines[5]).toBe('Testcarex quinta,test sedge,14,18,46,42,,');
  });
});
