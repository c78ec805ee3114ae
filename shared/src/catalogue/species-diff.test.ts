import { describe, expect, it } from 'vitest';
import { F } from '../scoring/__tests__/species-fixtures.js';
import { diffSpecies } from './species-diff.js';

describe('diffSpecies', () => {
  const base = F.butterflyMilkweed;

  it('lists nothing for an unchanged record', () => {
    expect(diffSpecies(base, structuredClone(base))).toEqual([]);
  });

  it('names nested parts and carries the source the new record gives', () => {
    const after = {
      ...base,
      heightCm: { min: base.heightCm.min, max: base.heightCm.max + 10 },
      germination: { ...base.germination, germinationRatePct: 71 },
      sources: { ...base.sources, heightCm: 'usda-plants' },
    };
    const changes = diffSpecies(base, after);
    expect(changes.map((c) => c.field)).toEqual(['germination.germinationRatePct', 'heightCm']);
    expect(changes[1]).toEqual({
      field: 'heightCm',
      before: JSON.stringify(base.heightCm),
      after: JSON.stringify(after.heightCm),
      source: 'usda-plants',
    });
  });

  it('lists every field of a new record with nothing before', () => {
    const changes = diffSpecies(null, base);
    expect(changes.length).toBeGreaterThan(10);
    expect(changes.every((c) => c.before === null && c.after !== null)).toBe(true);
    expect(changes.some((c) => c.field === 'sources')).toBe(false);
  });
});
