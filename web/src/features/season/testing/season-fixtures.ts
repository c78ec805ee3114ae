import type { Season, ShareList } from '@homeground/shared';
import type { SeasonSeedList } from '../../../api/seasons/seasons.api.js';

// The invented demo group's season (shared/DESIGN.md beside the project, "Demo scenario"): the
// Larkfield Commons Growers, Larkfield, Wisconsin, EPA Level III ecoregion 52. Targets are made up
// for the tests; the screens must show whatever the API answers.

export const SLUG = 'larkfield-commons-growers';
export const SEASON_PATH = `/api/groups/${SLUG}/season`;

export const season: Season = {
  groupSlug: SLUG,
  groupName: 'Larkfield Commons Growers',
  place: { town: 'Larkfield', state: 'WI', ecoregionCode: '52' },
  year: 2027,
  lastFrost: '2027-05-10',
  plantShareDate: '2027-06-12',
  methods: ['winter-sowing', 'outdoor-pot-winter', 'indoor-lights'],
  milkweedShare: 0.25,
  lossFactor: 0.2,
  seedsPerPacket: 100,
  targets: [
    {
      slug: 'asclepias-tuberosa',
      commonName: 'Butterfly milkweed',
      scientificName: 'Asclepias tuberosa',
      targetPlants: 60,
    },
    {
      slug: 'monarda-fistulosa',
      commonName: 'Wild bergamot',
      scientificName: 'Monarda fistulosa',
      targetPlants: 80,
      germinationRatePct: 70,
    },
  ],
  updatedAt: '2026-11-20T18:00:00.000Z',
};

// Seeds to sow = target ÷ (germination × (1 − losses)), the shared seed list's rule: 60 ÷ (0.5 × 0.8)
// = 150 and 80 ÷ (0.7 × 0.8) ≈ 143; packets at 100 seeds. Seeds per pound are from memory.
export const seedList: SeasonSeedList = {
  groupSlug: SLUG,
  year: 2027,
  lossFactor: 0.2,
  seedsPerPacket: 100,
  rows: [
    {
      slug: 'asclepias-tuberosa',
      commonName: 'Butterfly milkweed',
      scientificName: 'Asclepias tuberosa',
      targetPlants: 60,
      germinationRatePct: 50,
      germinationFrom: 'record',
      lossFactor: 0.2,
      seedsToSow: 150,
      seedsPerPound: 70_000,
      grams: 0.97,
      ounces: 0.034,
      packets: 2,
      buyBy: 'packets',
      collectLocally: true,
      collectNotes: ['Pods split in September; collect just before they open, with permission.'],
      neverCollectWild: false,
      cautions: [
        { kind: 'sap-irritant', title: 'Milky sap', text: 'Milky sap irritates eyes: wash hands after handling.' },
      ],
    },
    {
      slug: 'monarda-fistulosa',
      commonName: 'Wild bergamot',
      scientificName: 'Monarda fistulosa',
      targetPlants: 80,
      germinationRatePct: 70,
      germinationFrom: 'yours',
      lossFactor: 0.2,
      seedsToSow: 143,
      seedsPerPound: 1_100_000,
      grams: 0.06,
      ounces: 0.002,
      packets: 2,
      buyBy: 'packets',
      collectLocally: false,
      collectNotes: [],
      neverCollectWild: false,
      cautions: [],
    },
  ],
  totals: { targetPlants: 140, seedsToSow: 293, grams: 1.03, ounces: 0.036, packets: 4 },
  cautions: [
    "Collect wild seed only with the landowner's permission, and follow the rules of parks and reserves: many forbid it.",
    'Dry potting mix is dusty: dampen it before you fill pots, and work outdoors or wear a dust mask.',
  ],
};

export const shareList: ShareList = {
  ecoregionCode: '52',
  state: 'WI',
  methods: season.methods,
  milkweedShare: 0.4,
  totalPlants: 300,
  proposals: [
    {
      slug: 'zizia-aurea',
      commonName: 'Golden alexanders',
      scientificName: 'Zizia aurea',
      isMilkweed: false,
      layer: 'herbaceous',
      bloomPeriods: ['early'],
      sunOptimum: ['full', 'part'],
      moistureOptimum: ['medium', 'wet'],
      suggestedPlants: 40,
      why: ['Blooms in May, when the list has least in flower.', 'Host plant of the black swallowtail caterpillar.'],
    },
  ],
  notes: [],
};
