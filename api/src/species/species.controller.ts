import { Controller, Get, Header, HttpCode, Post, Put, Req, Res, StreamableFile } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  type CsvImportQuery,
  csvImportQuerySchema,
  type CsvImportResult,
  csvImportResultSchema,
  type PhotoCredit,
  photoCreditSchema,
  type PhotoQuery,
  type RevertChangeRequest,
  revertChangeRequestSchema,
  photoQuerySchema,
  photoUploadResultSchema,
  slugParamSchema,
  type Species,
  type SpeciesChange,
  speciesChangeResponseSchema,
  type SpeciesDetail,
  speciesDetailSchema,
  speciesPageSchema,
  type SpeciesQuery,
  speciesQuerySchema,
  speciesSchema,
  uuidParamSchema,
  type WordLocale,
} from '@homeground/shared';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import { z } from 'zod';
import type { Request, Response } from 'express';
import { createReadStream } from 'node:fs';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import {
  FileResponse,
  type UploadedBlob,
  ZodBody,
  ZodFile,
  ZodFormFields,
  ZodParam,
  ZodQuery,
  ZodResponse,
} from '../common/decorators/zod.decorators.js';
import { utf8Text } from '../common/http/utf8-text.js';
import { MAX_PHOTO_BYTES, SpeciesPhotosService } from './species-photos.service.js';
import { SpeciesHistoryService } from './species-history.service.js';
import { SpeciesStore } from './species-store.service.js';
import { SpeciesService } from './species.service.js';
import { Public } from '../common/decorators/public.decorator.js';

const MAX_CSV_BYTES = 10 * 1024 * 1024;

@ApiTags('species')
@AnswersInLanguage()
@Controller('species')
export class SpeciesController {
  constructor(
    private readonly species: SpeciesService,
    private readonly store: SpeciesStore,
    private readonly photos: SpeciesPhotosService,
    private readonly history_: SpeciesHistoryService,
  ) {}

  /** Filtered, sorted, paged catalogue; `q` is typo-tolerant over common and scientific names and synonyms. */
  @Public()
  @Get()
  @ZodResponse(speciesPageSchema)
  list(@ZodQuery(speciesQuerySchema) query: SpeciesQuery, @Req() req: Request, @Res() res: Response): void {
    // Remembered as bytes under this URL: repeats are answered by species-list-cache.middleware,
    // since the list is read far more often than edited.
    const body = JSON.stringify(this.store.list(query));
    this.store.rememberForUrl(req.originalUrl, body);
    res.type('application/json').send(body);
  }

  @Public()
  @Get('export.csv')
  @FileResponse('text/csv', "The whole catalogue as CSV (the import's columns)")
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="homeground-species.csv"')
  exportCsv(): string {
    return this.species.exportCsv();
  }

  @Public()
  @Get(':slug')
  @ZodResponse(speciesDetailSchema)
  get(@ZodParam('slug', slugParamSchema) slug: string, @RequestLocale() locale: WordLocale): SpeciesDetail {
    return {
      ...this.species.get(slug, locale),
      hasPhoto: this.store.hasPhoto(slug),
      photoCredit: this.store.photoCredit(slug),
    };
  }

  @Post()
  @ZodResponse(speciesSchema, 201)
  @Auth('curator')
  create(
    @ZodBody(speciesSchema) record: Species,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<Species> {
    return this.species.create(record, user.id, locale);
  }

  @Put(':slug')
  @ZodResponse(speciesSchema)
  @Auth('curator')
  replace(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(speciesSchema) record: Species,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<Species> {
    return this.species.replace(slug, record, user.id, undefined, locale);
  }

  /**
   * CSV with the export's columns; all-or-nothing, bad rows listed with line numbers. With
   * `?dryRun=true` the file is checked the same way and the answer previews what it would create
   * and change, writing nothing.
   */
  @Post('import')
  @ZodResponse(csvImportResultSchema)
  @HttpCode(200)
  @Auth('curator')
  importCsv(
    @ZodFile('file', MAX_CSV_BYTES, "CSV with the export's columns") file: UploadedBlob,
    @ZodQuery(csvImportQuerySchema) query: CsvImportQuery,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<CsvImportResult> {
    return this.species.importCsv(
      utf8Text(file.buffer, 'file', locale),
      user.id,
      displayFileName(file.originalname),
      { dryRun: query.dryRun ?? false },
      locale,
    );
  }

  /** Every change to the record, newest first: who, when, how, and each field before and after. */
  @Get(':slug/history')
  @ZodResponse(z.array(speciesChangeResponseSchema))
  @Auth('curator')
  history(@ZodParam('slug', slugParamSchema) slug: string): Promise<SpeciesChange[]> {
    return this.history_.history(slug);
  }

  /** Puts the record back as it was before one change; the undo is itself a change in the history. */
  @Post(':slug/history/:changeId/revert')
  @ZodResponse(speciesSchema)
  @HttpCode(200)
  @Auth('curator')
  revert(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodParam('changeId', uuidParamSchema) changeId: string,
    @ZodBody(revertChangeRequestSchema) _body: RevertChangeRequest,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<Species> {
    return this.history_.revert(slug, changeId, user.id, locale);
  }

  @Post(':slug/photo')
  @ZodResponse(photoUploadResultSchema, 201)
  @Auth('curator')
  async uploadPhoto(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodFile(
      'photo',
      MAX_PHOTO_BYTES,
      'JPEG, PNG or WebP, with who took it, its licence and its source',
      photoCreditSchema,
    )
    file: UploadedBlob,
    @ZodFormFields(photoCreditSchema) credit: PhotoCredit,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ) {
    const p = await this.photos.save(slug, file.buffer, credit, user.id, locale);
    return {
      slug: p.slug,
      photographer: credit.photographer,
      licence: credit.licence,
      sourceUrl: credit.sourceUrl,
      mime: p.mime,
      bytes: p.bytes,
      width: p.width,
      height: p.height,
    };
  }

  @Public()
  @Get(':slug/photo')
  @FileResponse('image/*', 'The photo, resized to WebP when w is given')
  async photo(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodQuery(photoQuerySchema) query: PhotoQuery,
    @Res({ passthrough: true }) res: Response,
    @RequestLocale() locale: WordLocale,
  ): Promise<StreamableFile> {
    const file = await this.photos.file(slug, query.w, locale);
    res.setHeader('Cache-Control', 'public, max-age=3600');
    return new StreamableFile(createReadStream(file.path), { type: file.mime });
  }
}

/** A file name fit to show in the history: no folders, no control characters, at most 120 characters. */
function displayFileName(name: string | undefined): string | null {
  const base = (name ?? '').split(/[\\/]/).pop() ?? '';
  const clean = [...base]
    .filter((ch) => ch.charCodeAt(0) >= 0x20 && ch.charCodeAt(0) !== 0x7f)
    .join('')
    .trim()
    .slice(0, 120);
  return clean || null;
}
