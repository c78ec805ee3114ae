/** The catalogue checked against the open reference data (curators). */
export const reference = {
  page: {
    title: 'Checked against the reference',
    intro:
      'Each record set beside the open reference data: USDA PLANTS, the caterpillar host table (Tallamy & Shropshire 2009) and the SylvanSeeds germination trials. Below are the differences no record explains yet; explain each one in the record, or fix the record.',
    notCurator: 'This page is for curators.',
    loading: 'Comparing the catalogue with the reference',
    error: 'The comparison did not load.',
    open: 'Check the catalogue against the reference',
  },
  count: {
    summary_one: '{{count}} difference not yet explained, across {{records}} of {{compared}} records.',
    summary_other: '{{count}} differences not yet explained, across {{records}} of {{compared}} records.',
    none: 'Every difference from the reference is explained: {{compared}} records compared.',
  },
  missing: {
    title: 'The reference files are not here',
    text: 'Homeground reads the open reference data where it is configured and found none of: {{files}}. Nothing is compared until they are there.',
  },
  record: {
    title: 'Checked against the reference',
    loading: 'Comparing this record with the reference',
    error: 'The comparison did not load.',
    edit: 'Edit the record',
  },
  table: {
    fact: 'Fact',
    record: 'This record',
    reference: 'The reference says',
    verdict: 'Checked',
    note: 'Note on the record',
    source: 'From {{file}} (source “{{source}}”)',
    rule: 'How compared: {{rule}}',
    noNote: 'No note',
  },
  verdicts: {
    agrees: 'Agrees',
    differs: 'Differs',
    'no-reference': 'The reference has no value',
    shown: 'For reading (not judged)',
  },
  fields: {
    usdaSymbol: 'USDA symbol',
    scientificName: 'Accepted name',
    family: 'Family',
    nativeStates: 'Native states',
    heightCm: 'Height',
    bloomMonths: 'Bloom months',
    sun: 'Sun and shade',
    moisture: 'Moisture',
    'germination.seedsPerPound': 'Seeds per pound',
    'wildlife.lepidopteraGenusCount': 'Caterpillar species on the genus',
    'germination.germinationRatePct': 'Germination rate',
  },
} as const;
