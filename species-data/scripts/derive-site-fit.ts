/**
 * Curator tool (never run at start): writes the graded site-fit facts of each species record.
 *   npx tsx species-data/scripts/derive-site-fit.ts
 *
 * - `commercialAvailability`: USDA PLANTS characteristics `commercial_availability` (read in place from
 *   ../shared/reference); null where USDA gives no value or has no characteristics row.
 * - `sunOptimum`, `moistureOptimum`: where the species thrives, a subset of what it tolerates. A first
 *   pass from the tolerance lists and the habitats it grows in (rules below), then the curator's
 *   corrections in OPTIMUM_OVERRIDES (from memory).
 * - `wetlandIndicator`: the National Wetland Plant List class as the curator recalls it for the Midwest
 *   and Northcentral–Northeast regions (from memory; null where not recalled with confidence).
 * - `needsAcidSoil`, `selfSows`, `protectedIn`: curator lists below (from memory).
 */
import type {
  Habitat,
  Moisture,
  Species,
  StateCode,
  Sun,
  WetlandIndicator,
  CommercialAvailability,
} from '@homeground/shared';
import { loadCatalogue } from '../src/catalogue.js';
import { loadUsdaCharacteristics } from '../src/reference/usda-plants.js';
import { inline, readRecordText, setKey, setSource, SPECIES_DIR, writeRecordText } from './record-text.js';
import path from 'node:path';

const OPEN: Habitat[] = [
  'prairie',
  'sand-prairie',
  'wet-prairie',
  'savanna',
  'glade',
  'dune',
  'old-field',
  'shortgrass-prairie',
  'mixed-grass-prairie',
  'marsh',
  'pine-barrens',
  'coastal-plain',
  'wetland',
  'fen-bog',
];
const SHADED: Habitat[] = ['forest', 'floodplain-forest'];
const DRY: Habitat[] = [
  'sand-prairie',
  'glade',
  'rock-outcrop',
  'shortgrass-prairie',
  'mixed-grass-prairie',
  'dune',
  'pine-barrens',
];
const WET: Habitat[] = ['marsh', 'wetland', 'fen-bog', 'wet-prairie', 'streambank', 'floodplain-forest'];

const has = (s: Pick<Species, 'habitats'>, list: Habitat[]) => s.habitats.filter((h) => list.includes(h)).length;

export function sunFirstPass(s: Pick<Species, 'sun' | 'habitats'>): Sun[] {
  const sun = new Set(s.sun);
  if (sun.size === 1) return [...sun];
  const open = has(s, OPEN) > 0;
  const shaded = has(s, SHADED) > 0;
  if (sun.has('full') && sun.has('part') && !sun.has('shade')) return shaded && !open ? ['part'] : ['full'];
  if (!sun.has('full'))
    return shaded && !open && s.habitats.every((h) => [...SHADED, 'streambank', 'rock-outcrop'].includes(h))
      ? ['part', 'shade']
      : ['part'];
  if (sun.has('full') && !sun.has('part')) return ['full'];
  // tolerates all three
  if (open && !shaded) return ['full'];
  if (shaded && !open) return ['part', 'shade'];
  return ['part'];
}

export function moistureFirstPass(s: Pick<Species, 'moisture' | 'habitats'>): Moisture[] {
  const m = new Set(s.moisture);
  if (m.size === 1) return [...m];
  const dry = has(s, DRY);
  const wet = has(s, WET);
  if (m.has('dry') && m.has('medium') && !m.has('wet')) return dry > 0 && dry >= wet ? ['dry'] : ['medium'];
  if (m.has('medium') && m.has('wet') && !m.has('dry')) {
    const share = wet / s.habitats.length;
    return share >= 0.75 ? ['wet'] : share >= 0.4 ? ['medium', 'wet'] : ['medium'];
  }
  if (m.has('dry') && m.has('wet') && !m.has('medium')) return ['dry', 'wet'];
  return ['medium'];
}

