import type { GrowerMethod, LogKind, LossReason } from '../types/batch.js';

/**
 * Words for batches, batch logs and supplies, kept together so they can move into a catalogue. The
 * how-to wording is ordinary home-grower practice (from memory); CHECK-VALUES §4 rows are named
 * where a figure comes from one.
 */

/** The dated steps of a batch, in the order a grower meets them. */
export const BATCH_STEP_KINDS = [
  'start-warm',
  'start-stratifying',
  'check-sprouts',
  'sow',
  'vent-containers',
  'sprouts-expected',
  'pot-up',
  'harden-off',
  'frost-watch',
  'ready',
] as const;
export type BatchStepKind = (typeof BATCH_STEP_KINDS)[number];

export const BATCH_STEP_WORDS = {
  'start-warm': 'Start warm-moist stratifying',
  'start-stratifying': 'Start stratifying in the refrigerator',
  'check-sprouts': 'Check the seed for sprouts',
  sow: 'Sow',
  'vent-containers': 'Vent the containers on warm days, close them before a frost',
  'sprouts-expected': 'Sprouts expected',
  'pot-up': 'Pot up',
  'harden-off': 'Harden off',
  'frost-watch': 'Frost watch: protect from a late frost',
  ready: 'Ready to give',
} as const satisfies Record<BatchStepKind, string>;

export const LOG_KIND_WORDS = {
  sown: { label: 'Sown', counts: 'seeds sown' },
  germinated: { label: 'Came up', counts: 'seedlings that came up' },
  'potted-up': { label: 'Potted up', counts: 'seedlings potted up' },
  lost: { label: 'Lost', counts: 'plants lost' },
  ready: { label: 'Ready', counts: 'plants ready to give' },
} as const satisfies Record<LogKind, { label: string; counts: string }>;

export const LOSS_REASON_WORDS = {
  'late-frost': 'Late frost',
  slugs: 'Slugs',
  aphids: 'Aphids',
  'rabbits-squirrels': 'Rabbits or squirrels',
  'damping-off': 'Damping off',
  'drying-out': 'Dried out',
  other: 'Something else',
} as const satisfies Record<LossReason, string>;

/** The unit each method counts in, singular and plural. */
export const UNIT_WORDS = {
  pot: { one: 'pot', many: 'pots' },
  container: { one: 'covered container', many: 'covered containers' },
  block: { one: 'soil block', many: 'soil blocks' },
} as const;

/** A first-time grower's how-to for each method: a title and steps in order. */
export const METHOD_HOW_TO = {
  'winter-sowing': {
    title: 'Winter sowing in covered containers',
    steps: [
      'Use a clear or milky container at least 4 in (10 cm) deep, such as a gallon jug: cut it around the middle, leaving a hinge.',
      'Make 4–6 drainage holes in the bottom and leave the cap off, so rain gets in and warm air gets out.',
      'Fill with 3–4 in (8–10 cm) of damp potting mix, sow one species per container, and label it inside and out in pencil or paint pen.',
      'Tape the top shut and set it outside where rain and snow reach it; freezing and thawing are what the seed needs.',
      'On warm spring days (highs around 70–75 °F / 21–24 °C) open the tops; close them again before a frost (common practice).',
      'When the seedlings have true leaves, tease the clump apart and pot each one up.',
    ],
  },
  'outdoor-pot-winter': {
    title: 'Outdoor pots over winter',
    steps: [
      'Fill 4 in (10 cm) pots with damp potting mix and sow a few seeds in each, at the depth the batch says.',
      'Label each pot, set the pots in a tray outdoors in a sheltered spot, and cover them with wire mesh against squirrels.',
      'Leave them out all winter: the cold and wet do the stratifying. Water only if a dry spell lasts.',
      'In spring keep the pots damp; thin or split the seedlings so each pot keeps one strong plant.',
    ],
  },
  'indoor-lights': {
    title: 'Sowing indoors under lights',
    steps: [
      'Finish any stratifying first: the batch dates say when to start it.',
      'Sow in cells of damp seed-starting mix; cover the seed only as deep as the batch says (surface-sow seed that needs light).',
      'Keep the lamps 2–4 in (5–10 cm) above the seedlings for 14–16 hours a day (CHECK-VALUES §4, from memory).',
      'Water from below and run a fan or open a window a little: still, wet air brings damping off.',
      'Pot each seedling into its own 3–4 in (8–10 cm) pot at its first true leaves, then harden off before it goes outside.',
    ],
  },
  'soil-blocks': {
    title: 'Soil blocks',
    steps: [
      'Mix soil-block mix with water until it holds together like wet brownie batter, and let it soak for an hour.',
      'Press blocks with a blocker onto a tray; press firmly so they hold their shape.',
      'Sow one or two seeds in the dimple of each block and keep the blocks damp by watering the tray from below.',
      'Grow on under lights (14–16 hours a day); move mini blocks into 2 in (5 cm) blocks when roots show at the sides.',
      'Harden off before planting: the block goes out whole, with no pot and no root disturbance.',
    ],
  },
} as const satisfies Record<GrowerMethod, { title: string; steps: readonly string[] }>;

/** How-to steps for stratifying in the refrigerator (IPN, CHECK-VALUES §4, R, unless marked). */
export const FRIDGE_STRATIFYING_HOW_TO = {
  title: 'Cold-moist stratification in the refrigerator',
  steps: [
    'Mix 1 part seed with 2–3 parts damp vermiculite or sand: damp but not wet enough to drip when squeezed.',
    'Or fold the seed into a damp paper towel. Seal it in a bag labelled with the species and the start date.',
    'Keep it in the refrigerator at about 33–41 °F (1–5 °C), never the freezer.',
    'From about four weeks in, look for sprouts; sow at once if any have sprouted.',
  ],
} as const;

/** How-to for a hard seed coat (BH05, R, for the hot-water figure; the rest common practice). */
export const SCARIFYING_HOW_TO = {
  title: 'Scarification',
  steps: [
    'Rub the seed between two sheets of fine sandpaper, or nick each seed with a nail file, just through the coat.',
    'Sow soon after: once water can get in, the seed is ready to sprout.',
  ],
} as const;

export const HARDEN_OFF_HOW_TO = {
  title: 'Hardening off',
  steps: [
    'Start with 1–2 hours a day outdoors in shade and add about an hour a day (UF-HO, R).',
    'After about a week, leave the plants out in full sun all day; bring them in or cover them if frost is forecast.',
  ],
} as const;

/**
 * Cautions for the work of raising plants (common practice; defer to the product labels and
 * local rules).
 */
export const BATCH_CAUTIONS: readonly string[] = [
  'Dry potting mix, soil-block mix and vermiculite are dusty: dampen them before you use them, and work outdoors or wear a dust mask.',
  'Wear gloves when handling potting mix and wash your hands afterwards.',
  'Keep seed stratifying in the refrigerator sealed and labelled, away from food and out of reach of children.',
];

/** What to do on a frosty night, per method (common practice, from memory; CHECK-VALUES §4 for venting). */
export const FROST_NIGHT_WORDS = {
  'winter-sowing': 'close the container tops before evening',
  'outdoor-pot-winter': 'cover the pots with frost cloth or an old sheet, or move them against the house',
  'indoor-lights': 'bring seedlings that are hardening off indoors for the night',
  'soil-blocks': 'bring blocks that are hardening off indoors for the night',
} as const satisfies Record<GrowerMethod, string>;
