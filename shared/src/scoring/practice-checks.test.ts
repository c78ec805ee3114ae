import { describe, expect, it } from 'vitest';
import type { Site } from '../types/site.js';
import { F, LARKFIELD, makeSpecies } from './__tests__/species-fixtures.js';
import { hardCheckOutcome } from './hard-check-outcome.js';
import { scoreSpecies } from './score-species.js';
import type { GradedSpecies } from './species-traits.js';

const bed: Site = { sun: 'full', moisture: 'medium', areaSqFt: 200, deerPressure: 'low', goals: [] };
// Records as in the catalogue (species-data/species): chokecherry a 10–20 ft suckering shrub,
// spotted jewelweed an annual, a vine of 10–20 ft.
const chokecherry = makeSpecies({
  slug: 'prunus-virginiana',
  scientificName: 'Prunus virginiana',
  growthForm: 'shrub',
  spreadCm: { min: 180, max: 600 },
  spreadHabit: 'spreading',
  wildlife: { lepidopteraGenusCount: 456 },
});
const jewelweed = makeSpecies({
  slug: 'impatiens-capensis',
  scientificName: 'Impatiens capensis',
  lifespan: 'annual',
  moisture: ['medium', 'wet'],
});
const evening = makeSpecies({ slug: 'oenothera-biennis', scientificName: 'Oenothera biennis', lifespan: 'biennial' });
const vine = makeSpecies({
  slug: 'clematis-virginiana',
  scientificName: 'Clematis virginiana',
  growthForm: 'vine',
  spreadCm: { min: 90, max: 300 },
});
const runner = makeSpecies({
  slug: 'helianthus-tuberosus',
  scientificName: 'Helianthus tuberosus',
  spreadHabit: 'aggressive',
});
const violet = makeSpecies({ slug: 'viola-sororia', scientificName: 'Viola sororia', selfSows: true });

describe('garden practice: what a yard mix holds (input → eligible, near miss)', () => {
  it.each([
    ['chokecherry, woody plants not asked for: out', chokecherry, bed, false, false],
    [
      'chokecherry asked for in 200 ft²: one plant (25 ft²) fits the 50 ft² woody share',
      chokecherry,
      { ...bed, woodyPlants: true },
      true,
      false,
    ],
    ['a 10–20 ft vine, not asked for: out', vine, bed, false, false],
    ['an annual: near miss, offered as "also consider"', jewelweed, bed, false, true],
    ['a biennial: near miss', evening, bed, false, true],
    ['aggressive spreader in 200 ft²: near miss', runner, bed, false, true],
    ['aggressive spreader in 200 ft², spreaders asked for', runner, { ...bed, spreaders: true }, true, false],
    ['aggressive spreader in 1,000 ft²', runner, { ...bed, areaSqFt: 1000 }, true, false],
    ['a heavy self-sower (common blue violet) in 200 ft²: near miss', violet, bed, false, true],
    ['a clumping perennial', F.wildBergamot, bed, true, false],
  ] as const)('%s', (_what, species, site, eligible, nearMiss) => {
    const r = scoreSpecies(species, site as Site, LARKFIELD);
    expect([r.eligible, r.nearMiss]).toEqual([eligible, nearMiss]);
    // The wordless twin agrees.
    expect(hardCheckOutcome(species, site as Site, LARKFIELD)).toBe(
      eligible ? 'eligible' : nearMiss ? 'near-miss' : 'out',
    );
  });

  it('says why in words', () => {
    expect(scoreSpecies(jewelweed, bed, LARKFIELD).ineligibleReason).toMatch(
      /^An annual: .* not counted as a plant of the mix/,
    );
    expect(scoreSpecies(chokecherry, bed, LARKFIELD).ineligibleReason).toBe(
      'A shrub, tree or vine: ask for shrubs and small trees to include woody plants.',
    );
  });
});

describe('ecoregion, not just state', () => {
  const inDriftless = { ...F.wildBergamot, ecoregions: ['52', '53'] } as GradedSpecies;
  const notInDriftless = { ...F.wildBergamot, ecoregions: ['50', '51'] } as GradedSpecies;
  it.each([
    ['listed for 52 and 53, site in 52', inDriftless, LARKFIELD, true],
    ['native to Wisconsin but listed for 50 and 51 only: out in 52', notInDriftless, LARKFIELD, false],
    ['no ecoregion code for the site: state nativity decides', notInDriftless, { state: 'WI' as const }, true],
    [
      'record without ecoregions: state nativity decides',
      { ...F.wildBergamot, ecoregions: undefined } as unknown as GradedSpecies,
      LARKFIELD,
      true,
    ],
  ])('%s', (_what, species, region, eligible) => {
    expect(scoreSpecies(species, bed, region).eligible).toBe(eligible);
    expect(hardCheckOutcome(species, bed, region) === 'eligible').toBe(eligible);
  });
});