/** Curator corrections to the first pass (from memory). */
const OPTIMUM_OVERRIDES: Record<string, { sun?: Sun[]; moisture?: Moisture[] }> = {
  'asclepias-incarnata': { moisture: ['wet', 'medium'] },
  'eutrochium-purpureum': { sun: ['part'], moisture: ['medium', 'wet'] },
  'eutrochium-fistulosum': { moisture: ['wet', 'medium'] },
  'eutrochium-maculatum': { moisture: ['wet'] },
  'eupatorium-perfoliatum': { moisture: ['wet'] },
  'verbena-hastata': { moisture: ['wet'] },
  'lobelia-cardinalis': { moisture: ['wet'] },
  'lobelia-siphilitica': { moisture: ['wet', 'medium'] },
  'iris-virginica': { moisture: ['wet'] },
  'schizachyrium-scoparium': { moisture: ['dry'] },
  'sporobolus-heterolepis': { sun: ['full'], moisture: ['dry', 'medium'] },
  'asclepias-tuberosa': { sun: ['full'], moisture: ['dry'] },
  'monarda-fistulosa': { sun: ['full'], moisture: ['dry', 'medium'] },
  'rudbeckia-hirta': { moisture: ['dry', 'medium'] },
  'echinacea-purpurea': { sun: ['full'], moisture: ['medium'] },
  'carex-pensylvanica': { sun: ['part'], moisture: ['dry'] },
  'geranium-maculatum': { sun: ['part'], moisture: ['medium'] },
  'aquilegia-canadensis': { sun: ['part'], moisture: ['dry', 'medium'] },
  'physocarpus-opulifolius': { sun: ['full', 'part'], moisture: ['medium'] },
  'cephalanthus-occidentalis': { moisture: ['wet'] },
  'andropogon-gerardii': { moisture: ['medium'] },
  'panicum-virgatum': { moisture: ['medium'] },
  'sorghastrum-nutans': { moisture: ['medium'] },
  'silphium-perfoliatum': { moisture: ['medium', 'wet'] },
  'rudbeckia-laciniata': { moisture: ['medium', 'wet'] },
  'athyrium-filix-femina': { moisture: ['medium', 'wet'] },
};

