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

/**
 * The supply list for a set of batches (one grower's, or the whole group's): pots for outdoor pots
 * and for potting up winter-sown and indoor seedlings, cell trays, covered containers, potting mix,
 * soil-block mix, labels, vermiculite and bags, with the dust caution (in `locale`; the lines'
 * names are still English).
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
  const lines: SupplyLine[] = [
    piece('pots', '4 in (10 cm) pots', pots, 'One per plant: for outdoor pots, and for potting up seedlings.'),
    piece('cell-trays', '72-cell seed trays', cellTrays, 'For sowing indoors under lights.'),
    piece('containers', 'Covered containers (gallon jugs or deep trays with lids)', containers, 'For winter sowing.'),
    volume('potting-mix', 'Potting mix', mix, 'Pots, cells and containers, with 10 % to spare.'),
    volume('soil-block-mix', 'Soil-block mix', blockMix, '2 in (5 cm) blocks, with 10 % to spare.'),
    piece(
      'labels',
      'Plant labels',
      pots + containers + cellTrays + blockTrays,
      'One per pot, container and tray; write in pencil or paint pen, as marker fades in the sun.',
    ),
    volume(
      'vermiculite',
      'Vermiculite',
      fridgeBatches * SUPPLY_RULES.vermiculiteLitresPerBatch,
      'For stratifying seed in the refrigerator.',
    ),
    piece('bags', 'Sealable bags', fridgeBatches, 'One per batch stratified in the refrigerator.'),
  ];
  return { lines: lines.filter((l) => (l.count ?? l.litres ?? 0) > 0), cautions: [...batchWordsFor(locale).cautions] };
}
