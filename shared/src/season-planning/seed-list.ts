import { DEFAULT_LOSS_FACTOR, seedWeight, seedsToSow } from '../quantities/seed-count.js';
import type { Caution, Species, StateCode } from '../types/species.js';
import { roundTo } from '../units/conversions.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import { wordsFor } from '../vocabulary/locale/words-for.js';
import { stateName } from '../scoring/plain-words.js';

/**
 * Seeds in one packet when the organiser has not said: small retail packets of native perennials
 * commonly hold 50–250 seeds (common practice, from memory); 100 is a round middle.
 */
export const DEFAULT_SEEDS_PER_PACKET = 100;

/** More packets than this and buying by weight is the better deal (Homeground's rule of thumb). */
export const MAX_PACKETS_BEFORE_WEIGHT = 5;

/**
 * The usual cautions for collecting seed and handling mixes (common practice among native-plant
 * groups; defer to state and local rules, which can be stricter).
 */
export const SEED_LIST_CAUTIONS: readonly string[] = [
  "Collect wild seed only with the landowner's permission, and follow the rules of parks and reserves: many forbid it.",
  "Take only a small share of any one population's seed and leave the rest to reseed the stand and feed wildlife.",
  'Never collect seed or plants of a protected species from the wild; buy it from a nursery that propagates it.',
  'Dry potting mix is dusty: dampen it before you fill pots, and work outdoors or wear a dust mask.',
  "Check your state's noxious-weed and protected-plant lists and any local rules before you collect, sow or give plants away.",
];

/** The seed list's own sentences in one language: the cautions above and each row's collecting note. */
interface SeedListWords {
  cautions: readonly string[];
  neverWildInState(state: string): string;
  neverWild: string;
  seldomSold: string;
  contractOnly: string;
}

const SEED_LIST_WORDS: Record<WordLocale, SeedListWords> = {
  en: {
    cautions: SEED_LIST_CAUTIONS,
    neverWildInState: (state) =>
      `Never collect it from the wild: it is protected in ${state}. Buy seed from a nursery that propagates it.`,
    neverWild:
      'Never collect it from the wild: it is protected in the wild. Buy seed from a nursery that propagates it.',
    seldomSold:
      "Seed is seldom sold (USDA PLANTS lists no routine supply): collect it locally, with the landowner's permission.",
    contractOnly: 'Seed is mostly grown to order: collect it locally with permission, or order early.',
  },
  es: {
    cautions: [
      'Recolecta semilla silvestre solo con permiso de quien es dueño del terreno, y respeta las normas de parques y reservas: muchas lo prohíben.',
      'Toma solo una pequeña parte de la semilla de cada población y deja el resto para que se resiembre y alimente a la fauna.',
      'Nunca recolectes semillas ni plantas de una especie protegida en el campo; cómprala en un vivero que la propague.',
      'La mezcla para macetas seca suelta polvo: humedécela antes de llenar las macetas, y trabaja al aire libre o ponte una mascarilla contra el polvo.',
      'Revisa las listas de malezas nocivas y de plantas protegidas de tu estado y las normas locales antes de recolectar, sembrar o regalar plantas.',
    ],
    neverWildInState: (state) =>
      `Nunca la recolectes en el campo: está protegida en ${state}. Compra la semilla en un vivero que la propague.`,
    neverWild:
      'Nunca la recolectes en el campo: está protegida en la naturaleza. Compra la semilla en un vivero que la propague.',
    seldomSold:
      'Casi nunca se vende semilla (USDA PLANTS no registra un suministro habitual): recoléctala cerca, con permiso de quien es dueño del terreno.',
    contractOnly:
      'La semilla se produce sobre todo por encargo: recoléctala cerca con permiso, o encárgala con tiempo.',
  },
};

export interface SeedListTarget {
  species: Species;
  targetPlants: number;
  /** The organiser's germination rate for this seed lot, percent; the record's when left out. */
  germinationRatePct?: number;
}

export interface SeedListOptions {
  /** The group's state: protection there forbids wild collection. */
  state: StateCode;
  /** Seedlings lost between germination and planting out, 0–<1; default DEFAULT_LOSS_FACTOR. */
  lossFactor?: number;
  seedsPerPacket?: number;
  /** The language of the cautions and collecting notes (English when absent). */
  locale?: WordLocale;
}

export interface SeedListCaution {
  kind: Caution['kind'];
  title: string;
  text: string;
}

