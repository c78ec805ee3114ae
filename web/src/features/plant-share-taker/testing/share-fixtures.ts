import type { PublicPlantShare, ReservationCreated, ShareSpecies } from '@homeground/shared';

// The invented demo group's plant share (shared/DESIGN.md beside the project, "Demo scenario"): the
// Larkfield Commons Growers give plants away on the second Saturday of June at Larkfield Commons
// Hall. Counts are made up for the tests; the screens must show whatever the API answers.

export const GROUP = 'larkfield-commons-growers';
export const SHARE_PATH = `/api/plant-shares/${GROUP}`;
/** A private link's secret: 43 base64url characters, as reservationTokenSchema wants. */
export const TOKEN = 'Pq7xW2mZ4tR8vN1kL5hJ9gF3dS6aQ0eY2uI4oP7cB8n';
export const SLOT_1 = '0b6b6c1e-2f0a-4a4e-9d51-6f1f3b1d9a01';
export const SLOT_2 = '0b6b6c1e-2f0a-4a4e-9d51-6f1f3b1d9a02';

const noWildlife = { caterpillars: null, bees: null, monarchs: null, birds: null };

// Sun, soil, height and bloom months as the USDA PLANTS profiles and the catalogue records give them.
const milkweed: ShareSpecies = {
  slug: 'asclepias-tuberosa',
  commonName: 'Butterfly milkweed',
  scientificName: 'Asclepias tuberosa',
  growthForm: 'forb',
  heightCm: { min: 30, max: 75 },
  bloomMonths: [6, 7, 8],
  bloomWords: 'blooms June to August',
  flowerColours: ['orange'],
  sun: ['full'],
  moisture: ['dry', 'medium'],
  isMilkweed: true,
  remaining: 12,
  wildlife: { ...noWildlife, monarchs: 'A host plant of the monarch caterpillar.', bees: 'Visited by many bees.' },
  cautions: [
    { kind: 'sap-irritant', title: 'Irritating sap', text: 'Milky sap irritates eyes: wash hands after handling.' },
  ],
  fit: null,
};

const bergamot: ShareSpecies = {
  ...milkweed,
  slug: 'monarda-fistulosa',
  commonName: 'Wild bergamot',
  scientificName: 'Monarda fistulosa',
  heightCm: { min: 60, max: 120 },
  bloomMonths: [7, 8],
  flowerColours: ['lavender'],
  sun: ['full', 'part'],
  isMilkweed: false,
  remaining: 2,
  wildlife: { ...noWildlife, caterpillars: 'A good caterpillar host plant among wildflowers, grasses and ferns.' },
  cautions: [],
};

const blueFlag: ShareSpecies = {
  ...milkweed,
  slug: 'iris-virginica',
  commonName: 'Southern blue flag',
  scientificName: 'Iris virginica',
  heightCm: { min: 60, max: 90 },
  bloomMonths: [5, 6],
  flowerColours: ['blue'],
  sun: ['full', 'part'],
  moisture: ['wet'],
  isMilkweed: false,
  remaining: 0,
  wildlife: noWildlife,
  cautions: [{ kind: 'toxic-if-eaten', title: 'Toxic if eaten', text: 'The roots are poisonous if eaten.' }],
};

export const share: PublicPlantShare = {
  groupSlug: GROUP,
  groupName: 'Larkfield Commons Growers',
  town: 'Larkfield',
  state: 'WI',
  date: '2027-06-12',
  place: {
    name: 'Larkfield Commons Hall',
    address: '1 Commons Lane, Larkfield, WI',
    directions: 'Stay in your car; volunteers bring the plants to you.',
  },
  status: 'open',
  limits: { perSpecies: 3, total: 6 },
  whatToBring: 'A box or tray to carry your pots home.',
  slots: [
    { id: SLOT_1, start: '2027-06-12T09:00:00-05:00', end: '2027-06-12T09:30:00-05:00', left: 4, past: false },
    { id: SLOT_2, start: '2027-06-12T09:30:00-05:00', end: '2027-06-12T10:00:00-05:00', left: 0, past: false },
  ],
  species: [blueFlag, milkweed, bergamot],
  yard: null,
  notes: ['Wear gloves when you plant, and keep seedlings away from pets and small children who may chew them.'],
};

/** The same share ranked for dry full sun, as the API answers `?sun=full&moisture=dry`. */
export const rankedForDrySun: PublicPlantShare = {
  ...share,
  yard: { sun: 'full', moisture: 'dry', from: 'answers', place: 'Larkfield, WI', mixName: null },
  species: [
    { ...blueFlag, fit: { fit: 'not-for-this-yard', rank: 3, why: ['Needs wet soil.'] } },
    { ...milkweed, fit: { fit: 'thrives', rank: 1, why: ['Thrives in dry soil and full sun.'] } },
    { ...bergamot, fit: { fit: 'grows', rank: 2, why: ['Grows in full sun.'] } },
  ],
};

export const reservation: ReservationCreated = {
  id: 'reservation-1',
  status: 'confirmed',
  name: 'Priya Vantongeren',
  email: 'priya.vantongeren@example.org',
  zip: '53597',
  slot: { id: SLOT_1, start: share.slots[0].start, end: share.slots[0].end },
  lines: [
    {
      speciesSlug: 'asclepias-tuberosa',
      commonName: 'Butterfly milkweed',
      scientificName: 'Asclepias tuberosa',
      count: 2,
    },
  ],
  share: {
    groupSlug: GROUP,
    groupName: share.groupName,
    date: share.date,
    place: share.place,
    status: 'open',
    whatToBring: share.whatToBring,
  },
  canChange: true,
  careSheet: [
    {
      speciesSlug: 'asclepias-tuberosa',
      commonName: 'Butterfly milkweed',
      scientificName: 'Asclepias tuberosa',
      sun: 'Best in full sun; grows in full sun.',
      moisture: 'Best in dry soil; grows in dry or medium-moist soil.',
      spacing: 'Plant 18 in (46 cm) apart.',
      cautions: ['Irritating sap: Milky sap irritates eyes: wash hands after handling.'],
    },
  ],
  manageUrl: `http://localhost/plant-share/reservations/${TOKEN}`,
};
