import { csvField } from '../csv/csv-cell.js';
import type { SeedList } from './seed-list.js';

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
 * The seed list as CSV (RFC 4180, CRLF): one row per species, then one "Please note" row per
 * caution (the list's wild-collection cautions, then each species' own) so a printed or imported
 * sheet keeps every one. Empty cells where the record gives no seeds per pound.
 */
export function seedListToCsv(list: SeedList): string {
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
    r.collectLocally ? 'yes' : 'no',
    r.collectNotes.join(' '),
  ]);
  const note = (species: string, scientific: string, text: string) => [
    species,
    scientific,
    ...Array(COLUMNS.length - 3).fill(''),
    text,
  ];
  for (const c of list.cautions) rows.push(note('Please note', '', c));
  for (const r of list.rows)
    for (const c of r.cautions) rows.push(note(r.commonName, r.scientificName, `${c.title}: ${c.text}`));
  return [COLUMNS as readonly string[], ...rows].map((r) => r.map(csvField).join(',')).join('\r\n');
}
