import type { PickupList, PlantShare } from '@homeground/shared';

// The invented demo group's plant share (shared/DESIGN.md beside the project, "Demo scenario"):
// Larkfield Commons Growers, Larkfield Commons Hall, the second Saturday of June. Counts are made up
// for the tests; the screens must show whatever the API answers.

export const GROUP = 'larkfield-commons-growers';
export const SHARE_PATH = `/api/groups/${GROUP}/plant-share`;
export const SLOT_1 = '0b6b6c1e-2f0a-4a4e-9d51-6f1f3b1d9a01';
export const SLOT_2 = '0b6b6c1e-2f0a-4a4e-9d51-6f1f3b1d9a02';
export const PRIYA = '5d1d2c3b-7a5e-4f6e-8a7b-1c2d3e4f5a01';

export const share: PlantShare = {
  id: 'share-2027',
  groupSlug: GROUP,
  groupName: 'Larkfield Commons Growers',
  seasonYear: 2027,
  date: '2027-06-12',
  place: { name: 'Larkfield Commons Hall', address: '12 Commons Lane, Larkfield, WI' },
  status: 'open',
  limits: { perSpecies: 4, total: 12 },
  retentionDays: 30,
  personalDataKeptUntil: '2027-07-12',
  whatToBring: null,
  slots: [
    {
      id: SLOT_1,
      start: '2027-06-12T09:00:00-05:00',
      end: '2027-06-12T09:30:00-05:00',
      capacity: 12,
      booked: 1,
      left: 11,
    },
    {
      id: SLOT_2,
      start: '2027-06-12T09:30:00-05:00',
      end: '2027-06-12T10:00:00-05:00',
      capacity: 12,
      booked: 0,
      left: 12,
    },
  ],
  stock: [
    {
      speciesSlug: 'asclepias-tuberosa',
      commonName: 'butterfly milkweed',
      scientificName: 'Asclepias tuberosa',
      offered: 50,
      remaining: 47,
      reserved: 3,
      given: 0,
      waitlisted: 0,
    },
    {
      speciesSlug: 'monarda-fistulosa',
      commonName: 'wild bergamot',
      scientificName: 'Monarda fistulosa',
      offered: 50,
      remaining: 48,
      reserved: 2,
      given: 0,
      waitlisted: 0,
    },
  ],
  households: { confirmed: 1, 'picked-up': 0, 'no-show': 0, cancelled: 0 },
  walkUps: 0,
};

export const pickupList: PickupList = {
  slot: share.slots[0],
  households: [
    {
      reservationId: PRIYA,
      name: 'Priya Vantongeren',
      email: 'priya.vantongeren@example.org',
      zip: '54665',
      status: 'confirmed',
      plants: 5,
      lines: [
        {
          speciesSlug: 'asclepias-tuberosa',
          commonName: 'butterfly milkweed',
          scientificName: 'Asclepias tuberosa',
          count: 3,
        },
        {
          speciesSlug: 'monarda-fistulosa',
          commonName: 'wild bergamot',
          scientificName: 'Monarda fistulosa',
          count: 2,
        },
      ],
    },
  ],
  totals: {
    households: 1,
    plants: 5,
    bySpecies: [
      { speciesSlug: 'asclepias-tuberosa', commonName: 'butterfly milkweed', count: 3 },
      { speciesSlug: 'monarda-fistulosa', commonName: 'wild bergamot', count: 2 },
    ],
  },
};
