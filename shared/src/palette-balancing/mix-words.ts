import type { BloomPeriod } from '../types/recommendation.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import { wordsFor } from '../vocabulary/locale/words-for.js';
import type { HeightTier } from './palette-item.js';

/** What a rule counts: the kinds of species its sentences name. */
export type MixKind = BloomPeriod | 'flowering' | 'milkweed' | 'grass';

/**
 * Every sentence of "how this mix is balanced" (the rules' details) and the mix's notices, in one
 * language. Each entry is a whole sentence with its values interpolated and its plural chosen by
 * count, so no language has to follow English word order. Species names arrive already joined.
 */
export interface MixWords {
  /** "The mix has none." / "The mix has 2: A and B." */
  mixHas(count: number, names: string): string;
  /** "The mix has 3: A, B and C, but Sep has 2 in flower." (`thin` from `monthHas`, joined). */
  mixHasButThin(count: number, names: string, thin: string): string;
  /** "Sep has 2", an item of the list above. */
  monthHas(month: number, count: number): string;
  /** "The mix has 2: A and B, which leaves too few places for flowers." */
  mixHasTooMany(count: number, names: string): string;
  /** "Only 1 late bloomer native to your region suits dry shade." */
  onlyAvailable(kind: MixKind, count: number, ground: string): string;
  /** The same for the milkweeds of a state: "No milkweed native to your region suits dry shade in Ohio." */
  noMilkweedInState(ground: string, state: string): string;
  /** The same with the period's way out: "…; a species from another part of the season may take its place." */
  onlyAvailableInPeriod(kind: BloomPeriod, count: number, ground: string): string;
  /** "2 more late bloomers suit your ground but lost out to other needs in a mix of 8 species; keep one in, or choose a larger mix." */
  lostOut(kind: MixKind, count: number, size: number, kept: number): string;
  /** The height rule's version of the above, naming the rows ("front (under 2 ft / 60 cm)"). */
  rowsLostOut(rows: string, size: number, kept: number): string;
  keepOrAddBloomer: string;
  /** "The mix has 7 flowering species." */
  floweringCount(count: number): string;
  tooSmallForFlowers(size: number, target: number): string;
  grassesTakeShare(size: number, places: number): string;
  noMonarchGoal: string;
  /** "The mix has A and B, food for monarch caterpillars." */
  milkweedsInMix(names: string): string;
  /** Protected milkweeds that suit the ground, named (at most three). */
  protectedMilkweeds(count: number, names: string): string;
  /** " The closest is X: <reason>" follows the no-milkweed sentence. */
  closestMilkweed(name: string, reason: string): string;
  smallMixNoGrass: string;
  /** The headline of the grass rule for a mix under 4 species. */
  grassRuleSmall: string;
  tier: Record<HeightTier, string>;
  /** The row's bare name, as a list of rows in `rowsLostOut` says it. */
  tierShort: Record<HeightTier, string>;
  /** "front (under 2 ft / 60 cm): A and B", one item of the height rule's list. */
  tierHas(tier: string, names: string): string;
  /** "No plant for the back (over 4 ft / 120 cm) row suits your ground or your height limit." */
  noPlantForRows(rows: string, heightLimit: boolean): string;
  // The mix's size and notices.
  askedFor(size: number): string;
  keptSoHolds(size: number): string;
  onlySuit(available: number, wanted: number): string;
  keptAndExcluded(name: string): string;
  notInCatalogue(slug: string): string;
  notNativeHere(name: string): string;
  keptPoorFit(name: string, reason: string): string;
  keptProtected(name: string): string;
  /** Protected species that suit the ground but are left out: `names` lists at most three, `more` the rest. */
  withheldProtected(count: number, names: string, more: number): string;
}

const plural = (n: number, one: string, other: string) => (n === 1 ? one : other);

const EN_KIND: Record<MixKind, [string, string]> = {
  early: ['early bloomer', 'early bloomers'],
  mid: ['midsummer bloomer', 'midsummer bloomers'],
  late: ['late bloomer', 'late bloomers'],
  flowering: ['flowering species', 'flowering species'],
  milkweed: ['native milkweed', 'native milkweeds'],
  grass: ['grass or sedge', 'grasses and sedges'],
};
const EN_MORE: Record<MixKind, [string, string]> = { ...EN_KIND, grass: ['grass or sedge', 'grasses or sedges'] };
const enLocks = (kept: number) => (kept > 0 ? ` (${kept} of them kept by you)` : '');
const enHas = (count: number, names: string) => (count === 0 ? 'The mix has none' : `The mix has ${count}: ${names}`);

