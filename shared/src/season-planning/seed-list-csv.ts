import { csvField } from '../csv/csv-cell.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import type { SeedList } from './seed-list.js';

/** The English header: the columns as the first CSV export named them (a spreadsheet may key on them). */
const COLUMNS = [
  'species',
  'scientificName',
  'targetPlants',
  'germinationPct',
  'germinationFrom',
  'lossPct',
  'seedsToSow',
  'seedsPerPound',
  'grams',
  'ounces',
  'packets',
  'buyBy',
  'collectLocally',
  'notes',
] as const;

/**
 * The file's own words by language: the header (same columns, same order), yes/no and the title of a
 * caution row. `germinationFrom` stays a code ("record" or "yours") in every language, so a sheet can
 * filter on it whichever language it was asked in.
 */
const CSV_WORDS: Record<WordLocale, { header: readonly string[]; yes: string; no: string; note: string }> = {
  en: { header: COLUMNS, yes: 'yes', no: 'no', note: 'Please note' },
  es: {
    header: [
      'especie',
      'nombre científico',
      'meta de plantas',
      'germinación %',
      'germinación según',
      'pérdida %',
      'semillas a sembrar',
      'semillas por libra',
      'gramos',
      'onzas',
      'sobres',
      'comprar por',
      'recoger localmente',
      'notas',
    ],
    yes: 'sí',
    no: 'no',
    note: 'Ten en cuenta',
  },
};

/**
 * The seed list as CSV (RFC 4180, CRLF): one row per species, then one "Please note" row per
 * caution (the list's wild-collection cautions, then each species' own) so a printed or imported
 * sheet keeps every one. Empty cells where the record gives no seeds per pound. `locale` words the
 * header, yes/no and the caution rows' title; the list's own notes and cautions come in it already
 * (`seedList` with its `locale` option).
 */
export function seedListToCsv(list: SeedList, locale: WordLocale = 'en'): string {
  const words = CSV_WORDS[locale];
  const rows: string[][] = list.rows.map((r) => [
    r.commonName,
    r.scientificName,
    String(r.targetPlants),
    String(r.germinationRatePct),
    r.germinationFrom,
    String(Math.round(r.lossFactor * 100)),
    String(r.seedsToSow),
    r.seedsPerPound === null ? '' : String(r.seedsPerPound),
    r.grams === null ? '' : r.grams.toFixed(2),
    r.ounces === null ? '' : r.ounces.toFixed(3),
    String(r.packets),
    r.buyBy,
    r.collectLocally ? words.yes : words.no,
    r.collectNotes.join(' '),
  ]);
  const note = (species: string, scientific: string, text: string) => [
    species,
    scientific,
    ...Array(words.header.length - 3).fill(''),
    text,
  ];
  for (const c of list.cautions) rows.push(note(words.note, '', c));
  for (const r of list.rows)
    for (const c of r.cautions) rows.push(note(r.commonName, r.scientificName, `${c.title}: ${c.text}`));
  return [words.header, ...rows].map((r) => r.map(csvField).join(',')).join('\r\n');
}
