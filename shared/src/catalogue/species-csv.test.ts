import { describe, expect, it } from 'vitest';
import { ziziaAurea } from '../testing/species-fixtures.js';
import { speciesSchema } from '../types/species.js';
import { csvRowToSpecies, speciesToCsvRow } from './species-csv.js';

const record = speciesSchema.parse({
  ...ziziaAurea,
  cautions: [
    { kind: 'look-alike', text: 'Looks like poison hemlock when young: learn the difference.', source: 'from-memory' },
  ],
  germination: {
    ...ziziaAurea.germination,
    treatments: [{ kind: 'cold-moist', days: 60, note: 'sow in fall; or chill' }],
  },
});

describe('species CSV mapping', () => {
  it('round-trips a record through a CSV row unchanged, a ";" in a treatment note included', () => {
    const row = speciesToCsvRow(record);
    // The note cannot be written as kind:days:note;… without changing, so the cell carries JSON.
    expect(JSON.parse(row.treatments)).toEqual(record.germination.treatments);
    const back = csvRowToSpecies(row, 2);
    expect(back.errors).toEqual([]);
    expect(back.species).toEqual(record);
  });

  it('writes plain treatments as editable text and reads them back', () => {
    const plain = speciesSchema.parse({
      ...record,
      germination: {
        ...record.germination,
        treatments: [
          { kind: 'cold-moist', days: 60 },
          { kind: 'scarification', note: 'rub on sandpaper' },
        ],
      },
    });
    const row = speciesToCsvRow(plain);
    expect(row.treatments).toBe('cold-moist:60;scarification:rub on sandpaper');
    expect(csvRowToSpecies(row, 2).species).toEqual(plain);
  });

  it.each([
    ['heightMaxCm', 'tall', 'heightMaxCm'],
    ['nativeStates', 'WI;XX', 'nativeStates'],
    ['treatments', 'cold-moist', 'treatments'],
    ['treatments', '[{"kind":', 'treatments'],
    ['sources', '{not json', 'sources'],
    ['monarchHost', 'maybe', 'monarchHost'],
  ])('reports a bad %s cell with its line number and column', (column, value, field) => {
    const row = { ...speciesToCsvRow(record), [column]: value };
    const { species, errors } = csvRowToSpecies(row, 7);
    expect(species).toBeUndefined();
    expect(errors).toEqual(expect.arrayContaining([expect.objectContaining({ row: 7, field })]));
  });
});
