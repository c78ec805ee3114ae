import type { ChosenSpecies, MixQuantity, MixResponse, PaletteConstraint, SpeciesSummary } from '@homeground/shared';

// A hand-built mix for component tests. Bloom months are chosen by hand so that September has
// no flowering species at all (the gap the bloom-chart test looks for); they are test inputs, not
// catalogue facts. The site is the invented Larkfield, Wisconsin yard of DESIGN.md's demo scenario.

function summary(
  slug: string,
  commonName: string,
  scientificName: string,
  over: Partial<SpeciesSummary>,
): SpeciesSummary {
  return {
    slug,
    commonName,
    scientificName,
    family: 'Asteraceae',
    growthForm: 'forb',
    heightCm: { min: 30, max: 90 },
    bloomMonths: [],
    flowerColours: ['yellow'],
    sun: ['full'],
    moisture: ['medium'],
    monarchHost: false,
    lepidopteraGenusCount: null,
    cautionKinds: [],
    hasPhoto: false,
    ...over,
  };
}

export const fixtureSpecies: SpeciesSummary[] = [
  summary('test-early-a', 'early test aster', 'Testia prima', { bloomMonths: [4, 5, 6], flowerColours: ['white'] }),
  summary('test-early-b', 'early test phlox', 'Testia secunda', {
    bloomMonths: [4, 5, 6, 7],
    flowerColours: ['lavender'],
  }),
  summary('test-mid', 'midsummer test bergamot', 'Testia tertia', {
    bloomMonths: [6, 7, 8],
    flowerColours: ['purple'],
  }),
  summary('test-late', 'late test goldenrod', 'Testia quarta', {
    bloomMonths: [7, 8, 10],
    flowerColours: ['yellow'],
    cautionKinds: ['sap-irritant'],
  }),
  summary('test-sedge', 'test sedge', 'Testcarex quinta', {
    growthForm: 'graminoid',
    bloomMonths: [5, 6, 9],
    flowerColours: ['green'],
  }),
];

function chosen(slug: string, roles: string[]): ChosenSpecies {
  return {
    slug,
    score: 10,
    roles,
    locked: false,
    parts: [
      { name: 'native', points: 3, reason: 'Native to Wisconsin.' },
      { name: 'sun', points: 2, reason: 'Grows in full sun; your ground has full sun.' },
      { name: 'spread', points: -1, reason: 'Spreads by roots or seed; give it room.' },
    ],
  };
}

function quantity(slug: string, plants: number): MixQuantity {
  return {
    slug,
    plants,
    spacingIn: 18,
    spacingCm: 45.72,
    areaSqFt: 40,
    areaSqM: 3.72,
    seedsToSow: plants * 3,
    seedWeight: slug === 'test-sedge' ? null : { grams: 0.05, ounces: 0.0018 },
  };
}

export const fixtureConstraints: PaletteConstraint[] = [
  {
    id: 'cp42-early',
    rule: 'Spring (April to mid-June): at least 3 species in flower every month, so something is in flower from spring to frost',
    applies: true,
    met: true,
    detail: 'The mix has 3.',
    source: 'nrcs-cp42-indiana-2012',
  },
  {
    id: 'cp42-late',
    rule: 'Late summer and fall (August to October): at least 3 species in flower every month, so something is in flower from spring to frost',
    applies: true,
    met: false,
    detail: 'Only 2 late bloomers suit your ground.',
    source: 'nrcs-cp42-indiana-2012',
  },
  {
    id: 'monarch-milkweed',
    rule: 'At least one native milkweed when monarchs are a goal: their caterpillars eat nothing else',
    applies: false,
    met: true,
    detail: 'Monarchs are not one of your goals, so no milkweed is needed.',
    source: 'nrcs-e327136z2',
  },
];

export function fixtureMix(species: SpeciesSummary[] = fixtureSpecies): MixResponse {
  return {
    site: { sun: 'full', moisture: 'medium', areaSqFt: 200, deerPressure: 'medium', goals: ['pollinators'] },
    palette: {
      size: species.length,
      coverage: { covered: true },
      plantingMethod: 'plugs',
      sizeReason: `200 ft² (18.6 m²) has room for about ${species.length} species.`,
      chosen: species.map((s, i) => chosen(s.slug, i === 0 ? ['one of 3 early bloomers'] : ['middle of the bed'])),
      objective: 1,
      terms: [],
      constraints: fixtureConstraints,
      notices: [],
    },
    species: Object.fromEntries(species.map((s) => [s.slug, s])),
    quantities: species.map((s, i) => quantity(s.slug, 10 + i)),
    totalFootprintSqFt: species.length * 40,
    seeding: null,
    lossFactor: 0.2,
  };
}

/** The Driftless Area's record as GET /api/ecoregions/52 answers it (words shortened for the test). */
export const driftlessEcoregion = {
  code: '52',
  name: 'Driftless Area',
  level2: { code: '8.1', name: 'Mixed Wood Plains' },
  level1: { code: '8', name: 'Eastern Temperate Forests' },
  states: ['WI', 'MN', 'IA', 'IL'],
  plantCommunities: ['savanna', 'prairie', 'forest'],
  description: 'Hills and deep valleys the glaciers missed.',
  sources: {},
};

/** A Larkfield yard as the URL carries it. */
export const FIXTURE_MIX_PATH =
  '/find-plants?state=WI&eco=52&sun=full&moisture=medium&area=200&unit=ft2&deer=medium&goals=pollinators';