export interface SeedListRow {
  slug: string;
  commonName: string;
  scientificName: string;
  targetPlants: number;
  germinationRatePct: number;
  /** Whether the rate is the species record's or the organiser's own. */
  germinationFrom: 'record' | 'yours';
  lossFactor: number;
  seedsToSow: number;
  seedsPerPound: number | null;
  /** Weight of the seeds to sow; null when the record gives no seeds per pound. */
  grams: number | null;
  ounces: number | null;
  packets: number;
  buyBy: 'packets' | 'weight';
  /** Worth collecting locally instead of buying (with permission). */
  collectLocally: boolean;
  /** Why to collect, or why never to collect from the wild, in words. */
  collectNotes: string[];
  /** Protected: wild seed is off limits whatever the supply. */
  neverCollectWild: boolean;
  cautions: SeedListCaution[];
}

export interface SeedList {
  lossFactor: number;
  seedsPerPacket: number;
  rows: SeedListRow[];
  totals: { targetPlants: number; seedsToSow: number; grams: number; ounces: number; packets: number };
  cautions: readonly string[];
}

/**
 * The seed list for a season's targets: seeds to sow per species (target ÷ (germination × (1 −
 * loss)), `seedsToSow`), their weight from seeds per pound (`seedWeight`), packets at the stated
 * seeds per packet, and which to collect locally instead, with the usual cautions.
 */
export function seedList(targets: readonly SeedListTarget[], options: SeedListOptions): SeedList {
  const lossFactor = options.lossFactor ?? DEFAULT_LOSS_FACTOR;
  const seedsPerPacket = options.seedsPerPacket ?? DEFAULT_SEEDS_PER_PACKET;
  const locale = options.locale ?? 'en';
  const rows = targets.map((t) => rowOf(t, lossFactor, seedsPerPacket, options.state, locale));
  const sum = (f: (r: SeedListRow) => number) => rows.reduce((a, r) => a + f(r), 0);
  return {
    lossFactor,
    seedsPerPacket,
    rows,
    totals: {
      targetPlants: sum((r) => r.targetPlants),
      seedsToSow: sum((r) => r.seedsToSow),
      grams: roundTo(
        sum((r) => r.grams ?? 0),
        2,
      ),
      ounces: roundTo(
        sum((r) => r.ounces ?? 0),
        3,
      ),
      packets: sum((r) => r.packets),
    },
    cautions: SEED_LIST_WORDS[locale].cautions,
  };
}

function rowOf(
  t: SeedListTarget,
  lossFactor: number,
  seedsPerPacket: number,
  state: StateCode,
  locale: WordLocale,
): SeedListRow {
  const s = t.species;
  const germinationRatePct = t.germinationRatePct ?? s.germination.germinationRatePct;
  const seeds = seedsToSow(t.targetPlants, germinationRatePct, lossFactor);
  const perPound = s.germination.seedsPerPound;
  const weight = perPound ? seedWeight(seeds, perPound) : null;
  const packets = Math.ceil(seeds / seedsPerPacket);
  const neverCollectWild = s.protectedIn.includes(state) || s.cautions.some((c) => c.kind === 'protected');
  const { collectLocally, collectNotes } = collectAdvice(s, state, neverCollectWild, SEED_LIST_WORDS[locale]);
  return {
    slug: s.slug,
    commonName: s.commonNames[0],
    scientificName: s.scientificName,
    targetPlants: t.targetPlants,
    germinationRatePct,
    germinationFrom: t.germinationRatePct === undefined ? 'record' : 'yours',
    lossFactor,
    seedsToSow: seeds,
    seedsPerPound: perPound,
    // Grams to 0.01 g and ounces to 0.001 oz: a kitchen scale reads 0.01 g at best.
    grams: weight && roundTo(weight.grams, 2),
    ounces: weight && roundTo(weight.ounces, 3),
    packets,
    buyBy: weight && packets > MAX_PACKETS_BEFORE_WEIGHT ? 'weight' : 'packets',
    collectLocally,
    collectNotes,
    neverCollectWild,
    cautions: s.cautions.map((c) => ({ kind: c.kind, title: wordsFor(locale).caution[c.kind].title, text: c.text })),
  };
}

function collectAdvice(
  s: Species,
  state: StateCode,
  neverCollectWild: boolean,
  w: SeedListWords,
): { collectLocally: boolean; collectNotes: string[] } {
  if (neverCollectWild) {
    const note = s.protectedIn.includes(state) ? w.neverWildInState(stateName(state)) : w.neverWild;
    return { collectLocally: false, collectNotes: [note] };
  }
  switch (s.commercialAvailability) {
    case 'field-collection-only':
    case 'none-known':
      return { collectLocally: true, collectNotes: [w.seldomSold] };
    case 'contract-only':
      return { collectLocally: true, collectNotes: [w.contractOnly] };
    default:
      return { collectLocally: false, collectNotes: [] };
  }
}
