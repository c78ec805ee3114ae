import type { GrowerMethod } from '../types/batch.js';
import { batchWordsFor } from '../vocabulary/locale/batch-words-in.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';

/** What growers need to buy or gather for their batches. */
export const SUPPLY_ITEMS = [
  'pots',
  'cell-trays',
  'containers',
  'potting-mix',
  'soil-block-mix',
  'labels',
  'vermiculite',
  'bags',
] as const;
export type SupplyItem = (typeof SUPPLY_ITEMS)[number];

/** One line of a supply list: a count, or a volume in litres and US dry quarts for mixes. */
export interface SupplyLine {
  item: SupplyItem;
  name: string;
  /** Pieces to get (pots, trays, labels, bags), or null for mixes measured by volume. */
  count: number | null;
  litres: number | null;
  /** US dry quarts, as potting-mix bags are sold (1 dry qt = 1.101221 L, the US definition). */
  quarts: number | null;
  note: string;
}

export interface SupplyList {
  lines: SupplyLine[];
  cautions: string[];
}

/** A batch as its supplies see it. */
export interface SupplyBatch {
  method: GrowerMethod;
  plants: number;
  units: number;
  /** The batch stratifies seed in the refrigerator (indoors, or a top-up before sowing outdoors). */
  fridge: boolean;
}

/**
 * Quantities are common practice among home growers (from memory), rounded up:
 * a 4 in (10 cm) pot holds about 0.5 L of mix; a winter-sowing container filled 3–4 in deep about
 * 1.5 L; a cell of a 72-cell tray about 0.05 L; a 2 in (5 cm) soil block is 8 in³ ≈ 0.13 L
 * (geometry). 10 % extra allows for spills and settling. Refrigerator stratifying takes about a
 * cup (0.25 L) of vermiculite and one sealable bag per batch (1 part seed to 2–3 parts medium,
 * IPN, CHECK-VALUES §4).
 */
export const SUPPLY_RULES = {
  potLitres: 0.5,
  containerLitres: 1.5,
  cellLitres: 0.05,
  blockLitres: 0.13,
  cellsPerTray: 72,
  blocksPerTray: 20,
  spare: 1.1,
  vermiculiteLitresPerBatch: 0.25,
} as const;

const LITRES_PER_DRY_QUART = 1.101221;

/** Each supply line's name and what it is for, in each language (sizes US first, metric in brackets). */
export const SUPPLY_WORDS: Record<WordLocale, Record<SupplyItem, { name: string; note: string }>> = {
  en: {
    pots: { name: '4 in (10 cm) pots', note: 'One per plant: for outdoor pots, and for potting up seedlings.' },
    'cell-trays': { name: '72-cell seed trays', note: 'For sowing indoors under lights.' },
    containers: { name: 'Covered containers (gallon jugs or deep trays with lids)', note: 'For winter sowing.' },
    'potting-mix': { name: 'Potting mix', note: 'Pots, cells and containers, with 10 % to spare.' },
    'soil-block-mix': { name: 'Soil-block mix', note: '2 in (5 cm) blocks, with 10 % to spare.' },
    labels: {
      name: 'Plant labels',
      note: 'One per pot, container and tray; write in pencil or paint pen, as marker fades in the sun.',
    },
    vermiculite: { name: 'Vermiculite', note: 'For stratifying seed in the refrigerator.' },
    bags: { name: 'Sealable bags', note: 'One per batch stratified in the refrigerator.' },
  },
  es: {
    pots: {
      name: 'Macetas de 4 in (10 cm)',
      note: 'Una por planta: para macetas al aire libre y para trasplantar las plántulas.',
    },
    'cell-trays': { name: 'Bandejas de 72 celdas', note: 'Para sembrar bajo techo con luces.' },
    containers: {
      name: 'Recipientes tapados (garrafas de un galón o bandejas hondas con tapa)',
      note: 'Para la siembra de invierno.',
    },
    'potting-mix': { name: 'Sustrato para macetas', note: 'Macetas, celdas y recipientes, con un 10 % de sobra.' },
    'soil-block-mix': { name: 'Mezcla para bloques de tierra', note: 'Bloques de 2 in (5 cm), con un 10 % de sobra.' },
    labels: {
      name: 'Etiquetas para plantas',
      note: 'Una por maceta, recipiente y bandeja; escribe a lápiz o con rotulador de pintura, porque el marcador se borra al sol.',
    },
    vermiculite: { name: 'Vermiculita', note: 'Para estratificar la semilla en el refrigerador.' },
    bags: { name: 'Bolsas con cierre', note: 'Una por cada tanda que se estratifica en el refrigerador.' },
  },
};

/**
 * The supply list for a set of batches (one grower's, or the whole group's): pots for outdoor pots
 * and for potting up winter-sown and indoor seedlings, cell trays, covered containers, potting mix,
 * soil-block mix, labels, vermiculite and bags, with the dust caution, all in `locale`.
 */
export function supplyList(batches: readonly SupplyBatch[], locale: WordLocale = 'en'): SupplyList {
  const sum = (f: (b: SupplyBatch) => number) => batches.reduce((a, b) => a + f(b), 0);
  const pots = sum((b) => (b.method === 'outdoor-pot-winter' ? b.units : b.method === 'soil-blocks' ? 0 : b.plants));
  const containers = sum((b) => (b.method === 'winter-sowing' ? b.units : 0));
  const cells = sum((b) => (b.method === 'indoor-lights' ? b.plants : 0));
  const blocks = sum((b) => (b.method === 'soil-blocks' ? b.units : 0));
  const cellTrays = Math.ceil(cells / SUPPLY_RULES.cellsPerTray);
  const blockTrays = Math.ceil(blocks / SUPPLY_RULES.blocksPerTray);
  const fridgeBatches = batches.filter((b) => b.fridge).length;
  const mix =
    (pots * SUPPLY_RULES.potLitres + containers * SUPPLY_RULES.containerLitres + cells * SUPPLY_RULES.cellLitres) *
    SUPPLY_RULES.spare;
  const blockMix = blocks * SUPPLY_RULES.blockLitres * SUPPLY_RULES.spare;

  const piece = (item: SupplyItem, name: string, count: number, note: string): SupplyLine => ({
    item,
    name,
    count,
    litres: null,
    quarts: null,
    note,
  });
  const volume = (item: SupplyItem, name: string, litres: number, note: string): SupplyLine => ({
    item,
    name,
    count: null,
    litres: Math.ceil(litres),
    quarts: Math.ceil(litres / LITRES_PER_DRY_QUART),
    note,
  });
  const w = SUPPLY_WORDS[locale];
  const lines: SupplyLine[] = [
    piece('pots', w.pots.name, pots, w.pots.note),
    piece('cell-trays', w['cell-trays'].name, cellTrays, w['cell-trays'].note),
    piece('containers', w.containers.name, containers, w.containers.note),
    volume('potting-mix', w['potting-mix'].name, mix, w['potting-mix'].note),
    volume('soil-block-mix', w['soil-block-mix'].name, blockMix, w['soil-block-mix'].note),
    piece('labels', w.labels.name, pots + containers + cellTrays + blockTrays, w.labels.note),
    volume(
      'vermiculite',
      w.vermiculite.name,
      fridgeBatches * SUPPLY_RULES.vermiculiteLitresPerBatch,
      w.vermiculite.note,
    ),
    piece('bags', w.bags.name, fridgeBatches, w.bags.note),
  ];
  return { lines: lines.filter((l) => (l.count ?? l.litres ?? 0) > 0), cautions: [...batchWordsFor(locale).cautions] };
}
