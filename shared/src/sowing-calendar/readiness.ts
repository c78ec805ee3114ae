import type { GrowthForm, Species } from '../types/species.js';

/** How long a species takes from sprouting to a plant fit to give (a sturdy plug or pot). */
export interface Readiness {
  /** Weeks from sprouting to a sturdy plant when raised under lights or in soil blocks. */
  indoorWeeks: number;
  /** Weeks from sprouting to a sturdy plant when raised outdoors (winter sowing, outdoor pots). */
  outdoorWeeks: number;
  /**
   * True when the first season's seedling is too small to give: it stays in its pot through a
   * winter and is ready after the next spring's frost watch.
   */
  secondSeason: boolean;
  /** True when seed sown outdoors waits for warm soil (about 10–13 °C / 50–55 °F) to sprout. */
  needsWarmSoil: boolean;
  /**
   * True when the seed makes a root after one winter and its first leaf only after a second
   * (double dormancy), however it is sown outdoors.
   */
  doubleDormancy: boolean;
  /** True when cold-moist stratification works best in light rather than in a dark refrigerator. */
  stratifyInLight: boolean;
  /** Key in species-data/sources.json, or 'from-memory' / 'common-practice'. */
  source: string;
  /** Plain words on why, for event details and tests. */
  why: string;
}

/** A rule: the fields it sets, with the source that says so. Later, narrower rules win. */
interface ReadinessRule extends Partial<Omit<Readiness, 'source' | 'why'>> {
  source: string;
  why: string;
}

/** Default for perennial forbs: about 8 weeks from sowing to a plug under lights (M, CHECK-VALUES §4). */
const BASE: Readiness = {
  indoorWeeks: 7,
  outdoorWeeks: 6,
  secondSeason: false,
  needsWarmSoil: false,
  doubleDormancy: false,
  stratifyInLight: false,
  source: 'from-memory',
  why: 'most perennial wildflowers make a sturdy plug about 7 weeks after sprouting under lights, 6 outdoors',
};

const BY_FORM: Partial<Record<GrowthForm, ReadinessRule>> = {
  graminoid: {
    indoorWeeks: 8,
    outdoorWeeks: 7,
    source: 'from-memory',
    why: 'grasses and sedges need about 8 weeks to fill a plug with roots',
  },
  // Woody plants from seed are one-year seedlings at best in their first summer (from memory).
  shrub: {
    secondSeason: true,
    source: 'from-memory',
    why: 'shrub seedlings need a second season in the pot to be worth planting',
  },
  tree: {
    secondSeason: true,
    source: 'from-memory',
    why: 'tree seedlings need a second season in the pot to be worth planting',
  },
  vine: {
    indoorWeeks: 8,
    outdoorWeeks: 7,
    source: 'from-memory',
    why: 'vines need a few weeks more to root into the pot',
  },
};

const BY_LIFESPAN: Partial<Record<Species['lifespan'], ReadinessRule>> = {
  annual: {
    indoorWeeks: 5,
    outdoorWeeks: 5,
    source: 'from-memory',
    why: 'annuals grow fast and are ready in about 5 weeks',
  },
  biennial: {
    indoorWeeks: 6,
    outdoorWeeks: 6,
    source: 'from-memory',
    why: 'biennials make a rosette in about 6 weeks',
  },
};

// Warm-season grasses germinate only in warm soil (≥10–13 °C soil, CHECK-VALUES §4, M).
const WARM_SEASON_GRASS: ReadinessRule = {
  needsWarmSoil: true,
  indoorWeeks: 8,
  outdoorWeeks: 7,
  source: 'from-memory',
  why: 'a warm-season grass: it sprouts only once the soil is about 10–13 °C (50–55 °F)',
};

// Spring ephemerals and woodland lilies: a root after the first winter, a leaf after the second (from memory).
const DOUBLE_DORMANT: ReadinessRule = {
  doubleDormancy: true,
  secondSeason: true,
  source: 'from-memory',
  why: 'the seed makes a root after its first winter and its first leaf only after a second; the seedling is tiny for a year more',
};

const BY_GENUS: Record<string, ReadinessRule> = {
  Andropogon: WARM_SEASON_GRASS,
  Schizachyrium: WARM_SEASON_GRASS,
  Sorghastrum: WARM_SEASON_GRASS,
  Panicum: WARM_SEASON_GRASS,
  Bouteloua: WARM_SEASON_GRASS,
  Tripsacum: WARM_SEASON_GRASS,
  Eragrostis: WARM_SEASON_GRASS,
  // Sporobolus heterolepis "slow to establish" (CHECK-VALUES §1, from memory); the genus is warm-season.
  Sporobolus: {
    ...WARM_SEASON_GRASS,
    indoorWeeks: 12,
    outdoorWeeks: 11,
    why: 'a slow warm-season grass: it needs warm soil and about 12 weeks to fill a plug',
  },
  // Lupinus perennis germinates fastest at 24–29 °C (JEH96, R).
  Lupinus: {
    needsWarmSoil: true,
    source: 'jeh-1996-lupinus',
    why: 'lupine sprouts fastest at 24–29 °C (75–85 °F), so outdoors it waits for warm soil',
  },
  // Taprooted legumes and compass plants: a slow, deep first year (from memory).
  Baptisia: {
    indoorWeeks: 12,
    outdoorWeeks: 11,
    source: 'from-memory',
    why: 'wild indigo puts its first weeks into a deep root; a sturdy pot takes about 12 weeks',
  },
  Silphium: {
    secondSeason: true,
    source: 'from-memory',
    why: 'compass plants spend the first year on a taproot and a small rosette; give them in their second spring',
  },
  // Echinacea: CMS in light beat CMS in darkness (ROM05, R).
  Echinacea: {
    stratifyInLight: true,
    indoorWeeks: 9,
    outdoorWeeks: 8,
    source: 'romero-2005',
    why: 'coneflowers stratify better in light than in the dark',
  },
  Trillium: DOUBLE_DORMANT,
  Uvularia: DOUBLE_DORMANT,
  Polygonatum: DOUBLE_DORMANT,
  Maianthemum: DOUBLE_DORMANT,
  Caulophyllum: DOUBLE_DORMANT,
  Erythronium: DOUBLE_DORMANT,
};

const BY_SLUG: Record<string, ReadinessRule> = {
  // NPN-ECPA (R): about 2 years to a finished 160 ml plug.
  'echinacea-pallida': {
    secondSeason: true,
    stratifyInLight: true,
    source: 'npn-echinacea-pallida',
    why: 'pale purple coneflower takes about two years to a finished plug',
  },
};

const apply = (r: Readiness, rule: ReadinessRule | undefined): Readiness => (rule ? { ...r, ...rule } : r);

/**
 * Readiness of a species: the base rule, then growth form, lifespan, genus and the species' own
 * entry, each narrower rule overriding the fields it sets (its source and reason replace the last).
 */
export function readinessOf(species: Species): Readiness {
  const genus = species.scientificName.split(' ')[0];
  let r = apply(BASE, BY_FORM[species.growthForm]);
  r = apply(r, BY_LIFESPAN[species.lifespan]);
  r = apply(r, BY_GENUS[genus]);
  return apply(r, BY_SLUG[species.slug]);
}
