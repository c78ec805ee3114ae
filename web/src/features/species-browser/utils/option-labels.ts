import type { Caution, GrowthForm, Moisture, Sun } from '@homeground/shared';

/** Words for the catalogue's codes, as the filters and table cells show them. */
export const SUN_LABELS: Record<Sun, string> = { full: 'Full sun', part: 'Part sun', shade: 'Shade' };
export const MOISTURE_LABELS: Record<Moisture, string> = { dry: 'Dry', medium: 'Medium', wet: 'Wet' };

/** Trade terms first (DESIGN.md "Words we use"), with a plain gloss for the two that need one. */
export const GROWTH_FORM_LABELS: Record<GrowthForm, string> = {
  forb: 'Forb (wildflower)',
  graminoid: 'Graminoid (grass, sedge)',
  fern: 'Fern',
  shrub: 'Shrub',
  vine: 'Vine',
  tree: 'Tree',
};

/** Short words for a table cell; the detail page gives each caution's full, specific text. */
export const CAUTION_SHORT_LABELS: Record<Caution['kind'], string> = {
  'toxic-if-eaten': 'Toxic if eaten',
  'sap-irritant': 'Irritating sap',
  'skin-irritant': 'Skin irritant',
  'eye-irritant': 'Eye irritant',
  pets: 'Harmful to pets',
  livestock: 'Harmful to livestock',
  'aggressive-spreader': 'Spreads aggressively',
  'look-alike': 'Has look-alikes',
  protected: 'Protected',
  thorns: 'Thorns',
  regulated: 'Restricted in some states',
};

export function listWords<T extends string>(values: readonly T[], labels: Record<T, string>): string {
  return values.map((v) => labels[v]).join(', ');
}