/** National Wetland Plant List classes as recalled (Midwest / Northcentral–Northeast); others null. */
const WETLAND_INDICATOR: Record<string, WetlandIndicator> = {
  'asclepias-incarnata': 'OBL',
  'asclepias-perennis': 'OBL',
  'asclepias-lanceolata': 'OBL',
  'asclepias-rubra': 'OBL',
  'caltha-palustris': 'OBL',
  'iris-versicolor': 'OBL',
  'iris-virginica': 'OBL',
  'iris-fulva': 'OBL',
  'iris-brevicaulis': 'OBL',
  'pontederia-cordata': 'OBL',
  'sagittaria-latifolia': 'OBL',
  'schoenoplectus-tabernaemontani': 'OBL',
  'scirpus-atrovirens': 'OBL',
  'scirpus-cyperinus': 'OBL',
  'bolboschoenus-fluviatilis': 'OBL',
  'eleocharis-palustris': 'OBL',
  'carex-comosa': 'OBL',
  'carex-crinita': 'OBL',
  'carex-hystericina': 'OBL',
  'carex-lupulina': 'OBL',
  'carex-lurida': 'OBL',
  'carex-stricta': 'OBL',
  'carex-emoryi': 'OBL',
  'carex-pellita': 'OBL',
  'carex-vulpinoidea': 'FACW',
  'carex-scoparia': 'FACW',
  'carex-grayi': 'FACW',
  'carex-squarrosa': 'FACW',
  'carex-tribuloides': 'FACW',
  'carex-intumescens': 'FACW',
  'carex-bromoides': 'FACW',
  'carex-annectens': 'FACW',
  'carex-blanda': 'FAC',
  'cephalanthus-occidentalis': 'OBL',
  'chelone-glabra': 'OBL',
  'chelone-obliqua': 'OBL',
  'hibiscus-laevis': 'OBL',
  'hibiscus-moscheutos': 'OBL',
  'hibiscus-coccineus': 'OBL',
  'leersia-oryzoides': 'OBL',
  'mimulus-ringens': 'OBL',
  'mimulus-alatus': 'OBL',
  'lobelia-cardinalis': 'FACW',
  'lobelia-siphilitica': 'FACW',
  'eupatorium-perfoliatum': 'FACW',
  'eutrochium-maculatum': 'OBL',
  'eutrochium-fistulosum': 'FACW',
  'eutrochium-purpureum': 'FAC',
  'verbena-hastata': 'FACW',
  'helenium-autumnale': 'FACW',
  'glyceria-striata': 'OBL',
  'juncus-effusus': 'OBL',
  'juncus-torreyi': 'FACW',
  'juncus-canadensis': 'OBL',
  'juncus-tenuis': 'FAC',
  'calamagrostis-canadensis': 'OBL',
  'spartina-pectinata': 'FACW',
  'onoclea-sensibilis': 'FACW',
  'osmunda-regalis': 'OBL',
  'osmunda-cinnamomea': 'FACW',
  'thelypteris-palustris': 'FACW',
  'athyrium-filix-femina': 'FAC',
  'symphyotrichum-puniceum': 'OBL',
  'symphyotrichum-novae-angliae': 'FACW',
  'symphyotrichum-novi-belgii': 'FACW',
  'boltonia-asteroides': 'FACW',
  'helianthus-giganteus': 'FACW',
  'helianthus-grosseserratus': 'FACW',
  'helianthus-angustifolius': 'FACW',
  'rudbeckia-laciniata': 'FACW',
  'rudbeckia-hirta': 'FACU',
  'liatris-pycnostachya': 'FAC',
  'physostegia-virginiana': 'FACW',
  'pycnanthemum-virginianum': 'FACW',
  'pycnanthemum-tenuifolium': 'FAC',
  'gentiana-andrewsii': 'FACW',
  'gentianopsis-crinita': 'FACW',
  'spiraea-alba': 'FACW',
  'spiraea-tomentosa': 'FACW',
  'rosa-palustris': 'OBL',
  'cornus-amomum': 'FACW',
  'cornus-sericea': 'FACW',
  'cornus-racemosa': 'FAC',
  'salix-discolor': 'FACW',
  'salix-humilis': 'FACU',
  'ilex-verticillata': 'FACW',
  'vaccinium-corymbosum': 'FACW',
  'itea-virginica': 'OBL',
  'acer-rubrum': 'FAC',
  'betula-nigra': 'FACW',
  'quercus-bicolor': 'FACW',
  'quercus-macrocarpa': 'FAC',
  'quercus-alba': 'FACU',
  'quercus-rubra': 'FACU',
  'lindera-benzoin': 'FAC',
  'asimina-triloba': 'FAC',
  'aronia-melanocarpa': 'FAC',
  'amorpha-fruticosa': 'FACW',
  'impatiens-capensis': 'FACW',
  'impatiens-pallida': 'FACW',
  'scutellaria-lateriflora': 'FACW',
  'stachys-tenuifolia': 'FACW',
  'thalictrum-dasycarpum': 'FACW',
  'thalictrum-pubescens': 'FACW',
  'vernonia-fasciculata': 'FACW',
  'vernonia-gigantea': 'FAC',
  'vernonia-noveboracensis': 'FACW',
  'lobelia-spicata': 'FAC',
  'doellingeria-umbellata': 'FACW',
  'solidago-patula': 'OBL',
  'solidago-uliginosa': 'OBL',
  'solidago-rugosa': 'FAC',
  'solidago-sempervirens': 'FACW',
  'oligoneuron-riddellii': 'OBL',
  'oligoneuron-ohioense': 'OBL',
  'packera-aurea': 'FACW',
  'zizia-aurea': 'FAC',
  'apios-americana': 'FACW',
  'anemone-canadensis': 'FACW',
  'andropogon-gerardii': 'FAC',
  'panicum-virgatum': 'FAC',
  'sorghastrum-nutans': 'FACU',
  'schizachyrium-scoparium': 'FACU',
  'elymus-riparius': 'FACW',
  'cinna-arundinacea': 'FACW',
  'tripsacum-dactyloides': 'FACW',
  'dichanthelium-clandestinum': 'FAC',
  'mertensia-virginica': 'FACW',
  'phlox-maculata': 'FACW',
  'phlox-glaberrima': 'FACW',
  'phlox-paniculata': 'FACU',
  'lobelia-inflata': 'FACU',
  'monarda-fistulosa': 'FACU',
  'monarda-didyma': 'FAC',
  'penstemon-digitalis': 'FAC',
  'veronicastrum-virginicum': 'FAC',
  'helenium-flexuosum': 'FAC',
  'coreopsis-rosea': 'OBL',
  'symphyotrichum-prenanthoides': 'FAC',
  'symphyotrichum-lateriflorum': 'FAC',
  'symphyotrichum-ericoides': 'FACU',
  'verbena-urticifolia': 'FAC',
  'viola-sororia': 'FAC',
  'dryopteris-carthusiana': 'FACW',
  'thelypteris-noveboracensis': 'FAC',
  'polystichum-acrostichoides': 'FACU',
  'geranium-maculatum': 'FACU',
  'liatris-spicata': 'FAC',
};