const EN: MixWords = {
  mixHas: (count, names) => `${enHas(count, names)}.`,
  mixHasButThin: (count, names, thin) => `${enHas(count, names)}, but ${thin} in flower.`,
  monthHas: (month, count) => `${wordsFor('en').month[month as 1].short} has ${count}`,
  mixHasTooMany: (count, names) => `${enHas(count, names)}, which leaves too few places for flowers.`,
  onlyAvailable: (kind, count, ground) => {
    const [one, many] = kind === 'milkweed' ? ['milkweed', 'milkweeds'] : EN_KIND[kind];
    if (count === 0) return `No ${one} native to your region suits ${ground}.`;
    return `Only ${count} ${plural(count, one, many)} native to your region ${plural(count, 'suits', 'suit')} ${ground}.`;
  },
  noMilkweedInState: (ground, state) => `No milkweed native to your region suits ${ground} in ${state}.`,
  onlyAvailableInPeriod: (kind, count, ground) => {
    const [one, many] = EN_KIND[kind];
    const start =
      count === 0
        ? `No ${one} native to your region suits ${ground}`
        : `Only ${count} ${plural(count, one, many)} native to your region ${plural(count, 'suits', 'suit')} ${ground}`;
    return `${start}; a species from another part of the season may take its place.`;
  },
  lostOut: (kind, count, size, kept) => {
    const [one, many] = EN_MORE[kind];
    const who =
      kind === 'milkweed'
        ? `${count} ${plural(count, one, many)} ${plural(count, 'suits', 'suit')}`
        : `${count} more ${plural(count, one, many)} ${plural(count, 'suits', 'suit')}`;
    return `${who} your ground but lost out to other needs in a mix of ${size} species${enLocks(kept)}; keep one in, or choose a larger mix.`;
  },
  rowsLostOut: (rows, size, kept) =>
    `Plants for the ${rows} row lost out to other needs in a mix of ${size} species${enLocks(kept)}; keep one in, or choose a larger mix.`,
  keepOrAddBloomer: 'Keep or add a species that flowers then, or choose a larger mix.',
  floweringCount: (count) => `The mix has ${count} flowering species.`,
  tooSmallForFlowers: (size, target) =>
    `A mix of ${size} species cannot hold the ${target} kinds of flowers of a full mix; choose ${target} or more species to meet it.`,
  grassesTakeShare: (size, places) =>
    `Grasses and sedges take their share of a ${size}-species mix, leaving about ${places} places for flowers; choose 11 or more species to have both.`,
  noMonarchGoal: 'Monarchs are not one of your goals, so no milkweed is needed.',
  milkweedsInMix: (names) => `The mix has ${names}, food for monarch caterpillars.`,
  protectedMilkweeds: (count, names) =>
    count === 1
      ? `${names} suits your ground but is protected in the wild, so not chosen for you; keep one in the mix to meet this rule, bought from a nursery that propagates it.`
      : `${names} suit your ground but are protected in the wild, so not chosen for you; keep one in the mix to meet this rule, bought from a nursery that propagates it.`,
  closestMilkweed: (name, reason) => `The closest is ${name}: ${reason}`,
  smallMixNoGrass: 'A mix this small does not need a grass.',
  grassRuleSmall: 'Grasses and sedges in mixes of 4 or more species',
  tier: {
    front: 'front (under 2 ft / 60 cm)',
    middle: 'middle (2–4 ft / 60–120 cm)',
    back: 'back (over 4 ft / 120 cm)',
  },
  tierShort: { front: 'front', middle: 'middle', back: 'back' },
  tierHas: (tier, names) => `${tier}: ${names}`,
  noPlantForRows: (rows, heightLimit) =>
    `No plant for the ${rows} row suits your ground${heightLimit ? ' or your height limit' : ''}.`,
  askedFor: (size) => `You asked for ${size} species.`,
  keptSoHolds: (size) => `You kept ${size} species, so the mix holds ${size}.`,
  onlySuit: (available, wanted) =>
    `Only ${available} species suit your ground, so the mix has ${available} instead of ${wanted}.`,
  keptAndExcluded: (name) => `${name} is both kept and left out; it stays out.`,
  notInCatalogue: (slug) => `${slug} is not in the catalogue, so it cannot be kept in the mix.`,
  notNativeHere: (name) => `${name} is not native to your state, so it cannot be in the mix.`,
  keptPoorFit: (name, reason) => `You kept ${name} in the mix, though it is a poor fit: ${reason}`,
  keptProtected: (name) =>
    `You kept ${name}, which is protected in the wild: buy it from a nursery that propagates it, and never dig it from the wild.`,
  withheldProtected: (count, names, more) => {
    const all = more > 0 ? `${names} and ${more} other protected species` : names;
    return count === 1
      ? `${all} suits your ground but is protected in the wild, so Homeground does not choose it for you. To grow it, keep it in the mix and buy from a nursery that propagates it; never dig from the wild.`
      : `${all} suit your ground but are protected in the wild, so Homeground does not choose them for you. To grow one, keep it in the mix and buy from a nursery that propagates it; never dig from the wild.`;
  },
};

