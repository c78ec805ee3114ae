import type { DEER_RESISTANCE, FlowerColour, GrowthForm, LIFESPANS, SPREAD_HABITS } from '../types/species.js';

export type Lifespan = (typeof LIFESPANS)[number];
export type SpreadHabit = (typeof SPREAD_HABITS)[number];
export type DeerResistance = (typeof DEER_RESISTANCE)[number];

/** Trade terms first (DESIGN.md "Words we use"), with a plain gloss for the two that need one. */
export const GROWTH_FORM_WORDS = {
  forb: 'forb (wildflower)',
  graminoid: 'graminoid (grass or sedge)',
  fern: 'fern',
  shrub: 'shrub',
  vine: 'vine',
  tree: 'tree',
} as const satisfies Record<GrowthForm, string>;

export const LIFESPAN_WORDS = {
  annual: 'annual (one season)',
  biennial: 'biennial (flowers in its second year, then dies)',
  'short-lived-perennial': 'short-lived perennial (a few years; lets seedlings replace it)',
  perennial: 'perennial',
} as const satisfies Record<Lifespan, string>;

/** A name and what it means in the garden. */
export interface HabitWords {
  label: string;
  line: string;
}

export const SPREAD_HABIT_WORDS = {
  clumping: { label: 'Clumping', line: 'stays where you plant it' },
  spreading: { label: 'Spreading', line: 'widens by roots or seed over the years' },
  aggressive: { label: 'Aggressive', line: 'spreads fast and can crowd out neighbours; give it room or a barrier' },
} as const satisfies Record<SpreadHabit, HabitWords>;

export const DEER_RESISTANCE_WORDS = {
  low: { label: 'Low', line: 'deer often browse it' },
  medium: { label: 'Medium', line: 'browsed now and then' },
  high: { label: 'High', line: 'deer usually leave it alone' },
} as const satisfies Record<DeerResistance, HabitWords>;

/** "Clumping: stays where you plant it". */
export function habitLine(words: HabitWords): string {
  return `${words.label}: ${words.line}`;
}

/** Flower colours as a card or a bloom-chart legend names them. */
export const FLOWER_COLOUR_WORDS = {
  white: 'white',
  cream: 'cream',
  yellow: 'yellow',
  orange: 'orange',
  red: 'red',
  pink: 'pink',
  magenta: 'magenta',
  purple: 'purple',
  lavender: 'lavender',
  blue: 'blue',
  green: 'green',
  brown: 'brown',
} as const satisfies Record<FlowerColour, string>;