/** Needs acid soil to thrive (from memory). */
const NEEDS_ACID = new Set([
  'vaccinium-angustifolium',
  'vaccinium-corymbosum',
  'clethra-alnifolia',
  'lupinus-perennis',
  'baptisia-tinctoria',
  'tephrosia-virginiana',
  'dennstaedtia-punctilobula',
  'osmunda-cinnamomea',
]);

/** Heavy self-sowers: seed themselves around a bed (from memory). */
const SELF_SOWS = new Set([
  'oenothera-biennis',
  'rudbeckia-hirta',
  'rudbeckia-triloba',
  'coreopsis-tinctoria',
  'helianthus-annuus',
  'chamaecrista-fasciculata',
  'gaillardia-pulchella',
  'lobelia-inflata',
  'lobelia-siphilitica',
  'erigeron-philadelphicus',
  'symphyotrichum-pilosum',
  'symphyotrichum-novae-angliae',
  'eupatorium-altissimum',
  'verbena-hastata',
  'verbena-urticifolia',
  'impatiens-capensis',
  'impatiens-pallida',
  'aquilegia-canadensis',
  'heliopsis-helianthoides',
  'penstemon-digitalis',
  'agastache-foeniculum',
  'campanulastrum-americanum',
  'coreopsis-lanceolata',
  'tradescantia-ohiensis',
  'sisyrinchium-angustifolium',
  'mertensia-virginica',
  'polemonium-reptans',
  'ruellia-humilis',
  'clematis-virginiana',
  'elymus-canadensis',
  'monarda-punctata',
  'hypericum-punctatum',
  'vernonia-gigantea',
]);

/** States where the species is listed (endangered, threatened or protected from collecting), as recalled. */
const PROTECTED_IN: Record<string, StateCode[]> = {
  'asclepias-meadii': ['IA', 'IL', 'IN', 'KS', 'MO', 'WI'],
  'hydrastis-canadensis': ['CT', 'GA', 'MA', 'MD', 'MI', 'MN', 'NJ', 'NY', 'PA', 'VT'],
  'lupinus-perennis': ['ME', 'VT'],
  'silene-regia': ['AL', 'GA', 'IL', 'OH'],
  'liatris-scariosa': ['CT', 'MA', 'ME', 'NY'],
  'trillium-grandiflorum': ['NY'],
  'trillium-erectum': ['IL', 'NY'],
  'trillium-flexipes': ['MD', 'NY', 'PA'],
  'trillium-sessile': ['NY'],
  'trillium-recurvatum': ['MI'],
};

