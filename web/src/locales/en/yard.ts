/** Find plants, step 2 (your yard) and the yard mix's frame. */
export const yard = {
  step: {
    heading: 'Step 2 of 3: your yard',
    yourGround: 'Your ground: <strong>{{place}}</strong>.',
    change: 'Change',
  },
  form: {
    label: 'Your yard',
    lightSoil: 'Light and soil',
    sun: 'How much sun does the spot get?',
    moisture: 'How wet does the soil stay?',
    soil: 'What is the soil like? (optional)',
    size: 'Size',
    area: 'Area to plant',
    areaHint: 'Length times width of the bed.',
    maxHeight: 'Tallest plant you want (optional)',
    maxHeightHint: 'For under a window or beside a path; leave empty for any height.',
    deerGoals: 'Deer and goals',
    deer: 'How often do deer visit?',
    goals: 'What should the planting do? (choose any)',
    woody: 'Add shrubs and small trees (only those that fit your bed, in a share of it)',
    spreaders: 'Include plants that spread or seed themselves about (left out of beds under 500 ft² / 46 m² otherwise)',
    submit: 'Show my yard mix',
    back: 'Back to your ground',
  },
  choices: {
    sun: {
      full: { label: 'Full sun', line: '6 hours or more of direct sun on a summer day.' },
      part: { label: 'Part shade', line: 'About 3 to 6 hours of sun, or bright dappled shade all day.' },
      shade: {
        label: 'Shade',
        line: 'Under 3 hours of direct sun, such as beneath trees or on the north side of a house.',
      },
    },
    moisture: {
      dry: {
        label: 'Dry',
        line: 'Rain drains away fast; the soil is dry a day after a shower (sand, slopes, bluffs).',
      },
      medium: { label: 'Medium', line: 'Ordinary garden soil that stays slightly moist between rains.' },
      wet: {
        label: 'Wet',
        line: 'Stays damp for days after rain, or holds water in spring (low spots, by a downspout).',
      },
    },
    soil: {
      none: { label: 'Not sure', line: 'Skip it: the mix is chosen from sun and moisture alone.' },
      sand: { label: 'Sand', line: 'Gritty; a moist handful falls apart when you open your hand.' },
      loam: { label: 'Loam', line: 'Crumbly and dark; a moist handful holds together loosely.' },
      clay: { label: 'Clay', line: 'Sticky when wet, hard and cracked when dry.' },
      rocky: { label: 'Rocky', line: 'Thin soil over stone or gravel.' },
    },
    deer: {
      low: { label: 'Rarely', line: 'You seldom see deer or bitten-off stems.' },
      medium: { label: 'Sometimes', line: 'Deer pass through now and then.' },
      high: { label: 'Often', line: 'Deer visit most weeks; hostas and tulips get eaten.' },
    },
    goal: {
      monarchs: { label: 'Monarchs', line: 'Food for monarch caterpillars: the mix includes a native milkweed.' },
      pollinators: { label: 'Pollinators', line: 'Flowers for bees and butterflies from spring into fall.' },
      birds: { label: 'Birds', line: 'Seeds, berries and caterpillars for birds to eat.' },
      'rain-garden': { label: 'Rain garden', line: 'Soaks up water from a roof or driveway in a shallow dip.' },
      'shade-garden': { label: 'Shade garden', line: 'Woodland plants for under trees.' },
      'low-spreaders': {
        label: 'Low spreaders',
        line: 'Plants that stay in their clump; fast spreaders move down the list.',
      },
    },
  },
  mix: {
    species: 'Species in the mix',
    showAs: 'Show the mix as',
    table: 'Table',
    cards: 'Cards',
    cautionsFor: 'Cautions for {{name}}',
    caution: 'Caution:',
    rebalance: 'Rebalance',
  },
} as const;
