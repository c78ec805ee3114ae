import type {
  BatchSplitProposalAnswer,
  Season,
  SeasonBatches,
  SeasonGrower,
  SeasonProgress,
  SeedList,
} from '@homeground/shared';
import { bergamotBatch } from './batch-fixture.js';

// The invented demo group (shared/DESIGN.md beside the project, "Demo scenario"). Counts are made up
// for the tests; the screens must show whatever the API answers.

export const SLUG = 'larkfield-commons-growers';
export const SEASON_PATH = `/api/groups/${SLUG}/season`;

export const growers: SeasonGrower[] = [
  {
    userId: '3f6b3a00-0000-4000-8000-00000000a3a2',
    displayName: 'Juniper Okafor',
    role: 'grower',
    methods: [{ method: 'winter-sowing', capacity: 24 }],
    used: [{ method: 'winter-sowing', units: 5 }],
  },
  {
    userId: '3f6b3a00-0000-4000-8000-00000000a3a1',
    displayName: 'Amara Reyes',
    role: 'grower',
    methods: [{ method: 'outdoor-pot-winter', capacity: 120 }],
    used: [{ method: 'outdoor-pot-winter', units: 50 }],
  },
  {
    userId: '3f6b3a00-0000-4000-8000-00000000a3a3',
    displayName: 'Theo Lindqvist',
    role: 'grower',
    methods: [],
    used: [],
  },
];

export const batches: SeasonBatches = {
  groupSlug: SLUG,
  year: 2027,
  plantShareDate: '2027-06-12',
  batches: [bergamotBatch],
  supplies: {
    byGrower: [],
    group: {
      lines: [
        { item: 'pots', name: '4 in (10 cm) pots', count: 50, litres: null, quarts: null, note: 'One per plant.' },
      ],
      cautions: ['Dry potting mix, soil-block mix and vermiculite are dusty: dampen them before you use them.'],
    },
  },
};

export const proposal: BatchSplitProposalAnswer = {
  batches: [
    {
      growerId: '3f6b3a00-0000-4000-8000-00000000a3a1',
      growerName: 'Amara Reyes',
      slug: 'monarda-fistulosa',
      commonName: 'Wild bergamot',
      method: 'outdoor-pot-winter',
      plants: 50,
      units: 50,
      why: 'outdoor pots over winter: it needs no cold, so outdoors it simply waits for spring.',
    },
    {
      growerId: '3f6b3a00-0000-4000-8000-00000000a3a2',
      growerName: 'Juniper Okafor',
      slug: 'solidago-speciosa',
      commonName: 'Showy goldenrod',
      method: 'winter-sowing',
      plants: 50,
      units: 5,
      why: 'winter sowing in covered containers: winter gives its 60 days of cold-moist stratification.',
    },
  ],
  unassigned: [
    {
      slug: 'viola-canadensis',
      commonName: 'Canada violet',
      plants: 20,
      reason: 'The growers who can raise it have no room left.',
    },
  ],
};

export const progress: SeasonProgress = {
  groupSlug: SLUG,
  year: 2027,
  plantShareDate: '2027-06-12',
  today: '2026-12-02',
  species: [
    {
      slug: 'monarda-fistulosa',
      commonName: 'Wild bergamot',
      scientificName: 'Monarda fistulosa',
      targetPlants: 50,
      plannedPlants: 40,
      sown: 60,
      germinated: 40,
      pottedUp: 0,
      lost: 5,
      ready: 0,
      forecast: { expected: 36, low: 29, high: 45 },
      shortBy: 14,
      nudge:
        'At this rate about 36 of 50 will be ready: sow about 24 more seeds (14 more pots), starting by 2026-12-02.',
    },
  ],
  growers: [
    {
      growerId: '3f6b3a00-0000-4000-8000-00000000a3a1',
      growerName: 'Amara Reyes',
      batches: 1,
      behind: 1,
      sown: 60,
      germinated: 40,
      pottedUp: 0,
      lost: 5,
      ready: 0,
    },
  ],
  method: ['Before sowing: the seeds planned × germination × (1 − the usual losses).'],
};

/** The season the page around the panel shows (its own feature tests cover it). */
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
    { slug: 'monarda-fistulosa', commonName: 'Wild bergamot', scientificName: 'Monarda fistulosa', targetPlants: 50 },
  ],
  updatedAt: '2026-11-20T18:00:00.000Z',
};

export const seedList: SeedList & { groupSlug: string; year: number } = {
  groupSlug: SLUG,
  year: 2027,
  lossFactor: 0.2,
  seedsPerPacket: 100,
  rows: [],
  totals: { targetPlants: 0, seedsToSow: 0, grams: 0, ounces: 0, packets: 0 },
  cautions: [],
};
