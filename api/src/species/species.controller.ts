import {
  Body, Controller, Get, Header, HttpCode, Param, Post, Put, Query, Req, Res, StreamableFile, UploadedFile, UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBody, ApiConsumes, ApiOkResponse, ApiQuery, ApiTags } from '@nestjs/swagger';
import {
  type CsvImportResult, SPECIES_SORTS, type Species, type SpeciesQuery, speciesQuerySchema, speciesSchema,
} from '@homeground/shared';
import type { Request, Response } from 'express';
import { createReadStream } from 'node:fs';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { MAX_PHOTO_BYTES, PHOTO_WIDTHS, SpeciesPhotosService } from './species-photos.service.js';
import { SpeciesStore } from './species-store.service.js';
import { SpeciesService } from './species.service.js';

/** What multer's memory storage hands over (the fields we use). */
interface UploadedBlob {
  buffer: Buffer;
  size: number;
}

const MAX_CSV_BYTES = 10 * 1024 * 1024;

@ApiTags('species')
@Controller('species')
export class SpeciesController {
  constructor(
    private readonly species: SpeciesService,
    private readonly store: SpeciesStore,
    private readonly photos: SpeciesPhotosService,
  ) {}

  /** Filtered, sorted, paged catalogue; `q` is typo-tolerant over common and scientific names and synonyms. */
  @Get()
  @ApiOkResponse({ description: '{items: SpeciesSummary[], total, page, pageSize}' })
  @ApiQuery({ name: 'q', required: false, description: 'typo-tolerant search over common and scientific names and synonyms', example: 'buterfly weed' })
  @ApiQuery({ name: 'state', required: false, description: 'USPS code: native to this state (USDA PLANTS)', example: 'WI' })
  @ApiQuery({ name: 'ecoregion', required: false, description: 'EPA Level III code: native to a state it spans and at home in its plant communities', example: '52' })
  @ApiQuery({ name: 'sun', required: false, enum: ['full', 'part', 'shade'] })
  @ApiQuery({ name: 'moisture', required: false, enum: ['dry', 'medium', 'wet'] })
  @ApiQuery({ name: 'bloomMonth', required: false, description: '1–12' })
  @ApiQuery({ name: 'growthForm', required: false, enum: ['forb', 'graminoid', 'fern', 'shrub', 'vine', 'tree'] })
  @ApiQuery({ name: 'minHeightCm', required: false })
  @ApiQuery({ name: 'maxHeightCm', required: false })
  @ApiQuery({ name: 'monarchHost', required: false, enum: ['true', 'false'] })
  @ApiQuery({ name: 'page', required: false, example: 1 })
  @ApiQuery({ name: 'pageSize', required: false, example: 24, description: '1–200' })
  @ApiQuery({ name: 'sort', required: false, enum: SPECIES_SORTS })
  @ApiQuery({ name: 'order', required: false, enum: ['asc', 'desc'] })
  list(@Query(new ZodValidationPipe(speciesQuerySchema)) query: SpeciesQuery, @Req() req: Request, @Res() res: Response): void {
    // Remembered as bytes under this URL: repeats are answered by species-list-cache.middleware,
    // since the list is read far more often than edited.
    const body = JSON.stringify(this.store.list(query));
    this.store.rememberForUrl(req.originalUrl, body);
    res.type('application/json').send(body);
  }

  @Get('export.csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="homeground-species.csv"')
  exportCsv(): string {
    return this.species.exportCsv();
  }

  @Get(':slug')
  get(@Param('slug') slug: string): Species & { hasPhoto: boolean } {
    return { ...this.species.get(slug), hasPhoto: this.store.hasPhoto(slug) };
  }

  @Post()
  @Auth('curator')
  create(@Body(new ZodValidationPipe(speciesSchema)) record: Species, @CurrentUser() user: AuthenticatedUser): Promise<Species> {
    return this.species.create(record, user.id);
  }

  @Put(':slug')
  @Auth('curator')
  replace(
    @Param('slug') slug: string,
    @Body(new ZodValidationPipe(speciesSchema)) record: Species,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<Species> {
    return this.species.replace(slug, record, user.id);
  }

  /** CSV with the export's columns; all-or-nothing, bad rows listed with line numbers. */
  @Post('import')
  @HttpCode(200)
  @Auth('curator')
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' } } } })
  @UseInterceptors(FileInterceptor('file', { limits: { fileSize: MAX_CSV_BYTES, files: 1 } }))
  importCsv(@UploadedFile() file: UploadedBlob | undefined, @CurrentUser() user: AuthenticatedUser): Promise<CsvImportResult> {
    return this.species.importCsv(file?.buffer.toString('utf8') ?? '', user.id);
  }

  @Post(':slug/photo')
  @Auth('curator')
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { photo: { type: 'string', format: 'binary' } } } })
  @UseInterceptors(FileInterceptor('photo', { limits: { fileSize: MAX_PHOTO_BYTES, files: 1 } }))
  async uploadPhoto(@Param('slug') slug: string, @UploadedFile() file: UploadedBlob | undefined, @CurrentUser() user: AuthenticatedUser) {
    const p = await this.photos.save(slug, file?.buffer, user.id);
    return { slug: p.slug, mime: p.mime, bytes: p.bytes, width: p.width, height: p.height };
  }

  @Get(':slug/photo')
  @ApiQuery({ name: 'w', required: false, enum: [...PHOTO_WIDTHS] })
  async photo(@Param('slug') slug: string, @Query('w') w: string | undefined, @Res({ passthrough: true }) res: Response): Promise<StreamableFile> {
    const width = PHOTO_WIDTHS.find((x) => String(x) === w);
    const file = await this.photos.file(slug, width);
    res.setHeader('Cache-Control', 'public, max-age=3600');
    return new StreamableFile(createReadStream(file.path), { type: file.mime });
  }
}

