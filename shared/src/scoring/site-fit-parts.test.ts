import { describe, expect, it } from 'vitest';
import type { Site } from '../types/site.js';
import { F, LARKFIELD } from './__tests__/species-fixtures.js';
import { scoreSpecies } from './score-species.js';
import { regionalPart, thrivesPart, wetlandPart } from './site-fit-parts.js';
import type { GradedSpecies } from './species-traits.js';

const wetSun: Site = { sun: 'full', moisture: 'wet', areaSqFt: 150, deerPressure: 'low', goals: ['rain-garden'] };
const drySun: Site = { ...wetSun, moisture: 'dry', goals: [] };

describe('graded fit: thrives vs tolerates (input → points)', () => {
  it.each([
    // swamp milkweed: full/part, medium/wet (record); a wet-site specialist on wet ground
    ['swamp milkweed on wet sun: optimum sun and moisture, no dry, no shade', F.swampMilkweed, wetSun, 7],
    // butterfly milkweed takes dry and medium: on dry sun it leads
    ['butterfly milkweed on dry sun', F.butterflyMilkweed, drySun, 7],
    // an optimum narrower than the range: medium only, so dry is tolerated, not thrived in
    [
      'bergamot with a medium-only optimum on dry sun: sun optimum only',
      { ...F.wildBergamot, moistureOptimum: ['medium'] } as GradedSpecies,
      drySun,
      5,
    ],
  ])('%s → %d', (_what, species, site, points) => {
    expect(thrivesPart(species, site)?.points).toBe(points);
  });

  it.each([
    ['OBL on a wet site', 'OBL', wetSun, 2],
    ['FACU on a wet site', 'FACU', wetSun, -1],
    ['OBL on a dry site', 'OBL', drySun, -2],
    ['UPL on a dry site', 'UPL', drySun, 1],
  ] as const)(
    'wetland indicator (National Wetland Plant List class): %s → %d',
    (_what, wetlandIndicator, site, points) => {
      expect(wetlandPart({ ...F.wildBergamot, wetlandIndicator } as GradedSpecies, site)?.points).toBe(points);
    },
  );

  it('a wetland plant outranks an upland generalist on a wet site, and the other way round on a dry one', () => {
    const wetPlant = { ...F.swampMilkweed, slug: 'wet-plant', wetlandIndicator: 'OBL' } as GradedSpecies;
    const upland = {
      ...F.swampMilkweed,
      slug: 'upland',
      moisture: ['dry', 'medium', 'wet'],
      wetlandIndicator: 'FACU',
    } as GradedSpecies;
    const score = (s: GradedSpecies, site: Site) => scoreSpecies(s, site, LARKFIELD).score;
    expect(score(wetPlant, wetSun)).toBeGreaterThan(score(upland, wetSun));
    expect(score(upland, { ...drySun, moisture: 'medium' })).toBeGreaterThan(
      score(wetPlant, { ...drySun, moisture: 'medium' }),
    );
  });
});

describe('regional character (ecoregion lists)', () => {
  const narrow = { ...F.wildBergamot, ecoregions: ['45', '65', '66'] } as GradedSpecies;
  const wide = { ...F.wildBergamot, ecoregions: Array.from({ length: 40 }, (_, i) => String(i + 30)) } as GradedSpecies;
  it.each([
    ['native to 3 ecoregions, the Piedmont (45) among them', narrow, '45', 0.75],
    ['native to 40 ecoregions', wide, '45', undefined],
    ['native to 3 ecoregions, not this one', narrow, '52', undefined],
  ] as const)('%s', (_what, species, code, points) => {
    expect(regionalPart(species, { state: 'NC', ecoregionCode: code })?.points).toBe(points);
  });
});
