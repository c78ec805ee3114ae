import { Logger } from '@nestjs/common';
import type { Catalogue } from '@homeground/species-data';
import type { DataSource } from 'typeorm';
import { recordHash, withAddedFacts, writeEcoregions, writeSpecies } from './catalogue-writer.js';
import { runSql } from '../common/database/dialect.js';

export interface LoadReport {
  inserted: number;
  updated: number;
  keptCuratorEdits: number;
  unchanged: number;
  ecoregionsReloaded: boolean;
}

/**
 * Puts the curated catalogue into SQLite, idempotently, in one transaction:
 * new species are inserted; species whose file changed are updated unless a curator has edited
 * them in the app (their edit wins and is reported); the ecoregion tables are replaced only when
 * their files changed. Species that curators added in the app are left alone.
 */
export async function loadCatalogueIntoDatabase(db: DataSource, catalogue: Catalogue): Promise<LoadReport> {
  const report: LoadReport = { inserted: 0, updated: 0, keptCuratorEdits: 0, unchanged: 0, ecoregionsReloaded: false };
  const ecoHash = recordHash([catalogue.ecoregions, catalogue.counties]);
  await db.transaction(async (tx) => {
    const rows: { slug: string; seed_hash: string | null; edited_by: string | null }[] = await runSql(
      tx,
      `SELECT slug, seed_hash, edited_by FROM species`,
    );
    const bySlug = new Map(rows.map((r) => [r.slug, r]));
    for (const s of catalogue.species) {
      const hash = recordHash(s);
      const row = bySlug.get(s.slug);
      if (!row) {
        await writeSpecies(tx, s, { seedHash: hash, editedBy: null });
        report.inserted++;
      } else if (row.seed_hash === hash) {
        report.unchanged++;
      } else if (row.seed_hash === null) {
        const [kept]: { record: string }[] = await runSql(tx, `SELECT record FROM species WHERE slug = ?`, [s.slug]);
        const completed = kept ? withAddedFacts(JSON.parse(kept.record) as Record<string, unknown>, s) : null;
        if (completed)
          await runSql(tx, `UPDATE species SET record = ? WHERE slug = ?`, [JSON.stringify(completed), s.slug]);
        report.keptCuratorEdits++;
      } else {
        await writeSpecies(tx, s, { seedHash: hash, editedBy: null });
        report.updated++;
      }
    }
    const [meta] = await runSql(tx, `SELECT value FROM catalogue_meta WHERE key = 'ecoregions_hash'`);
    if (meta?.value !== ecoHash) {
      await writeEcoregions(tx, catalogue.ecoregions, catalogue.counties);
      await runSql(
        tx,
        `INSERT INTO catalogue_meta (key, value) VALUES ('ecoregions_hash', ?)
           ON CONFLICT (key) DO UPDATE SET value = excluded.value`,
        [ecoHash],
      );
      report.ecoregionsReloaded = true;
    }
  });
  if (report.inserted || report.updated || report.keptCuratorEdits || report.ecoregionsReloaded) {
    new Logger('Catalogue').log(
      `species: ${report.inserted} new, ${report.updated} updated, ${report.unchanged} unchanged, ` +
        `${report.keptCuratorEdits} kept as curators edited them; ecoregions ${report.ecoregionsReloaded ? 'reloaded' : 'unchanged'}`,
    );
  }
  return report;
}
