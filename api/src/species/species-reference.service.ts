import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import {
  isUnexplained,
  type RecordReferenceAnswer,
  type ReferenceComparison,
  type UnexplainedDisagreements,
  type WordLocale,
} from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import {
  type CatalogueNotes,
  compareWithReference,
  DATA_DIR,
  loadCatalogue,
  loadReferenceTables,
  missingReferenceFiles,
  readGenusAliases,
  type ReferenceTables,
} from '@homeground/species-data';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { SpeciesStore } from './species-store.service.js';

/**
 * Each record beside the open reference data, by the catalogue's own comparer (the one its reference
 * tests run). The reference is read in place from the configured folder, once, on first use; without
 * it the answers say which files are missing instead of failing.
 */
@Injectable()
export class SpeciesReferenceService {
  private tables: ReferenceTables | undefined;
  private readonly notes: CatalogueNotes;

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly store: SpeciesStore,
  ) {
    this.notes = { realignments: loadCatalogue().realignments, genusAliases: readGenusAliases(DATA_DIR) };
  }

  private reference(): { missingFiles: string[]; tables: ReferenceTables | null } {
    const missingFiles = missingReferenceFiles(this.config.referenceDir);
    if (missingFiles.length > 0) return { missingFiles, tables: null };
    this.tables ??= loadReferenceTables(this.config.referenceDir);
    return { missingFiles, tables: this.tables };
  }

  /** One record beside the reference; 404 for a slug the catalogue does not hold. */
  record(slug: string, locale: WordLocale = 'en'): RecordReferenceAnswer {
    const s = this.store.get(slug);
    if (!s) throw new NotFoundException(apiWords(locale)('refusals.species.noSpecies', { slug }));
    const { missingFiles, tables } = this.reference();
    return {
      available: tables !== null,
      missingFiles,
      comparison: tables ? compareWithReference(s, tables, this.notes) : null,
    };
  }

  /** Every record with a difference it does not explain yet, and how many such differences there are. */
  unexplained(): UnexplainedDisagreements {
    const { missingFiles, tables } = this.reference();
    if (!tables) return { available: false, missingFiles, compared: 0, count: 0, records: [] };
    const all = this.store.all();
    const records: ReferenceComparison[] = all
      .map((s) => compareWithReference(s, tables, this.notes))
      .map((c) => ({ ...c, checks: c.checks.filter(isUnexplained) }))
      .filter((c) => c.checks.length > 0);
    const count = records.reduce((n, c) => n + c.checks.length, 0);
    return { available: true, missingFiles, compared: all.length, count, records };
  }
}