const ES_KIND: Record<MixKind, [string, string]> = {
  early: ['especie que florece temprano', 'especies que florecen temprano'],
  mid: ['especie que florece a mitad del verano', 'especies que florecen a mitad del verano'],
  late: ['especie que florece tarde', 'especies que florecen tarde'],
  flowering: ['especie con flores', 'especies con flores'],
  milkweed: ['algodoncillo nativo', 'algodoncillos nativos'],
  grass: ['pasto o junco', 'pastos o juncos'],
};
/** The counted noun with "native to your region" in its place and gender, for one and for many. */
const ES_NATIVE: Record<MixKind, [string, string, string]> = {
  early: [
    'Ninguna especie nativa de tu región que florezca temprano',
    'especie nativa de tu región que florece temprano',
    'especies nativas de tu región que florecen temprano',
  ],
  mid: [
    'Ninguna especie nativa de tu región que florezca a mitad del verano',
    'especie nativa de tu región que florece a mitad del verano',
    'especies nativas de tu región que florecen a mitad del verano',
  ],
  late: [
    'Ninguna especie nativa de tu región que florezca tarde',
    'especie nativa de tu región que florece tarde',
    'especies nativas de tu región que florecen tarde',
  ],
  flowering: [
    'Ninguna especie con flores nativa de tu región',
    'especie con flores nativa de tu región',
    'especies con flores nativas de tu región',
  ],
  milkweed: [
    'Ningún algodoncillo nativo de tu región',
    'algodoncillo nativo de tu región',
    'algodoncillos nativos de tu región',
  ],
  grass: [
    'Ningún pasto o junco nativo de tu región',
    'pasto o junco nativo de tu región',
    'pastos o juncos nativos de tu región',
  ],
};
const esLocks = (kept: number) =>
  kept > 0 ? ` (${kept === 1 ? 'una de ellas la guardaste tú' : `${kept} de ellas las guardaste tú`})` : '';
const esHas = (count: number, names: string) =>
  count === 0 ? 'La mezcla no tiene ninguna' : `La mezcla tiene ${count}: ${names}`;
/** "Solo 1 especie nativa de tu región que florece tarde va bien con …" / "Ninguna … va bien con …". */
const esOnly = (kind: MixKind, n: number, ground: string) =>
  n === 0
    ? `${ES_NATIVE[kind][0]} va bien con ${ground}`
    : `Solo ${n} ${plural(n, ES_NATIVE[kind][1], ES_NATIVE[kind][2])} ${plural(n, 'va', 'van')} bien con ${ground}`;

