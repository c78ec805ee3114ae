import { createLightTheme, type Theme } from '@fluentui/react-components';
import { homegroundBrand } from './brand-ramp.js';

/** Families match the names declared by the bundled @fontsource CSS (src/theme/fonts.ts). */
const OPEN_SANS = "'Open Sans', 'Segoe UI', system-ui, -apple-system, sans-serif";
const MERRIWEATHER = "'Merriweather', Georgia, 'Times New Roman', serif";

/**
 * Homeground's own tokens beyond Fluent's set. FluentProvider writes every theme key as a CSS
 * variable (`--hgColorPaper`), so components read these exactly like Fluent's `tokens`.
 */
export const homegroundExtras = {
  hgColorPaper: '#FAF7F0',
  hgColorGoldenrod: '#C9961A',
  hgColorAsterViolet: '#6A4C93',
  hgColorLoam: '#5B4636',
  hgFontFamilyHeading: MERRIWEATHER,
} as const;

type HomegroundExtras = { [K in keyof typeof homegroundExtras]: string };

/** CSS-variable references for the extra tokens, for use in makeStyles. */
export const hgTokens: HomegroundExtras = {
  hgColorPaper: 'var(--hgColorPaper)',
  hgColorGoldenrod: 'var(--hgColorGoldenrod)',
  hgColorAsterViolet: 'var(--hgColorAsterViolet)',
  hgColorLoam: 'var(--hgColorLoam)',
  hgFontFamilyHeading: 'var(--hgFontFamilyHeading)',
};

export const homegroundTheme: Theme & HomegroundExtras = {
  ...createLightTheme(homegroundBrand),
  fontFamilyBase: OPEN_SANS,
  fontFamilyNumeric: OPEN_SANS,
  ...homegroundExtras,
};
