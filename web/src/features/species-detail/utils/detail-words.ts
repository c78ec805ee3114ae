import type { Species } from '@homeground/shared';

type Habitat = Species['habitats'][number];

/** Plant communities in everyday words. */
export const HABITAT_WORDS: Record<Habitat, string> = {
  prairie: 'prairie',
  'sand-prairie': 'sand prairie',
  'wet-prairie': 'wet prairie',
  savanna: 'savanna',
  'open-woodland': 'open woodland',
  forest: 'forest',
  'floodplain-forest': 'floodplain forest',
  wetland: 'wetland',
  marsh: 'marsh',
  'fen-bog': 'fen or bog',
  streambank: 'streambank',
  glade: 'glade',
  'rock-outcrop': 'rock outcrop',
  dune: 'dune',
  'coastal-plain': 'coastal plain',
  'pine-barrens': 'pine barrens',
  'old-field': 'old field',
  'shortgrass-prairie': 'shortgrass prairie',
  'mixed-grass-prairie': 'mixed-grass prairie',
};

export const SOIL_WORDS: Record<Species['soilTextures'][number], string> = { sand: 'sand', loam: 'loam', clay: 'clay', rocky: 'rocky soil' };
export const SUN_WORDS: Record<Species['sun'][number], string> = { full: 'full sun', part: 'part sun', shade: 'shade' };
export const MOISTURE_WORDS: Record<Species['moisture'][number], string> = { dry: 'dry', medium: 'medium', wet: 'wet' };

export const LIFESPAN_WORDS: Record<Species['lifespan'], string> = {
  annual: 'annual (one season)',
  biennial: 'biennial (flowers in its second year, then dies)',
  'short-lived-perennial': 'short-lived perennial (a few years; lets seedlings replace it)',
  perennial: 'perennial',
};

export const GROWTH_FORM_WORDS: Record<Species['growthForm'], string> = {
  forb: 'forb (wildflower)',
  graminoid: 'graminoid (grass or sedge)',
  fern: 'fern',
  shrub: 'shrub',
  vine: 'vine',
  tree: 'tree',
};

export const SPREAD_WORDS: Record<Species['spreadHabit'], string> = {
  clumping: 'Clumping: stays where you plant it',
  spreading: 'Spreading: widens by roots or seed over the years',
  aggressive: 'Aggressive: spreads fast and can crowd out neighbours; give it room or a barrier',
};

export const DEER_WORDS: Record<Species['deerResistance'], string> = {
  low: 'Low: deer often browse it',
  medium: 'Medium: browsed now and then',
  high: 'High: deer usually leave it alone',
};

export const CAUTION_TITLES: Record<Species['cautions'][number]['kind'], string> = {
  'toxic-if-eaten': 'Toxic if eaten',
  'sap-irritant': 'Irritating sap',
  'skin-irritant': 'Skin irritant',
  'eye-irritant': 'Eye irritant',
  pets: 'Pets',
  livestock: 'Livestock',
  'aggressive-spreader': 'Spreads aggressively',
  'look-alike': 'Look-alike',
  protected: 'Protected',
  thorns: 'Thorns',
  regulated: 'Restricted in some states',
};

/** "a, b and c". */
export function joinWords(words: readonly string[]): string {
  if (words.length <= 1) return words[0] ?? '';
  return `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}