const ES: MixWords = {
  mixHas: (count, names) => `${esHas(count, names)}.`,
  mixHasButThin: (count, names, thin) => `${esHas(count, names)}, pero ${thin} en flor.`,
  monthHas: (month, count) => `${wordsFor('es').month[month as 1].long} tiene ${count}`,
  mixHasTooMany: (count, names) => `${esHas(count, names)}, y quedan muy pocos lugares para las flores.`,
  onlyAvailable: (kind, count, ground) => `${esOnly(kind, count, ground)}.`,
  noMilkweedInState: (ground, state) => `${esOnly('milkweed', 0, ground)} en ${state}.`,
  onlyAvailableInPeriod: (kind, count, ground) =>
    `${esOnly(kind, count, ground)}; una especie de otra parte de la temporada puede ocupar su lugar.`,
  lostOut: (kind, count, size, kept) =>
    `${count} ${plural(count, ES_KIND[kind][0], ES_KIND[kind][1])} más ${plural(count, 'va', 'van')} bien con tu terreno, pero ${plural(count, 'quedó', 'quedaron')} fuera por otras necesidades en una mezcla de ${size} especies${esLocks(kept)}; guarda una, o elige una mezcla más grande.`,
  rowsLostOut: (rows, size, kept) =>
    `Las plantas para la fila ${rows} quedaron fuera por otras necesidades en una mezcla de ${size} especies${esLocks(kept)}; guarda una, o elige una mezcla más grande.`,
  keepOrAddBloomer: 'Guarda o añade una especie que florezca entonces, o elige una mezcla más grande.',
  floweringCount: (count) => `La mezcla tiene ${count} ${plural(count, 'especie con flores', 'especies con flores')}.`,
  tooSmallForFlowers: (size, target) =>
    `En una mezcla de ${size} especies no caben las ${target} clases de flores de una mezcla completa; elige ${target} especies o más para cumplirla.`,
  grassesTakeShare: (size, places) =>
    `Los pastos y juncos ocupan su parte de una mezcla de ${size} especies y dejan unos ${places} lugares para las flores; elige 11 especies o más para tener las dos cosas.`,
  noMonarchGoal: 'Las monarcas no están entre tus objetivos, así que no hace falta un algodoncillo.',
  milkweedsInMix: (names) => `La mezcla tiene ${names}, alimento para las orugas de la monarca.`,
  protectedMilkweeds: (count, names) =>
    count === 1
      ? `${names} va bien con tu terreno, pero está protegida en la naturaleza, así que no la elegimos por ti; guárdala en la mezcla para cumplir esta regla, comprada en un vivero que la propague.`
      : `${names} van bien con tu terreno, pero están protegidas en la naturaleza, así que no las elegimos por ti; guarda una en la mezcla para cumplir esta regla, comprada en un vivero que la propague.`,
  closestMilkweed: (name, reason) => `La más cercana es ${name}: ${reason}`,
  smallMixNoGrass: 'Una mezcla tan pequeña no necesita un pasto.',
  grassRuleSmall: 'Pastos y juncos en mezclas de 4 especies o más',
  tier: {
    front: 'del frente (menos de 2 ft / 60 cm)',
    middle: 'del medio (2–4 ft / 60–120 cm)',
    back: 'del fondo (más de 4 ft / 120 cm)',
  },
  tierShort: { front: 'del frente', middle: 'del medio', back: 'del fondo' },
  tierHas: (tier, names) => `${tier}: ${names}`,
  noPlantForRows: (rows, heightLimit) =>
    heightLimit
      ? `Ninguna planta para la fila ${rows} va bien con tu terreno o tu límite de altura.`
      : `Ninguna planta para la fila ${rows} va bien con tu terreno.`,
  askedFor: (size) => `Pediste ${size} ${plural(size, 'especie', 'especies')}.`,
  keptSoHolds: (size) => `Guardaste ${size} ${plural(size, 'especie', 'especies')}, así que la mezcla tiene ${size}.`,
  onlySuit: (available, wanted) =>
    `Solo ${available} ${plural(available, 'especie va', 'especies van')} con tu terreno, así que la mezcla tiene ${available} en vez de ${wanted}.`,
  keptAndExcluded: (name) => `${name} está a la vez guardada y descartada; se queda fuera.`,
  notInCatalogue: (slug) => `${slug} no está en el catálogo, así que no se puede guardar en la mezcla.`,
  notNativeHere: (name) => `${name} no es nativa de tu estado, así que no puede estar en la mezcla.`,
  keptPoorFit: (name, reason) => `Guardaste ${name} en la mezcla, aunque no le va bien a tu terreno: ${reason}`,
  keptProtected: (name) =>
    `Guardaste ${name}, que está protegida en la naturaleza: cómprala en un vivero que la propague y nunca la saques del campo.`,
  withheldProtected: (count, names, more) => {
    const all =
      more > 0 ? `${names} y ${more} ${plural(more, 'otra especie protegida', 'otras especies protegidas')}` : names;
    return count === 1
      ? `${all} va bien con tu terreno, pero está protegida en la naturaleza, así que Homeground no la elige por ti. Para cultivarla, guárdala en la mezcla y cómprala en un vivero que la propague; nunca la saques del campo.`
      : `${all} van bien con tu terreno, pero están protegidas en la naturaleza, así que Homeground no las elige por ti. Para cultivar una, guárdala en la mezcla y cómprala en un vivero que la propague; nunca la saques del campo.`;
  },
};

const MIX_WORDS: Record<WordLocale, MixWords> = { en: EN, es: ES };

/** The rules' details and the mix's notices in a language (English when none is given). */
export function mixWordsFor(locale: WordLocale = 'en'): MixWords {
  return MIX_WORDS[locale];
}
