import type { FlowerColour } from '@homeground/shared';

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
  white: { fill: '#FFFFFF', ink: DARK_INK, label: 'Wh', name: 'white' },
  cream: { fill: '#F1E6BF', ink: DARK_INK, label: 'Cr', name: 'cream' },
  yellow: { fill: '#F2C81F', ink: DARK_INK, label: 'Ye', name: 'yellow' },
  orange: { fill: '#E8782A', ink: DARK_INK, label: 'Or', name: 'orange' },
  red: { fill: '#B3261E', ink: LIGHT_INK, label: 'Re', name: 'red' },
  pink: { fill: '#F0A1C4', ink: DARK_INK, label: 'Pk', name: 'pink' },
  magenta: { fill: '#B0186F', ink: LIGHT_INK, label: 'Mg', name: 'magenta' },
  purple: { fill: '#6E3A96', ink: LIGHT_INK, label: 'Pu', name: 'purple' },
  lavender: { fill: '#BBA7DE', ink: DARK_INK, label: 'Lv', name: 'lavender' },
  blue: { fill: '#3566B8', ink: LIGHT_INK, label: 'Bu', name: 'blue' },
  green: { fill: '#9DBB6E', ink: DARK_INK, label: 'Gn', name: 'green' },
  brown: { fill: '#7A4E2A', ink: LIGHT_INK, label: 'Br', name: 'brown' },
};

/** For a species with no recorded flower colour (e.g. a fern): a neutral cell still labelled. */
export const UNKNOWN_SWATCH: FlowerSwatch = { fill: '#D9D4C7', ink: DARK_INK, label: '··', name: 'colour not recorded' };

export function flowerSwatch(colour: FlowerColour | undefined): FlowerSwatch {
  return colour ? FLOWER_SWATCHES[colour] : UNKNOWN_SWATCH;
}
