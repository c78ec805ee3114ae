import type { Batch, SeasonBatches, SeasonGrower } from '@homeground/shared';

// The invented demo group (shared/DESIGN.md beside the project, "Demo scenario"): Amara Reyes grows
// outdoor pots over winter for the Larkfield Commons Growers. Dates follow the sowing calendar for a
// last frost of May 10, 2027 and a plant share on June 12, 2027; counts are made up for the tests.

export const SLUG = 'larkfield-commons-growers';
export const BATCHES_PATH = `/api/groups/${SLUG}/season/batches`;
export const GROWERS_PATH = `/api/groups/${SLUG}/season/growers`;

export const amaraGrower: SeasonGrower = {
  userId: 'u-amara',
  displayName: 'Amara Reyes',
  role: 'grower',
  methods: [{ method: 'outdoor-pot-winter', capacity: 120 }],
  used: [{ method: 'outdoor-pot-winter', units: 70 }],
};

export const bergamot: Batch = {
  id: '7b0f5d62-2f7c-4c1e-9a57-6d3f1c2b8e01',
  growerId: 'u-amara',
  growerName: 'Amara Reyes',
  slug: 'monarda-fistulosa',
  commonName: 'Wild bergamot',
  scientificName: 'Monarda fistulosa',
  method: 'outdoor-pot-winter',
  unit: 'pot',
  plants: 20,
  units: 20,
  seedsToSow: 34,
  germinationRatePct: 75,
  sowDate: '2026-12-02',
  readyDate: '2027-05-24',
  readyAfterShare: false,
  treatments: [
    { kind: 'none', days: null, where: null, title: 'No pre-treatment needed', how: 'Sow the seed as it comes.' },
  ],
  steps: [
    { kind: 'sow', date: '2026-12-02', title: 'Sow', detail: 'Sow pots for outdoors.' },
    { kind: 'sprouts-expected', date: '2027-04-10', title: 'Sprouts expected', detail: 'Keep them damp.' },
    { kind: 'pot-up', date: '2027-05-01', title: 'Pot up', detail: 'Give each seedling its own pot.' },
    {
      kind: 'frost-watch',
      date: '2027-05-10',
      title: 'Frost watch: protect from a late frost',
      detail: 'Keep frost cloth handy for two weeks.',
    },
    { kind: 'ready', date: '2027-05-24', title: 'Ready to give', detail: 'Ready to plant out or give.' },
  ],
  nextStep: { kind: 'sprouts-expected', date: '2027-04-10', title: 'Sprouts expected', detail: 'Keep them damp.' },
  behind: 'Not sown yet: the usual start (sow) was 2026-11-20. Start as soon as you can.',
  warnings: [],
  frostWarning: null,
  cautions: [],
  log: [],
  totals: { sown: 0, germinated: 0, pottedUp: 0, lost: 0, ready: 0, alive: 0 },
  forecast: { expected: 20, low: 15, high: 25, basis: 'planned' },
};

export const milkweed: Batch = {
  ...bergamot,
  id: '7b0f5d62-2f7c-4c1e-9a57-6d3f1c2b8e02',
  slug: 'asclepias-tuberosa',
  commonName: 'Butterfly milkweed',
  scientificName: 'Asclepias tuberosa',
  treatments: [
    {
      kind: 'cold-moist',
      days: 30,
      where: 'outdoors',
      title: 'Cold-moist stratification, 30 days',
      how: 'Winter does it.',
    },
  ],
  behind: null,
  frostWarning:
    'Frost watch until 2027-05-24: a late frost is still possible. On clear, still nights when frost is forecast, cover the pots with frost cloth or an old sheet, or move them against the house. Check your local forecast.',
  cautions: [{ title: 'Milky sap', text: 'Milky sap irritates eyes: wash hands after handling.' }],
  log: [
    {
      id: 'e1',
      kind: 'sown',
      count: 150,
      date: '2026-11-21',
      reason: null,
      note: 'Three seeds a pot.',
      clientId: null,
      createdAt: '2026-11-21T15:00:00.000Z',
    },
  ],
  totals: { sown: 150, germinated: 0, pottedUp: 0, lost: 0, ready: 0, alive: 0 },
  forecast: { expected: 72, low: 54, high: 90, basis: 'sown' },
};

export const seasonBatches: SeasonBatches = {
  groupSlug: SLUG,
  year: 2027,
  plantShareDate: '2027-06-12',
  batches: [milkweed, bergamot],
  supplies: {
    byGrower: [
      {
        growerId: 'u-amara',
        growerName: 'Amara Reyes',
        list: {
          lines: [
            { item: 'pots', name: '4 in (10 cm) pots', count: 70, litres: null, quarts: null, note: 'One per plant.' },
            {
              item: 'potting-mix',
              name: 'Potting mix',
              count: null,
              litres: 39,
              quarts: 36,
              note: 'With 10 % to spare.',
            },
          ],
          cautions: ['Dry potting mix, soil-block mix and vermiculite are dusty: dampen them before you use them.'],
        },
      },
    ],
    group: null,
  },
};
