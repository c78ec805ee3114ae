import { Body, Controller, Get, Header, HttpCode, Param, Post, Put } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  type Season, type SeasonRequest, seasonRequestSchema, type ShareList, type ShareListRequest, shareListRequestSchema,
  slugSchema, type TargetsRequest, targetsRequestSchema,
} from '@homeground/shared';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { type SeasonSeedList, SeasonsService } from './seasons.service.js';

/**
 * A group's season plan: dates, share list, targets and seed list. Bodies and params are validated
 * with the shared zod schemas, one pipe per body/param, so a change of validation mechanism is mechanical.
 */
@ApiTags('seasons')
@Controller('groups/:slug/season')
@Auth()
export class SeasonsController {
  constructor(private readonly seasons: SeasonsService) {}

  @Get()
  get(@Param('slug', new ZodValidationPipe(slugSchema)) slug: string, @CurrentUser() user: AuthenticatedUser): Promise<Season> {
    return this.seasons.get(slug, user);
  }

  @Put()
  put(
    @Param('slug', new ZodValidationPipe(slugSchema)) slug: string,
    @Body(new ZodValidationPipe(seasonRequestSchema)) body: SeasonRequest,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<Season> {
    // The API reads the clock; shared code never does.
    return this.seasons.put(slug, user, body, new Date().toISOString().slice(0, 10));
  }

  /** Proposes species for the season with why; writes nothing. */
  @Post('share-list/propose')
  @HttpCode(200)
  propose(
    @Param('slug', new ZodValidationPipe(slugSchema)) slug: string,
    @Body(new ZodValidationPipe(shareListRequestSchema)) body: ShareListRequest,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<ShareList> {
    return this.seasons.propose(slug, user, body);
  }

  /** Replaces the whole target list. */
  @Put('targets')
  setTargets(
    @Param('slug', new ZodValidationPipe(slugSchema)) slug: string,
    @Body(new ZodValidationPipe(targetsRequestSchema)) body: TargetsRequest,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<Season> {
    return this.seasons.setTargets(slug, user, body);
  }

  @Get('seed-list')
  seedList(@Param('slug', new ZodValidationPipe(slugSchema)) slug: string, @CurrentUser() user: AuthenticatedUser): Promise<SeasonSeedList> {
    return this.seasons.seedList(slug, user);
  }

  @Get('seed-list.csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="homeground-seed-list.csv"')
  seedListCsv(@Param('slug', new ZodValidationPipe(slugSchema)) slug: string, @CurrentUser() user: AuthenticatedUser): Promise<string> {
    return this.seasons.seedListCsv(slug, user);
  }
}
