import { BadRequestException, Controller, Delete, Get, HttpCode, Param, Post, Query, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBody, ApiConsumes, ApiQuery, ApiTags } from '@nestjs/swagger';
import { type Ecoregion, stateCodeSchema } from '@homeground/shared';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { EcoregionsService, type BoundaryImportResult } from './ecoregions.service.js';

/** The EPA's own file is about 4.5 MB simplified and 25 MB at full resolution. */
const MAX_BOUNDARY_BYTES = 40 * 1024 * 1024;

@ApiTags('ecoregions')
@Controller('ecoregions')
export class EcoregionsController {
  constructor(private readonly ecoregions: EcoregionsService) {}

  @Get()
  @ApiQuery({ name: 'state', required: false, description: 'USPS code: only regions that reach into this state' })
  list(@Query('state') state?: string): Ecoregion[] {
    if (state !== undefined && !stateCodeSchema.safeParse(state).success) {
      throw new BadRequestException({ message: 'state must be a USPS code of the 48 states or DC', fields: [{ field: 'state', message: 'must be a USPS code of the 48 states or DC' }] });
    }
    return this.ecoregions.list(state);
  }

  @Get(':code')
  get(@Param('code') code: string): Ecoregion {
    return this.ecoregions.get(code);
  }

  /** Admins import EPA Level III polygons (GeoJSON FeatureCollection with US_L3CODE / US_L3NAME) for exact lookups. */
  @Post('boundaries')
  @HttpCode(200)
  @Auth('admin')
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' } } } })
  @UseInterceptors(FileInterceptor('file', { limits: { fileSize: MAX_BOUNDARY_BYTES, files: 1 } }))
  importBoundaries(@UploadedFile() file: { buffer: Buffer } | undefined, @CurrentUser() user: AuthenticatedUser): Promise<BoundaryImportResult> {
    if (!file) throw new BadRequestException({ message: 'Attach the GeoJSON in the "file" field.', fields: [{ field: 'file', message: 'is required' }] });
    return this.ecoregions.importBoundaries(file.buffer.toString('utf8'), user.id);
  }

  @Delete('boundaries')
  @HttpCode(204)
  @Auth('admin')
  clearBoundaries(): Promise<void> {
    return this.ecoregions.clearBoundaries();
  }
}
