import type { FitResult, PublicShare, Reservation } from '../../../api/plant-share/plant-share.types.js';

// The invented demo group's plant share (shared/DESIGN.md beside the project, "Demo scenario"): the
// Larkfield Commons Growers give plants away on the second Saturday of June at Larkfield Commons
// Hall. Counts are made up for the tests; the screens must show whatever the API answers.

export const GROUP = 'larkfield-commons-growers';
export const SHARE_PATH = `/api/plant-shares/${GROUP}`;

export const share: PublicShare = {
  id: 'share-2027',
  groupSlug: GROUP,
  groupName: 'Larkfield Commons Growers',
  date: '2027-06-12',
  place: 'Larkfield Commons Hall, north car park',
  whatToBring: 'A box or tray for the pots.',
  status: 'open',
  limitPerSpecies: 3,
  limitTotal: 6,
  slots: [
    { id: 'slot-1', start: '2027-06-12T09:00', end: '2027-06-12T09:30', capacity: 12, left: 4 },
    { id: 'slot-2', start: '2027-06-12T09:30', end: '2027-06-12T10:00', capacity: 12, left: 0 },
  ],
  species: [
    {
      slug: 'asclepias-tuberosa',
      commonName: 'Butterfly milkweed',
      scientificName: 'Asclepias tuberosa',
      // Sun, soil, height and bloom as the USDA PLANTS profile and the catalogue record give them.
      sun: ['full'],
      moisture: ['dry', 'medium'],
      heightMinCm: 30,
      heightMaxCm: 75,
      bloomMonths: [6, 7, 8],
      isMilkweed: true,
      wildlife: ['A host plant of the monarch caterpillar.', 'Visited by many bees for its nectar.'],
      cautions: [
        { kind: 'sap-irritant', title: 'Irritating sap', text: 'Milky sap irritates eyes: wash hands after handling.' },
      ],
      stock: 40,
      left: 12,
    },
    {
      slug: 'monarda-fistulosa',
      commonName: 'Wild bergamot',
      scientificName: 'Monarda fistulosa',
      sun: ['full', 'part'],
      moisture: ['dry', 'medium'],
      heightMinCm: 60,
      heightMaxCm: 120,
      bloomMonths: [7, 8],
      isMilkweed: false,
      wildlife: ['A good caterpillar host plant among wildflowers, grasses and ferns.'],
      cautions: [],
      stock: 30,
      left: 2,
    },
    {
      slug: 'iris-virginica',
      commonName: 'Southern blue flag',
      scientificName: 'Iris virginica',
      sun: ['full', 'part'],
      moisture: ['wet'],
      heightMinCm: 60,
      heightMaxCm: 90,
      bloomMonths: [5, 6],
      isMilkweed: false,
      wildlife: [],
      cautions: [{ kind: 'toxic-if-eaten', title: 'Toxic if eaten', text: 'The roots are poisonous if eaten.' }],
      stock: 10,
      left: 0,
    },
  ],
};

export const dryFullSunFit: FitResult = {
  ranked: [
    { slug: 'asclepias-tuberosa', why: ['Thrives in dry soil and full sun.'] },
    { slug: 'monarda-fistulosa', why: ['Grows well in full sun.'] },
  ],
  notSuited: [{ slug: 'iris-virginica', why: 'Needs wet soil.' }],
};

export const reservation: Reservation = {
  token: 'private-link-token',
  groupSlug: GROUP,
  groupName: 'Larkfield Commons Growers',
  date: share.date,
  place: share.place,
  whatToBring: share.whatToBring,
  name: 'Priya Vantongeren',
  email: 'priya.vantongeren@example.org',
  slot: share.slots[0],
  items: [
    {
      slug: 'asclepias-tuberosa',
      count: 2,
      commonName: 'Butterfly milkweed',
      careSheet: ['Plant in full sun, 18 in (46 cm) apart.', 'Water weekly until it is settled; then leave it dry.'],
    },
  ],
  status: 'confirmed',
};
