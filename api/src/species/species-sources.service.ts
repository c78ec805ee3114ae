import { Injectable } from '@nestjs/common';
import { type Source, SOURCED_FIELDS, type Species, type WordLocale } from '@homeground/shared';
import { loadCatalogue } from '@homeground/species-data';
import { apiWords } from '../common/i18n/api-i18n.js';
import { badRequest, pleaseCheck } from '../common/validation/bad-request.js';

/** The sources registry (`species-data/sources.json`), read once; curators cite its keys. */
@Injectable()
export class SpeciesSourcesService {
  private readonly sources: Source[] = loadCatalogue().sources;
  private readonly keys = new Set(this.sources.map((s) => s.key));

  list(): Source[] {
    return this.sources;
  }

  /** The sourced facts whose source key the registry does not hold. */
  unknownKeys(record: Species): (typeof SOURCED_FIELDS)[number][] {
    const given = record.sources as Partial<Record<(typeof SOURCED_FIELDS)[number], string>>;
    return SOURCED_FIELDS.filter((f) => given[f] !== undefined && !this.keys.has(given[f]!));
  }

  /** A record may only cite sources the registry holds, so every fact's citation can be shown. */
  assertKnown(record: Species, locale: WordLocale = 'en'): void {
    const given = record.sources as Partial<Record<(typeof SOURCED_FIELDS)[number], string>>;
    const unknown = SOURCED_FIELDS.filter((f) => given[f] !== undefined && !this.keys.has(given[f]!));
    if (unknown.length > 0) {
      const fields = unknown.map((f) => ({
        field: `sources.${f}`,
        message: apiWords(locale)('refusals.species.unknownSource', { source: given[f] }),
      }));
      throw badRequest(fields, pleaseCheck(fields, locale));
    }
  }
}
