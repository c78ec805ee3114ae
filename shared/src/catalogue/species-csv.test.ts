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
  it('round-trips a record through a CSV row unchanged (apart from ";" in notes)', () => {
    const back = csvRowToSpecies(speciesToCsvRow(record), 2);
    expect(back.errors).toEqual([]);
    expect(back.species).toEqual({
      ...record,
      germination: {
        ...record.germination,
        treatments: [{ kind: 'cold-moist', days: 60, note: 'sow in fall, or chill' }],
      },
    });
  });

  it.each([
    ['heightMaxCm', 'tall', 'heightMaxCm'],
    ['nativeStates', 'WI;XX', 'nativeStates'],
    ['treatments', 'cold-moist', 'treatments'],
    ['sources', '{not json', 'sources'],
    ['monarchHost', 'maybe', 'monarchHost'],
  ])('reports a bad %s cell with its line number and column', (column, value, field) => {
    const row = { ...speciesToCsvRow(record), [column]: value };
    const { species, errors } = csvRowToSpecies(row, 7);
    expect(species).toBeUndefined();
    expect(errors).toEqual(expect.arrayContaining([expect.objectContaining({ row: 7, field })]));
  });
});
