import { createHash } from 'node:crypto';
import type { CountyEcoregions, Ecoregion, Species } from '@homeground/shared';
import type { EntityManager } from 'typeorm';
import { runSql } from '../common/database/dialect.js';

/** A stable hash of a record, to tell whether a species-data file changed since it was loaded. */
export function recordHash(value: unknown): string {
  return createHash('sha256').update(JSON.stringify(value)).digest('hex').slice(0, 32);
}

/** Facts added to the record shape after some curator edits were saved; those edits lack them. */
const ADDED_FACTS = [
  'ecoregions',
  'sunOptimum',
  'moistureOptimum',
  'wetlandIndicator',
  'needsAcidSoil',
  'selfSows',
  'commercialAvailability',
  'protectedIn',
] as const;
const ADDED_SOURCED = [
  'ecoregions',
  'sunOptimum',
  'moistureOptimum',
  'wetlandIndicator',
  'commercialAvailability',
  'protectedIn',
] as const;

/**
 * A curator-edited record saved before the site-fit facts existed, completed with the catalogue
 * file's values for those facts only (the curator's other edits stay as they are). Returns null
 * when nothing is missing.
 */
export function withAddedFacts(edited: Record<string, unknown>, file: Species): Species | null {
  const missing = ADDED_FACTS.filter((k) => !(k in edited));
  const sources = (edited.sources ?? {}) as Record<string, string>;
  const missingSources = ADDED_SOURCED.filter((k) => !(k in sources));
  if (missing.length === 0 && missingSources.length === 0) return null;
  const out: Record<string, unknown> = { ...edited };
  for (const k of missing) out[k] = file[k];
  out.sources = { ...sources, ...Object.fromEntries(missingSources.map((k) => [k, file.sources[k]])) };
  return out as Species;
}

/**
 * Writes one species with its names and native states, inside the caller's transaction.
 * `previousSlug` renames a record in place (names, states and photo follow by ON UPDATE CASCADE).
 */
export async function writeSpecies(
  tx: EntityManager,
  s: Species,
  meta: { seedHash: string | null; editedBy: string | null; previousSlug?: string },
): Promise<void> {
  const values = [
    s.slug,
    s.scientificName,
    s.usdaSymbol,
    s.family,
    s.growthForm,
    s.heightCm.max,
    s.wildlife.monarchHost ? 1 : 0,
    JSON.stringify(s),
    meta.seedHash,
    meta.editedBy,
  ];
  const old = meta.previousSlug ?? s.slug;
  const existing = await runSql(tx, `SELECT 1 FROM species WHERE slug = ?`, [old]);
  if (existing.length > 0) {
    await runSql(
      tx,
      `UPDATE species SET slug = ?, scientific_name = ?, usda_symbol = ?, family = ?, growth_form = ?, height_max_cm = ?,
         monarch_host = ?, record = ?, seed_hash = ?, edited_by = ?, updated_at = CURRENT_TIMESTAMP WHERE slug = ?`,
      [...values, old],
    );
  } else {
    await runSql(
      tx,
      `INSERT INTO species (slug, scientific_name, usda_symbol, family, growth_form, height_max_cm, monarch_host, record, seed_hash, edited_by)
       VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
      values,
    );
  }
  await runSql(tx, `DELETE FROM species_names WHERE slug = ?`, [s.slug]);
  await insertRows(
    tx,
    'species_names',
    ['slug', 'name', 'kind'],
    [
      [s.slug, s.scientificName, 'scientific'],
      ...[...new Set(s.commonNames)].map((n) => [s.slug, n, 'common']),
      ...[...new Set(s.synonyms)].map((n) => [s.slug, n, 'synonym']),
    ],
  );
  await runSql(tx, `DELETE FROM species_states WHERE slug = ?`, [s.slug]);
  await insertRows(
    tx,
    'species_states',
    ['slug', 'state'],
    [...new Set(s.nativeStates)].map((st) => [s.slug, st]),
  );
}

/** Replaces the ecoregion table, counties and the crosswalk, inside the caller's transaction. */
export async function writeEcoregions(
  tx: EntityManager,
  ecoregions: Ecoregion[],
  counties: CountyEcoregions[],
): Promise<void> {
  await runSql(tx, `DELETE FROM county_ecoregions`);
  await runSql(tx, `DELETE FROM counties`);
  await runSql(tx, `DELETE FROM ecoregions`);
  await insertRows(
    tx,
    'ecoregions',
    ['code', 'name', 'level2_code', 'level1_code', 'record'],
    ecoregions.map((e) => [e.code, e.name, e.level2.code, e.level1.code, JSON.stringify(e)]),
  );
  await insertRows(
    tx,
    'counties',
    ['fips', 'name', 'state'],
    counties.map((c) => [c.fips, c.name, c.state]),
  );
  await insertRows(
    tx,
    'county_ecoregions',
    ['fips', 'code', 'share'],
    counties.flatMap((c) => c.ecoregions.map((e) => [c.fips, e.code, e.share])),
  );
}

/** Rows per INSERT: well under SQLite's limit of bound values, and few round trips to a database server. */
const ROWS_PER_INSERT = 200;

/** Inserts rows with multi-row INSERTs: one statement per species' names, not one per name. */
async function insertRows(tx: EntityManager, table: string, columns: string[], rows: unknown[][]): Promise<void> {
  const row = `(${columns.map(() => '?').join(', ')})`;
  for (let i = 0; i < rows.length; i += ROWS_PER_INSERT) {
    const chunk = rows.slice(i, i + ROWS_PER_INSERT);
    await runSql(
      tx,
      `INSERT INTO ${table} (${columns.join(', ')}) VALUES ${chunk.map(() => row).join(', ')}`,
      chunk.flat(),
    );
  }
}