const AVAILABILITY: Record<string, CommercialAvailability> = {
  'Routinely Available': 'routine',
  'Contracting Only': 'contract-only',
  'Field Collections Only': 'field-collection-only',
  'No Known Source': 'none-known',
};

function main(): void {
  const { species } = loadCatalogue();
  const characteristics = loadUsdaCharacteristics();
  const slugs = new Set(species.map((s) => s.slug));
  for (const table of [OPTIMUM_OVERRIDES, WETLAND_INDICATOR, PROTECTED_IN]) {
    for (const slug of Object.keys(table)) if (!slugs.has(slug)) throw new Error(`${slug} is not in the catalogue`);
  }
  for (const slug of [...NEEDS_ACID, ...SELF_SOWS])
    if (!slugs.has(slug)) throw new Error(`${slug} is not in the catalogue`);
  const counts = { indicator: 0, availability: 0, acid: 0, selfSows: 0, protected: 0 };
  for (const s of species) {
    const o = OPTIMUM_OVERRIDES[s.slug] ?? {};
    const sunOptimum = o.sun ?? sunFirstPass(s);
    const moistureOptimum = o.moisture ?? moistureFirstPass(s);
    for (const v of sunOptimum)
      if (!s.sun.includes(v)) throw new Error(`${s.slug}: sun optimum ${v} is not among what it tolerates`);
    for (const v of moistureOptimum)
      if (!s.moisture.includes(v)) throw new Error(`${s.slug}: moisture optimum ${v} is not among what it tolerates`);
    const usda = characteristics.get(s.usdaSymbol)?.commercial_availability?.trim() ?? '';
    const availability = AVAILABILITY[usda] ?? null;
    if (usda && !availability) throw new Error(`${s.slug}: unknown USDA commercial_availability "${usda}"`);
    const indicator = WETLAND_INDICATOR[s.slug] ?? null;
    const protectedIn = (PROTECTED_IN[s.slug] ?? []).filter((st) => s.nativeStates.includes(st));
    counts.indicator += indicator ? 1 : 0;
    counts.availability += availability ? 1 : 0;
    counts.acid += NEEDS_ACID.has(s.slug) ? 1 : 0;
    counts.selfSows += SELF_SOWS.has(s.slug) ? 1 : 0;
    counts.protected += protectedIn.length ? 1 : 0;

    const file = path.join(SPECIES_DIR, `${s.slug}.json`);
    let text = readRecordText(file);
    text = setKey(text, 'sunOptimum', inline(sunOptimum), 'moisture');
    text = setKey(text, 'moistureOptimum', inline(moistureOptimum), 'sunOptimum');
    text = setKey(text, 'wetlandIndicator', inline(indicator), 'moistureOptimum');
    text = setKey(text, 'needsAcidSoil', inline(NEEDS_ACID.has(s.slug)), 'wetlandIndicator');
    text = setKey(text, 'selfSows', inline(SELF_SOWS.has(s.slug)), 'spreadHabit');
    text = setKey(text, 'commercialAvailability', inline(availability), 'selfSows');
    text = setKey(text, 'protectedIn', inline(protectedIn), 'commercialAvailability');
    text = setSource(text, 'sunOptimum', 'from-memory', 'moisture');
    text = setSource(text, 'moistureOptimum', 'from-memory', 'sunOptimum');
    text = setSource(text, 'wetlandIndicator', 'from-memory', 'moistureOptimum');
    text = setSource(text, 'commercialAvailability', 'usda-plants-characteristics', 'spreadHabit');
    text = setSource(text, 'protectedIn', 'from-memory', 'commercialAvailability');
    writeRecordText(file, text);
  }
  console.log(
    `${species.length} records: wetland indicator ${counts.indicator}, USDA availability ${counts.availability}, acid soil ${counts.acid}, self-sowers ${counts.selfSows}, protected somewhere ${counts.protected}`,
  );
}

main();
