import type { BrandVariants } from '@fluentui/react-components';

/** Homeground's brand colours (DESIGN.md "Look"). Hex lives only in this folder. */
export const BRAND_DARKEST = '#0F2410';
/** Sedge green: Fluent's light theme uses shade 80 for primary buttons and selected states. */
export const BRAND_SEDGE = '#3F6B3A';
export const BRAND_LIGHTEST = '#E7F0E4';

const SHADES = [10, 20, 30, 40, 50, 60, 70, 80, 90, 100, 110, 120, 130, 140, 150, 160] as const;
const SEDGE_SHADE = 80;

function toRgb(hex: string): [number, number, number] {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

function toHex(rgb: [number, number, number]): string {
  return `#${rgb
    .map((c) => Math.round(c).toString(16).padStart(2, '0'))
    .join('')
    .toUpperCase()}`;
}

/** Straight sRGB mix: t = 0 gives `from`, t = 1 gives `to`. */
export function mixHex(from: string, to: string, t: number): string {
  const a = toRgb(from);
  const b = toRgb(to);
  return toHex([a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t, a[2] + (b[2] - a[2]) * t]);
}

/**
 * Builds the 16-step Fluent ramp in two legs, darkest → sedge (10..80) and sedge → lightest
 * (80..160), so sedge green lands exactly on shade 80 instead of somewhere between steps.
 */
export function buildBrandRamp(darkest: string, sedge: string, lightest: string): BrandVariants {
  const ramp: Record<number, string> = {};
  for (const shade of SHADES) {
    ramp[shade] =
      shade <= SEDGE_SHADE
        ? mixHex(darkest, sedge, (shade - 10) / (SEDGE_SHADE - 10))
        : mixHex(sedge, lightest, (shade - SEDGE_SHADE) / (160 - SEDGE_SHADE));
  }
  return ramp as unknown as BrandVariants;
}

export const homegroundBrand: BrandVariants = buildBrandRamp(BRAND_DARKEST, BRAND_SEDGE, BRAND_LIGHTEST);
