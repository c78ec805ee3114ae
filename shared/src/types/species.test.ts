import { describe, expect, it } from 'vitest';
import { ziziaAurea as valid } from '../testing/species-fixtures.js';
import { speciesSchema } from './species.js';

describe('speciesSchema (the catalogue record shape)', () => {
  it('accepts a complete record and fills the optional lists', () => {
    const parsed = speciesSchema.parse(valid);
    expect(parsed.synonyms).toEqual([]);
    expect(parsed.cautions).toEqual([]);
  });

  it.each([
    ['a state outside the conterminous US', { nativeStates: ['HI'] }, 'nativeStates'],
    ['a thirteenth month', { bloomMonths: [13] }, 'bloomMonths'],
    ['a height range upside down', { heightCm: { min: 90, max: 30 } }, 'heightCm'],
    ['a family that is not a family name', { family: 'Umbellifers' }, 'family'],
    ['an author in the scientific name', { scientificName: 'Zizia aurea (L.) W.D.J. Koch' }, 'scientificName'],
    ['a fact without its source', { sources: { usdaSymbol: 'usda-plants' } }, 'sources'],
    ['no sowing method', { germination: { ...valid.germination, methods: [] } }, 'germination'],
  ])('rejects %s, naming the field', (_what, change, field) => {
    const result = speciesSchema.safeParse({ ...valid, ...change });
    expect(result.success).toBe(false);
    expect(result.error!.issues.map((i) => String(i.path[0]))).toContain(field);
  });
});
