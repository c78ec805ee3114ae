import type { SeasonTarget, SowingMethod } from '@homeground/shared';

/**
 * The Larkfield Commons Growers' 2027 season, part of the invented demo scenario. The targets are the
 * share list Homeground proposes for ecoregion 52 with the group's three methods, a dozen species and
 * a quarter of the plants milkweeds (seasons.e2e-spec.ts checks they still are).
 */
export const DEMO_SEASON = {
  year: 2027,
  // Invented demo value, typical of south-west Wisconsin's Driftless Area: look up your own
  // place's average last spring frost.
  lastFrost: '2027-05-10',
  // The second Saturday of June 2027, when the group holds its plant share.
  plantShareDate: '2027-06-12',
  methods: ['winter-sowing', 'outdoor-pot-winter', 'indoor-lights'] as SowingMethod[],
  milkweedShare: 0.25,
  lossFactor: 0.2,
  seedsPerPacket: 100,
};

export const DEMO_TARGETS: SeasonTarget[] = [
  // Invented demo value: the group's own germination test of last year's swamp milkweed seed.
  { slug: 'asclepias-incarnata', targetPlants: 50, germinationRatePct: 75 },
  { slug: 'asclepias-tuberosa', targetPlants: 50 },
  { slug: 'asclepias-verticillata', targetPlants: 50 },
  { slug: 'elymus-virginicus', targetPlants: 50 },
  { slug: 'symphyotrichum-lateriflorum', targetPlants: 50 },
  { slug: 'rudbeckia-hirta', targetPlants: 50 },
  { slug: 'carex-vulpinoidea', targetPlants: 50 },
  { slug: 'monarda-fistulosa', targetPlants: 50 },
  { slug: 'solidago-speciosa', targetPlants: 50 },
  { slug: 'viola-canadensis', targetPlants: 50 },
  { slug: 'packera-aurea', targetPlants: 50 },
  { slug: 'helianthus-occidentalis', targetPlants: 50 },
];
