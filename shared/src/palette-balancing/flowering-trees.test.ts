import { describe, expect, it } from 'vitest';
import type { Site } from '../types/site.js';
import { LARKFIELD, makeSpecies } from '../scoring/__tests__/species-fixtures.js';
import { scoreSpecies } from '../scoring/score-species.js';
import { buildCandidates } from './palette-candidates.js';

// Trees as in the catalogue records (species-data/species): river birch, brown catkins in Apr–May
// (flower colours usda-plants-characteristics); eastern redbud, pink and magenta in Mar–May (from-memory).
const riverBirch = makeSpecies({
  slug: 'betula-nigra',
  scientificName: 'Betula nigra',
  family: 'Betulaceae',
  commonNames: ['river birch'],
  growthForm: 'tree',
  heightCm: { min: 1200, max: 2100 },
  spreadCm: { min: 1000, max: 1500 },
  bloomMonths: [4, 5],
  flowerColours: ['brown'],
  moisture: ['medium', 'wet'],
});
const redbud = makeSpecies({
  slug: 'cercis-canadensis',
  scientificName: 'Cercis canadensis',
  family: 'Fabaceae',
  commonNames: ['eastern redbud'],
  growthForm: 'tree',
  heightCm: { min: 600, max: 900 },
  spreadCm: { min: 600, max: 1000 },
  bloomMonths: [3, 4, 5],
  flowerColours: ['pink', 'magenta'],
  moisture: ['dry', 'medium'],
});
// Trees come into a mix only when the user asks for woody plants.
const yard: Site = {
  sun: 'full',
  moisture: 'medium',
  areaSqFt: 5000,
  deerPressure: 'low',
  goals: ['pollinators'],
  woodyPlants: true,
};

describe('wind-pollinated trees are not CP42 flowering species in a mix', () => {
  const items = buildCandidates({ species: [riverBirch, redbud], site: yard, region: LARKFIELD }).items;
  const item = (slug: string) => items.find((i) => i.slug === slug)!;

  it('river birch: not flowering, no bloom period, no flower colour for the mix', () => {
    expect(item('betula-nigra')).toMatchObject({ flowering: false, periods: [], colours: [] });
  });

  it('eastern redbud: flowering, early period', () => {
    expect(item('cercis-canadensis')).toMatchObject({
      flowering: true,
      periods: ['early'],
      colours: ['pink', 'magenta'],
    });
  });

  it('no "pollinators" part for the birch, one for the redbud', () => {
    const part = (s: typeof redbud) => scoreSpecies(s, yard, LARKFIELD).parts.find((p) => p.name === 'pollinators');
    expect(part(riverBirch)).toBeUndefined();
    expect(part(redbud)?.points).toBe(1);
  });
});
