import { ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { firstName, type SavedMix, type WordLocale } from '@homeground/shared';
import { Repository } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { apiWords } from '../common/i18n/api-i18n.js';
import { MixContextService } from '../mix-context/mix-context.service.js';
import { SavedMixRow } from './saved-mix.entity.js';

type SaveInput = Pick<SavedMix, 'name' | 'request' | 'chosen'>;

/** Enough for every bed of a large garden; a cap keeps one account from filling the database. */
export const MAX_SAVED_MIXES_PER_PERSON = 200;

@Injectable()
export class SavedMixesService {
  constructor(
    @InjectRepository(SavedMixRow) private readonly mixes: Repository<SavedMixRow>,
    private readonly ctx: MixContextService,
  ) {}

  async save(user: AuthenticatedUser, input: SaveInput, locale: WordLocale = 'en'): Promise<SavedMix> {
    this.ctx.assertKnown(
      input.chosen.map((slug, i) => ({ field: `chosen.${i}`, slug })),
      locale,
    );
    const kept = await this.mixes.count({ where: { ownerId: user.id } });
    if (kept >= MAX_SAVED_MIXES_PER_PERSON)
      throw new ConflictException(apiWords(locale)('refusals.savedMixes.tooMany', { max: MAX_SAVED_MIXES_PER_PERSON }));
    const row = await this.mixes.save(
      this.mixes.create({ ownerId: user.id, name: input.name, request: input.request, chosen: input.chosen }),
    );
    return this.get(row.id, locale);
  }

  async get(id: string, locale: WordLocale = 'en'): Promise<SavedMix> {
    const row = await this.mixes.findOne({ where: { id }, relations: { owner: true } });
    if (!row) throw new NotFoundException(apiWords(locale)('refusals.savedMixes.noLink'));
    return toDto(row);
  }

  async mine(user: AuthenticatedUser): Promise<SavedMix[]> {
    const rows = await this.mixes.find({
      where: { ownerId: user.id },
      relations: { owner: true },
      order: { createdAt: 'DESC' },
    });
    return rows.map(toDto);
  }

  async remove(user: AuthenticatedUser, id: string, locale: WordLocale = 'en'): Promise<void> {
    const say = apiWords(locale);
    const row = await this.mixes.findOne({ where: { id } });
    if (!row) throw new NotFoundException(say('refusals.savedMixes.noId'));
    if (row.ownerId !== user.id && user.role !== 'admin')
      throw new ForbiddenException(say('refusals.savedMixes.notYours'));
    await this.mixes.delete({ id });
  }
}

function toDto(row: SavedMixRow): SavedMix {
  return {
    id: row.id,
    name: row.name,
    request: row.request as SavedMix['request'],
    chosen: row.chosen,
    ownerFirstName: firstName(row.owner.displayName),
    createdAt: row.createdAt.toISOString(),
  };
}
