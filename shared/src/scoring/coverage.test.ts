import { describe, expect, it } from 'vitest';
import { F, LARKFIELD } from './__tests__/species-fixtures.js';
import { catalogueCoverage, coveredEcoregionCodes } from './coverage.js';
import type { GradedSpecies } from './species-traits.js';

// EPA Level III codes (species-data/ecoregions): 52 Driftless Area, 45 Piedmont, 81 Sonoran Basin and Range, 13 Central Basin and Range.
describe('which regions the catalogue covers', () => {
  const list = Object.values(F);
  // Records without ecoregions, so the rule table decides.
  const bare = list.map((s) => ({ ...s, ecoregions: undefined }) as unknown as GradedSpecies);
  it.each([
    ['Driftless Area (52)', { state: 'WI', ecoregionCode: '52' }, true],
    ['Piedmont (45)', { state: 'NC', ecoregionCode: '45' }, true],
    ['Sonoran Basin and Range (81)', { state: 'AZ', ecoregionCode: '81' }, false],
    ['Central Basin and Range (13)', { state: 'NV', ecoregionCode: '13' }, false],
    ['Arizona, no ecoregion', { state: 'AZ' }, false],
    ['Wisconsin, no ecoregion', { state: 'WI' }, true],
  ] as const)('rule table (records without ecoregions): %s → %s', (_what, region, covered) => {
    const c = catalogueCoverage(bare, region);
    expect(c.covered).toBe(covered);
    if (!covered) expect(c.message).toMatch(/eastern and central United States/);
  });

  it('from the data once most records list ecoregions: covered where at least 40 species are native', () => {
    const many = Array.from(
      { length: 100 },
      (_, i) => ({ ...F.wildBergamot, slug: `s-${i}`, ecoregions: i < 39 ? ['52', '81'] : ['52'] }) as GradedSpecies,
    );
    expect(catalogueCoverage(many, LARKFIELD).covered).toBe(true);
    expect(catalogueCoverage(many, { state: 'AZ', ecoregionCode: '81' }).covered).toBe(false); // 39 species
    expect(coveredEcoregionCodes(many, ['45', '52', '81'])).toEqual(['52']);
  });
});
