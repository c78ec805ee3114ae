import { DURATIONS } from '../sowing-calendar/durations.js';
import type { SowingMethod, TREATMENT_KINDS, TreatmentStep } from '../types/species.js';
import { joinWords } from './join-words.js';

/**
 * Seed treatments and sowing methods in one wording for fact cards, pot labels, species pages, the
 * sowing calendar and the mix. The how-to wording is ordinary nursery practice (from-memory); a
 * record's days and notes are its own (its `germination.treatments` source).
 */

export type TreatmentKind = (typeof TREATMENT_KINDS)[number];

export interface TreatmentWords {
  /** The trade's name, as a heading: "Cold-moist stratification". */
  name: string;
  /** A pot label's few letters; CMS and WMS are the trade's short forms (from-memory). */
  short: string;
  /** One sentence on how, for a fact card. */
  brief: string;
  /** The household way of doing it, for a species page. Moist steps add their days (see `treatmentHow`). */
  how: string;
}

/** Length assumed when a moist step gives none: the sowing calendar's (~60 d, iowa-prairie-network-stratification). */
export const DEFAULT_MOIST_DAYS = DURATIONS.defaultColdMoistDays;

export const TREATMENT_WORDS = {
  none: {
    name: 'No pre-treatment needed',
    short: 'no treatment',
    brief: 'No treatment needed: sow the seed as it comes.',
    how: 'Sow the seed as it comes.',
  },
  'cold-moist': {
    name: 'Cold-moist stratification',
    short: 'CMS',
    brief: 'mix the seed with damp sand in a sealed bag in the refrigerator.',
    how: 'Mix the seed with a little damp sand, or fold it into a damp paper towel, and seal it in a labelled bag.',
  },
  'warm-moist': {
    name: 'Warm-moist stratification',
    short: 'WMS',
    brief: 'keep the seed in damp sand in a sealed bag at room temperature.',
    how: 'Keep the seed in damp sand or a damp paper towel at room temperature',
  },
  scarification: {
    name: 'Scarification',
    short: 'scarify',
    brief: 'Nick or sand the seed coat (scarification) so water can get in.',
    how: 'The seed coat is hard. Rub it with fine sandpaper or nick it with a nail file, just through the coat, so water can get in.',
  },
  'hot-water': {
    name: 'Hot-water soak',
    short: 'hot water',
    brief: 'Pour water just off the boil over the seed and let it soak overnight as it cools.',
    how: 'Pour water just off the boil over the seed and leave it to soak overnight as it cools. Sow the seeds that have swelled.',
  },
  inoculant: {
    name: 'Inoculant',
    short: 'inoculate',
    brief: 'Coat the seed with the matching rhizobial inoculant just before sowing.',
    how: 'Just before sowing, coat the damp seed with the rhizobium inoculant made for this plant group, so the roots can fix nitrogen.',
  },
} as const satisfies Record<TreatmentKind, TreatmentWords>;

function isMoist(kind: TreatmentKind): kind is 'cold-moist' | 'warm-moist' {
  return kind === 'cold-moist' || kind === 'warm-moist';
}

/** 30 → "about 4 weeks"; 5 → "about a week". */
export function weeksWords(days: number): string {
  const w = Math.round(days / 7);
  return w <= 1 ? 'about a week' : `about ${w} weeks`;
}

/** "Cold-moist stratification, 30 days", "Scarification". */
export function treatmentTitle(step: Pick<TreatmentStep, 'kind' | 'days'>): string {
  const words = TREATMENT_WORDS[step.kind];
  return isMoist(step.kind) ? `${words.name}, ${step.days ?? DEFAULT_MOIST_DAYS} days` : words.name;
}

/** A fact card's sentence: "Cold-moist stratification, 30 days: mix the seed … refrigerator." */
export function treatmentBrief(step: Pick<TreatmentStep, 'kind' | 'days'>): string {
  return isMoist(step.kind)
    ? `${treatmentTitle(step)}: ${TREATMENT_WORDS[step.kind].brief}`
    : TREATMENT_WORDS[step.kind].brief;
}

/** A pot label's letters for one step: "CMS 60 d", "scarify". */
export function treatmentShortWords(step: Pick<TreatmentStep, 'kind' | 'days'>): string {
  const words = TREATMENT_WORDS[step.kind];
  return isMoist(step.kind) ? `${words.short} ${step.days ?? DEFAULT_MOIST_DAYS} d` : words.short;
}

/** A species page's how-to for one step, with the days and weeks for a moist step. */
export function treatmentHow(step: Pick<TreatmentStep, 'kind' | 'days'>): string {
  const days = step.days ?? DEFAULT_MOIST_DAYS;
  const when = `${days} days (${weeksWords(days)})`;
  switch (step.kind) {
    case 'cold-moist':
      return (
        `${TREATMENT_WORDS['cold-moist'].how} Keep it in the refrigerator, not the freezer, for ${when}, ` +
        'checking now and then that it stays damp. Sowing outdoors in late fall or winter does the same job.'
      );
    case 'warm-moist':
      return `${TREATMENT_WORDS['warm-moist'].how} for ${when} before the next step.`;
    default:
      return TREATMENT_WORDS[step.kind].how;
  }
}

export interface SowingMethodWords {
  /** Inside a sentence: "raised by winter sowing in covered containers". */
  phrase: string;
  /** How it is done, in one sentence. */
  how: string;
}

/** The five ways Homeground's growers raise plants, as the trade names them. */
export const SOWING_METHOD_WORDS = {
  'outdoor-pot-winter': {
    phrase: 'outdoor pots over winter',
    how: 'Sow in pots in late fall and leave them outside; winter does the chilling.',
  },
  'winter-sowing': {
    phrase: 'winter sowing in covered containers',
    how: 'Sow in covered containers with air and drainage holes, set outside in winter.',
  },
  'indoor-lights': {
    phrase: 'sowing indoors under lights',
    how: 'Sow indoors after any treatment, grow on under lights, then harden off.',
  },
  'soil-blocks': {
    phrase: 'soil blocks',
    how: 'Sow into pressed blocks of compost; roots stop at the air and transplant without a pot.',
  },
  'direct-seed': { phrase: 'direct seeding', how: 'Sow straight into prepared ground, usually in late fall.' },
} as const satisfies Record<SowingMethod, SowingMethodWords>;

/** ['winter-sowing', 'direct-seed'] → "winter sowing in covered containers or direct seeding". */
export function sowingMethodsPhrase(methods: readonly SowingMethod[], conjunction: 'and' | 'or' = 'or'): string {
  return joinWords(
    methods.map((m) => SOWING_METHOD_WORDS[m].phrase),
    conjunction,
  );
}
