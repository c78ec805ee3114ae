import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import type { StateCode } from '@homeground/shared';
import { referenceFile } from './reference-dir.js';
import { STATE_NAME_TO_CODE } from './us-states.js';

/** A row of USDA PLANTS' accepted-taxa table (`usda_plants_taxa.csv`). */
export interface UsdaTaxon {
  symbol: string;
  scientificNameWithAuthor: string;
  /** The name without its authority: "Genus species" or "Genus species var. x". */
  name: string;
  commonName: string;
  rank: string;
  family: string;
  genus: string;
  duration: string;
  growthHabit: string;
}

export interface UsdaDistribution {
  nativeIn: StateCode[];
  introducedIn: StateCode[];
}

function readCsv(file: string, dir?: string): Record<string, string>[] {
  const text = readFileSync(referenceFile(file, dir), 'utf8').replace(/^\uFEFF/, '');
  return Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data;
}

/** Strips the authority: keeps the genus, the epithet and an infraspecific rank with its epithet. */
export function nameWithoutAuthor(withAuthor: string): string {
  const words = withAuthor.trim().split(/\s+/);
  const kept = words.slice(0, 2);
  const rankAt = words.findIndex((w, i) => i >= 2 && (w === 'var.' || w === 'ssp.' || w === 'subsp.'));
  if (rankAt > 0 && words[rankAt + 1]) {
    kept.push(words[rankAt] === 'ssp.' ? 'subsp.' : words[rankAt], words[rankAt + 1]);
  }
  return kept.join(' ');
}

/** Each table is read once per folder (tests use the default folder, the API its configured one). */
const cached = <T>(cache: Map<string, T>, dir: string | undefined, read: () => T): T => {
  const key = dir ?? '';
  if (!cache.has(key)) cache.set(key, read());
  return cache.get(key)!;
};

const taxaCache = new Map<string, UsdaTaxon[]>();
export function loadUsdaTaxa(dir?: string): UsdaTaxon[] {
  return cached(taxaCache, dir, () =>
    readCsv('usda_plants_taxa.csv', dir).map((r) => ({
      symbol: r.symbol,
      scientificNameWithAuthor: r.scientific_name,
      name: nameWithoutAuthor(r.scientific_name),
      commonName: r.common_name,
      rank: r.rank,
      family: r.family,
      genus: r.genus,
      duration: r.duration,
      growthHabit: r.growth_habit,
    })),
  );
}

const distributionCache = new Map<string, Map<string, UsdaDistribution>>();
/** State distribution by symbol, limited to the conterminous states and DC. */
export function loadUsdaDistribution(dir?: string): Map<string, UsdaDistribution> {
  const toCodes = (list: string) =>
    list
      .split(';')
      .map((n) => STATE_NAME_TO_CODE[n.trim()])
      .filter((c): c is StateCode => Boolean(c));
  return cached(
    distributionCache,
    dir,
    () =>
      new Map(
        readCsv('usda_plants_state_distribution.csv', dir).map((r) => [
          r.symbol,
          { nativeIn: toCodes(r.native_in ?? ''), introducedIn: toCodes(r.introduced_in ?? '') },
        ]),
      ),
  );
}

const characteristicsCache = new Map<string, Map<string, Record<string, string>>>();
/** USDA PLANTS "Characteristics" rows (about 2,100 taxa), keyed by symbol. */
export function loadUsdaCharacteristics(dir?: string): Map<string, Record<string, string>> {
  return cached(
    characteristicsCache,
    dir,
    () => new Map(readCsv('usda_plants_characteristics.csv', dir).map((r) => [r.symbol, r])),
  );
}

/** A row of Tallamy & Shropshire (2009): Lepidoptera species recorded on a plant genus. */
export interface LepidopteraGenusRow {
  genus: string;
  family: string;
  origin: string;
  totalLepidoptera: number;
}

const tallamyCache = new Map<string, Map<string, LepidopteraGenusRow>>();
export function loadLepidopteraByGenus(dir?: string): Map<string, LepidopteraGenusRow> {
  return cached(
    tallamyCache,
    dir,
    () =>
      new Map(
        readCsv('tallamy_shropshire_2009_lepidoptera_by_plant_genus.csv', dir).map((r) => [
          r.Genus.trim(),
          {
            genus: r.Genus.trim(),
            family: (r['Family (as listed by USDA)'] ?? '').trim(),
            origin: (r['origin (for analysis)'] ?? '').trim(),
            totalLepidoptera: Number(r['total Lep spp']),
          },
        ]),
      ),
  );
}
