import { Controller, Delete, Get, HttpCode, Post } from '@nestjs/common';
import { ApiNoContentResponse, ApiTags } from '@nestjs/swagger';
import {
  boundaryImportResultSchema,
  type Ecoregion,
  ecoregionCodeParamSchema,
  type EcoregionOutline,
  ecoregionOutlineSchema,
  type EcoregionListQuery,
  ecoregionListQuerySchema,
  ecoregionListSchema,
  ecoregionSchema,
  type WordLocale,
} from '@homeground/shared';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { type UploadedBlob, ZodFile, ZodParam, ZodQuery, ZodResponse } from '../common/decorators/zod.decorators.js';
import { EcoregionsService, type BoundaryImportResult } from './ecoregions.service.js';
import { Public } from '../common/decorators/public.decorator.js';

/** The EPA's own file is about 4.5 MB simplified and 25 MB at full resolution. */
const MAX_BOUNDARY_BYTES = 40 * 1024 * 1024;

@ApiTags('ecoregions')
@Controller('ecoregions')
export class EcoregionsController {
  constructor(private readonly ecoregions: EcoregionsService) {}

  @Public()
  @Get()
  @ZodResponse(ecoregionListSchema)
  list(@ZodQuery(ecoregionListQuerySchema) query: EcoregionListQuery): Ecoregion[] {
    return this.ecoregions.list(query.state);
  }

  @Public()
  @Get(':code')
  @ZodResponse(ecoregionSchema)
  @AnswersInLanguage()
  get(@ZodParam('code', ecoregionCodeParamSchema) code: string, @RequestLocale() locale: WordLocale): Ecoregion {
    return this.ecoregions.get(code, locale);
  }

  /** The region's EPA outline for the map, simplified; null until an admin has imported the boundaries. */
  @Public()
  @Get(':code/outline')
  @ZodResponse(ecoregionOutlineSchema)
  @AnswersInLanguage()
  outline(
    @ZodParam('code', ecoregionCodeParamSchema) code: string,
    @RequestLocale() locale: WordLocale,
  ): EcoregionOutline {
    return this.ecoregions.outline(code, locale);
  }

  /** Admins import EPA Level III polygons (GeoJSON FeatureCollection with US_L3CODE / US_L3NAME) for exact lookups. */
  @Post('boundaries')
  @ZodResponse(boundaryImportResultSchema)
  @HttpCode(200)
  @Auth('admin')
  importBoundaries(
    @ZodFile('file', MAX_BOUNDARY_BYTES, 'GeoJSON FeatureCollection with US_L3CODE and US_L3NAME properties')
    file: UploadedBlob,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<BoundaryImportResult> {
    return this.ecoregions.importBoundaries(file.buffer.toString('utf8'), user.id, locale);
  }

  @Delete('boundaries')
  @ApiNoContentResponse({ description: 'All boundary polygons removed' })
  @HttpCode(204)
  @Auth('admin')
  clearBoundaries(): Promise<void> {
    return this.ecoregions.clearBoundaries();
  }
}
