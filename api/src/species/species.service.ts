import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  type CsvImportResult,
  type CsvRowError,
  type CsvImportPreviewRow,
  csvRowToSpecies,
  diffSpecies,
  SPECIES_CSV_COLUMNS,
  type Species,
  speciesToCsvRow,
  type WordLocale,
} from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import Papa from 'papaparse';
import { DataSource, type EntityManager } from 'typeorm';
import { writeSpecies } from '../catalogue/catalogue-writer.js';
import { badRequest } from '../common/validation/bad-request.js';
import { recordChange } from './species-change-recorder.js';
import { SpeciesSourcesService } from './species-sources.service.js';
import { SpeciesStore } from './species-store.service.js';
import { runSql } from '../common/database/dialect.js';

/** At most this many bad rows are listed in one answer; the count says how many there were. */
const MAX_REPORTED_ROW_ERRORS = 500;

@Injectable()
export class SpeciesService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly store: SpeciesStore,
    private readonly sources: SpeciesSourcesService,
  ) {}

  get(slug: string, locale: WordLocale = 'en'): Species {
    const s = this.store.get(slug);
    if (!s) throw new NotFoundException(apiWords(locale)('refusals.species.noSpecies', { slug }));
    return s;
  }

  async create(record: Species, userId: string, locale: WordLocale = 'en'): Promise<Species> {
    this.sources.assertKnown(record, locale);
    if (this.store.get(record.slug))
      throw new ConflictException(apiWords(locale)('refusals.species.existsEdit', { slug: record.slug }));
    await this.db.transaction(async (tx) => {
      await this.assertUnique(tx, record, null, locale);
      await writeSpecies(tx, record, { seedHash: null, editedBy: userId });
      await recordChange(tx, { kind: 'create', before: null, after: record, userId });
    });
    await this.store.publish();
    return this.get(record.slug);
  }

  /** Replaces a record; a curator's edit is kept over later catalogue-file changes (seed hash cleared). */
  async replace(
    slug: string,
    record: Species,
    userId: string,
    how: { kind: 'edit' | 'revert'; revertOf?: string } = { kind: 'edit' },
    locale: WordLocale = 'en',
  ): Promise<Species> {
    const before = this.get(slug, locale);
    this.sources.assertKnown(record, locale);
    if (record.slug !== slug && this.store.get(record.slug))
      throw new ConflictException(apiWords(locale)('refusals.species.exists', { slug: record.slug }));
    await this.db.transaction(async (tx) => {
      await this.assertUnique(tx, record, slug, locale);
      await writeSpecies(tx, record, { seedHash: null, editedBy: userId, previousSlug: slug });
      await recordChange(tx, { kind: how.kind, before, after: record, userId, revertOf: how.revertOf });
    });
    await this.store.publish();
    return this.get(record.slug);
  }

  /**
   * Imports a CSV of species (one row per species, the export's columns). Every row is checked first;
   * if any row is bad, the answer lists each bad row with its line number and field and nothing is
   * written. Otherwise all rows are written in one transaction (existing slugs are replaced).
   */
  async importCsv(
    text: string,
    userId: string,
    fileName: string | null = null,
    { dryRun = false }: { dryRun?: boolean } = {},
    locale: WordLocale = 'en',
  ): Promise<CsvImportResult> {
    const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), {
      header: true,
      skipEmptyLines: 'greedy',
    });
    const say = apiWords(locale);
    const errors: CsvRowError[] = parsed.errors.map((e) => ({
      row: (e.row ?? 0) + 2,
      field: 'row',
      message: say('refusals.species.csvUnreadable', { reason: e.message }),
    }));
    const missing = SPECIES_CSV_COLUMNS.filter((c) => !(parsed.meta.fields ?? []).includes(c));
    if (missing.length)
      errors.push({ row: 1, field: missing.join(', '), message: say('refusals.species.columnMissing') });
    if (parsed.data.length === 0) errors.push({ row: 2, field: 'row', message: say('refusals.species.noRows') });
    const records: Species[] = [];
    const seen = new Map<string, number>();
    parsed.data.forEach((row, i) => {
      const line = i + 2;
      const { species, errors: rowErrors } = csvRowToSpecies(row, line, locale);
      errors.push(...rowErrors);
      if (!species) return;
      for (const f of this.sources.unknownKeys(species))
        errors.push({
          row: line,
          field: 'sources',
          message: `${f}: ${say('refusals.species.unknownSource', { source: species.sources[f] })}`,
        });
      const first = seen.get(species.slug);
      if (first)
        errors.push({ row: line, field: 'slug', message: say('refusals.species.repeatsLine', { line: first }) });
      seen.set(species.slug, line);
      records.push(species);
    });
    if (errors.length === 0) errors.push(...this.crossRowConflicts(records, locale));
    if (errors.length > 0) {
      throw badRequest(
        [...new Set(errors.map((e) => e.field))].map((field) => ({ field, message: say('refusals.species.seeRows') })),
        say('refusals.species.fileProblems', { count: errors.length }),
        { rows: errors.slice(0, MAX_REPORTED_ROW_ERRORS) },
      );
    }
    const preview: CsvImportPreviewRow[] = records.map((r, i) => {
      const before = this.store.get(r.slug) ?? null;
      const fields = before ? diffSpecies(before, r).map((c) => c.field) : [];
      const action = !before ? 'create' : fields.length > 0 ? 'change' : 'unchanged';
      return { line: i + 2, slug: r.slug, scientificName: r.scientificName, action, fields };
    });
    const created = preview.filter((p) => p.action === 'create').length;
    if (dryRun) return { created, updated: records.length - created, dryRun: true, preview };
    await this.db.transaction(async (tx) => {
      for (const r of records) {
        const before = this.store.get(r.slug) ?? null;
        await writeSpecies(tx, r, { seedHash: null, editedBy: userId });
        await recordChange(tx, { kind: 'import', before, after: r, userId, fileName });
      }
    });
    await this.store.publish();
    return { created, updated: records.length - created, dryRun: false, preview };
  }

  exportCsv(): string {
    return Papa.unparse(
      { fields: [...SPECIES_CSV_COLUMNS], data: this.store.all().map(speciesToCsvRow) },
      // Cells starting with = + - @ get a leading ' so spreadsheet programs show them as text (OWASP CSV injection).
      { newline: '\r\n', escapeFormulae: true },
    );
  }

  /** A symbol or scientific name may belong to one species only (other than the one being replaced). */
  private async assertUnique(tx: EntityManager, r: Species, ownSlug: string | null, locale: WordLocale): Promise<void> {
    const clash = await runSql<{ slug: string }>(
      tx,
      `SELECT slug FROM species WHERE (usda_symbol = ? OR scientific_name = ?) AND slug <> ? AND slug <> ?`,
      [r.usdaSymbol, r.scientificName, r.slug, ownSlug ?? r.slug],
    );
    if (clash.length)
      throw new ConflictException(
        apiWords(locale)('refusals.species.clash', {
          symbol: r.usdaSymbol,
          name: r.scientificName,
          slug: clash[0].slug,
        }),
      );
  }

  /** Rows that would clash with another species in the catalogue (same symbol or name, other slug). */
  private crossRowConflicts(records: Species[], locale: WordLocale): CsvRowError[] {
    const bySymbol = new Map(this.store.all().map((s) => [s.usdaSymbol, s.slug]));
    const out: CsvRowError[] = [];
    records.forEach((r, i) => {
      const owner = bySymbol.get(r.usdaSymbol);
      if (owner && owner !== r.slug)
        out.push({
          row: i + 2,
          field: 'usdaSymbol',
          message: apiWords(locale)('refusals.species.usedBy', { slug: owner }),
        });
    });
    return out;
  }
}
