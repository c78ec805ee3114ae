import { FLOWER_COLOUR_WORDS, type FlowerColour } from '@homeground/shared';

/**
 * Real flower colours for the bloom chart, each with a short label printed in the cell so the
 * colour is never the only cue, and an ink colour chosen for at least 4.5:1 contrast on it.
 * Hex lives only in this folder (DESIGN.md "Look").
 */
export interface FlowerSwatch {
  fill: string;
  ink: string;
  /** Two letters shown in each bloom-chart cell. */
  label: string;
  name: string;
}

const DARK_INK = '#1B1B1B';
const LIGHT_INK = '#FFFFFF';

export const FLOWER_SWATCHES: Record<FlowerColour, FlowerSwatch> = {
  white: { fill: '#FFFFFF', ink: DARK_INK, label: 'Wh', name: FLOWER_COLOUR_WORDS.white },
  cream: { fill: '#F1E6BF', ink: DARK_INK, label: 'Cr', name: FLOWER_COLOUR_WORDS.cream },
  yellow: { fill: '#F2C81F', ink: DARK_INK, label: 'Ye', name: FLOWER_COLOUR_WORDS.yellow },
  orange: { fill: '#E8782A', ink: DARK_INK, label: 'Or', name: FLOWER_COLOUR_WORDS.orange },
  red: { fill: '#B3261E', ink: LIGHT_INK, label: 'Re', name: FLOWER_COLOUR_WORDS.red },
  pink: { fill: '#F0A1C4', ink: DARK_INK, label: 'Pk', name: FLOWER_COLOUR_WORDS.pink },
  magenta: { fill: '#B0186F', ink: LIGHT_INK, label: 'Mg', name: FLOWER_COLOUR_WORDS.magenta },
  purple: { fill: '#6E3A96', ink: LIGHT_INK, label: 'Pu', name: FLOWER_COLOUR_WORDS.purple },
  lavender: { fill: '#BBA7DE', ink: DARK_INK, label: 'Lv', name: FLOWER_COLOUR_WORDS.lavender },
  blue: { fill: '#3566B8', ink: LIGHT_INK, label: 'Bu', name: FLOWER_COLOUR_WORDS.blue },
  green: { fill: '#9DBB6E', ink: DARK_INK, label: 'Gn', name: FLOWER_COLOUR_WORDS.green },
  brown: { fill: '#7A4E2A', ink: LIGHT_INK, label: 'Br', name: FLOWER_COLOUR_WORDS.brown },
};

/** For a species with no recorded flower colour (e.g. a fern): a neutral cell still labelled. */
export const UNKNOWN_SWATCH: FlowerSwatch = {
  fill: '#D9D4C7',
  ink: DARK_INK,
  label: '··',
  name: 'colour not recorded',
};

export function flowerSwatch(colour: FlowerColour | undefined): FlowerSwatch {
  return colour ? FLOWER_SWATCHES[colour] : UNKNOWN_SWATCH;
}
