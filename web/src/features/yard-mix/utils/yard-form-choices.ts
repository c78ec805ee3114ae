import type { DeerPressure, Goal, Moisture, SoilTexture, Sun } from '@homeground/shared';

/** One answer with a line that helps a homeowner pick it. */
export interface Choice<T extends string> {
  value: T;
  label: string;
  line: string;
}

export const SUN_CHOICES: readonly Choice<Sun>[] = [
  { value: 'full', label: 'Full sun', line: '6 hours or more of direct sun on a summer day.' },
  { value: 'part', label: 'Part shade', line: 'About 3 to 6 hours of sun, or bright dappled shade all day.' },
  {
    value: 'shade',
    label: 'Shade',
    line: 'Under 3 hours of direct sun, such as beneath trees or on the north side of a house.',
  },
];

export const MOISTURE_CHOICES: readonly Choice<Moisture>[] = [
  {
    value: 'dry',
    label: 'Dry',
    line: 'Rain drains away fast; the soil is dry a day after a shower (sand, slopes, bluffs).',
  },
  { value: 'medium', label: 'Medium', line: 'Ordinary garden soil that stays slightly moist between rains.' },
  {
    value: 'wet',
    label: 'Wet',
    line: 'Stays damp for days after rain, or holds water in spring (low spots, by a downspout).',
  },
];

export const SOIL_CHOICES: readonly Choice<SoilTexture | ''>[] = [
  { value: '', label: 'Not sure', line: 'Skip it: the mix is chosen from sun and moisture alone.' },
  { value: 'sand', label: 'Sand', line: 'Gritty; a moist handful falls apart when you open your hand.' },
  { value: 'loam', label: 'Loam', line: 'Crumbly and dark; a moist handful holds together loosely.' },
  { value: 'clay', label: 'Clay', line: 'Sticky when wet, hard and cracked when dry.' },
  { value: 'rocky', label: 'Rocky', line: 'Thin soil over stone or gravel.' },
];

export const DEER_CHOICES: readonly Choice<DeerPressure>[] = [
  { value: 'low', label: 'Rarely', line: 'You seldom see deer or bitten-off stems.' },
  { value: 'medium', label: 'Sometimes', line: 'Deer pass through now and then.' },
  { value: 'high', label: 'Often', line: 'Deer visit most weeks; hostas and tulips get eaten.' },
];

export const GOAL_CHOICES: readonly Choice<Goal>[] = [
  { value: 'monarchs', label: 'Monarchs', line: 'Food for monarch caterpillars: the mix includes a native milkweed.' },
  { value: 'pollinators', label: 'Pollinators', line: 'Flowers for bees and butterflies from spring into fall.' },
  { value: 'birds', label: 'Birds', line: 'Seeds, berries and caterpillars for birds to eat.' },
  { value: 'rain-garden', label: 'Rain garden', line: 'Soaks up water from a roof or driveway in a shallow dip.' },
  { value: 'shade-garden', label: 'Shade garden', line: 'Woodland plants for under trees.' },
  {
    value: 'low-spreaders',
    label: 'Low spreaders',
    line: 'Plants that stay in their clump; fast spreaders move down the list.',
  },
];
