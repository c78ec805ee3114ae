/** The home page. */
export const home = {
  hero: {
    title: 'Grow the native plants that belong to your ground',
    intro:
      'Homeground helps community growing groups choose the native plants of their ecoregion, grow them from seed over winter, and share them with neighbours in spring.',
    action: 'Find plants for your ground',
  },
  how: {
    title: 'From seed to neighbour',
    chooseTitle: 'Choose',
    chooseText:
      'Tell Homeground where your ground is: state, county or ecoregion. It suggests a yard mix of native plants that grow there, with something in bloom from spring to frost, and says why each one fits.',
    growTitle: 'Grow',
    growText:
      'Many native seeds need cold-moist stratification: a few weeks of cold, damp rest before they sprout. Homeground counts sowing dates back from your last spring frost, whether you winter-sow outdoors or start trays under lights.',
    shareTitle: 'Share',
    shareText:
      'Your group hands the plants on at a plant share. Neighbours make a reservation and choose a pickup slot, so nobody waits in a long line and every plant finds a yard.',
  },
  figures: {
    title: 'In the catalogue today',
    loading: 'Loading the catalogue figures',
    error: 'The catalogue figures did not load.',
    species: 'native species in the catalogue',
    groups: 'growing groups',
    ecoregions: 'ecoregions covered',
    down: 'The catalogue is not answering right now, so these figures may be out of date.',
  },
  groups: {
    title: 'Groups growing with Homeground',
    loading: 'Loading the groups',
    error: 'The list of groups did not load.',
    emptyTitle: 'No growing groups have joined yet.',
    emptyText: 'When a group starts its first season, it shows here.',
    place: '{{town}}, {{state}}',
    ecoregion: 'ecoregion {{code}}',
    members_one: '{{count, number}} member',
    members_other: '{{count, number}} members',
  },
} as const;
