import { SOURCED_FIELD_WORDS, type Species } from '@homeground/shared';

/**
 * Short citations for the catalogue's source keys; the full references are in
 * species-data/sources.json. A key missing here still shows, as the key itself, so a newly added
 * source is never hidden.
 */
const SHORT_CITATIONS: Record<string, string> = {
  'from-memory': 'a curator’s recall, not yet checked against a published source',
  'common-practice': 'common growers’ practice',
  'usda-plants': 'USDA PLANTS Database',
  'usda-plants-characteristics': 'USDA PLANTS characteristics',
  'tallamy-shropshire-2009': 'Tallamy & Shropshire 2009',
  'sylvanseeds-2021': 'SylvanSeeds (Fernández-Pascual 2021)',
  'epa-ecoregions-l3': 'US EPA Level III ecoregions (2013)',
  'cec-ecoregions-1997': 'CEC ecological regions (1997)',
  'us-atlas-counties': 'US Census boundaries (us-atlas)',
  'apg-iv-2016': 'APG IV 2016',
  'ppg-i-2016': 'PPG I 2016',
  'xerces-milkweeds-2014': 'Borders & Lee-Mäder 2014 (Xerces Society)',
  'luna-dumroese-2013': 'Luna & Dumroese 2013',
  'kaye-2018': 'Kaye, Sandlin & Bahm 2018',
  'npn-asclepias-incarnata': 'Native Plant Network protocol (Schultz)',
  'npn-echinacea-pallida': 'Native Plant Network protocol (Luna)',
  'npn-liatris-punctata': 'Native Plant Network protocol (Wynia)',
  'romero-2005': 'Romero, Delate & Hannapel 2005',
  'boyle-hladun-2005': 'Boyle & Hladun 2005',
  'jeh-1996-lupinus': 'Journal of Environmental Horticulture 1996',
  'hortsci-2004-penstemon': 'HortScience 2004',
  'kettenring-galatowitsch-2007': 'Kettenring & Galatowitsch 2007',
  'iowa-prairie-network-stratification': 'Iowa Prairie Network (Buenger)',
  'uf-milkweed-toxicity-2019': 'UF/IFAS Extension 2019',
  'penn-vet-poisonous-plants': 'Penn Vet, Poisonous Plants of Pennsylvania',
  'auburn-poisonous-plants': 'Alabama Extension, Poisonous Plants of the Southeast',
  'nrcs-e327136z2': 'USDA NRCS enhancement E327136Z2 (2017)',
  'nrcs-cp42-indiana-2012': 'USDA NRCS Indiana CP42 job sheet (2012)',
  'carrero-2022-trees': 'Carrero et al. 2022',
};

export function shortCitation(key: string): string {
  return SHORT_CITATIONS[key] ?? key;
}

type SourcedField = keyof Species['sources'];

/** The facts each section of the species page shows, so its source line names exactly those. */
export const SECTION_FIELDS = {
  names: ['usdaSymbol', 'family'],
  bloom: ['bloomMonths', 'flowerColours'],
  conditions: ['sun', 'moisture', 'soilTextures', 'habitats'],
  size: ['heightCm', 'growthForm', 'lifespan', 'spreadHabit', 'deerResistance'],
  wildlife: ['wildlife.lepidopteraGenusCount', 'wildlife.monarchHost'],
  germination: ['germination.treatments', 'germination.seedsPerPound', 'germination.germinationRatePct'],
  range: ['nativeStates'],
} as const satisfies Record<string, readonly SourcedField[]>;

export interface SourceLine {
  citation: string;
  key: string;
  /** The facts in the section that come from this source. */
  fields: string[];
}

/** A section's sources, each with the facts it backs; facts with no recorded source are listed too. */
export function sectionSources(
  sources: Species['sources'],
  fields: readonly SourcedField[],
  /** The facts' names in the page's language (English by default). */
  fieldWords: Record<SourcedField, string> = SOURCED_FIELD_WORDS,
  unrecorded = 'no source recorded',
): SourceLine[] {
  const byKey = new Map<string, SourceLine>();
  for (const field of fields) {
    const key = sources[field] ?? 'unrecorded';
    const line = byKey.get(key) ?? {
      key,
      citation: key === 'unrecorded' ? unrecorded : shortCitation(key),
      fields: [],
    };
    line.fields.push(fieldWords[field]);
    byKey.set(key, line);
  }
  return [...byKey.values()];
}
