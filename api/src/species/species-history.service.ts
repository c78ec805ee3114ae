import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Species, SpeciesChange, WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { Repository } from 'typeorm';
import { SpeciesChangeRow } from './species-change.entity.js';
import { SpeciesService } from './species.service.js';

/** Reading a species' history and undoing a change (the undo is itself a change). */
@Injectable()
export class SpeciesHistoryService {
  constructor(
    @InjectRepository(SpeciesChangeRow) private readonly rows: Repository<SpeciesChangeRow>,
    private readonly species: SpeciesService,
  ) {}

  /** Newest first; a record renamed since keeps the changes made under its old slug out of this list. */
  async history(slug: string): Promise<SpeciesChange[]> {
    this.species.get(slug);
    const rows = await this.rows.find({
      where: { slug },
      relations: { changedBy: true },
      order: { changedAt: 'DESC', id: 'DESC' },
    });
    return rows.map(toChange);
  }

  /** Puts back the record as it was before the change, as a new "revert" change. */
  async revert(slug: string, changeId: string, userId: string, locale: WordLocale = 'en'): Promise<Species> {
    const say = apiWords(locale);
    const row = await this.rows.findOneBy({ id: changeId, slug });
    if (!row) throw new NotFoundException(say('refusals.species.noChange', { changeId, slug }));
    if (!row.beforeRecord) throw new ConflictException(say('refusals.species.firstVersion'));
    return this.species.replace(slug, row.beforeRecord, userId, { kind: 'revert', revertOf: row.id }, locale);
  }
}

function toChange(r: SpeciesChangeRow): SpeciesChange {
  return {
    id: r.id,
    slug: r.slug,
    kind: r.kind,
    changedAt: r.changedAt.toISOString(),
    changedBy: r.changedBy ? { id: r.changedBy.id, displayName: r.changedBy.displayName } : null,
    fileName: r.fileName,
    revertOf: r.revertOf,
    changes: r.changes,
  };
}
