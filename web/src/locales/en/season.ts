/** The season plan's page, dates and methods (targets, share list and seed list still keep their own words). */
export const season = {
  page: {
    title: 'Season plan',
    titleYear: 'Season plan {{year}}',
    loading: 'Loading the season plan',
    failed: 'The season plan did not load.',
    where: '{{group}}, {{town}}.',
    whereEcoregion: '{{group}}, {{town}} (ecoregion {{code}}).',
    leadOrganiser: 'Set the targets, ask for a share list, and buy or collect what the seed list says.',
    leadReader: 'The organisers set this plan; ask them if something should change.',
  },
  noGroup: {
    label: 'No growing group',
    text: 'The season plan belongs to a community growing group: its organisers choose the species and targets and work out the seed list, and its growers and members can read it here. You are not in a growing group yet. An organiser can invite you by e-mail.',
  },
  dates: {
    title: 'Dates and methods',
    lastFrost: 'Average last spring frost',
    plantShare: 'Plant share',
    methods: 'How the growers sow',
    milkweeds: 'Milkweeds for monarchs',
    milkweedShare: '{{share, number(style: percent)}} of the plants',
    losses: 'Seedlings allowed for losses',
    seedsPerPacket: 'Seeds in a packet',
    form: "Change the season's dates",
    save: 'Save the dates',
    saving: 'Saving…',
    saved: 'Dates saved: batch dates follow them.',
  },
};
