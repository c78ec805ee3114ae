import { Controller, Get, Header, HttpCode, Post, Put } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  type Season,
  type SeasonRequest,
  seasonRequestSchema,
  type ShareList,
  type ShareListRequest,
  shareListRequestSchema,
  slugParamSchema,
  type TargetsRequest,
  targetsRequestSchema,
  seasonSchema,
  shareListSchema,
  seasonSeedListSchema,
  type WordLocale,
} from '@homeground/shared';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import { FileResponse, ZodBody, ZodParam, ZodResponse } from '../common/decorators/zod.decorators.js';
import { type SeasonSeedList, SeasonsService } from './seasons.service.js';

/**
 * A group's season plan: dates, share list, targets and seed list. Bodies and params are validated
 * with the shared zod schemas, one pipe per body/param, so a change of validation mechanism is mechanical.
 */
@ApiTags('seasons')
@AnswersInLanguage()
@Controller('groups/:slug/season')
@Auth()
export class SeasonsController {
  constructor(private readonly seasons: SeasonsService) {}

  @Get()
  @ZodResponse(seasonSchema)
  get(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<Season> {
    return this.seasons.get(slug, user, locale);
  }

  @Put()
  @ZodResponse(seasonSchema)
  put(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(seasonRequestSchema) body: SeasonRequest,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<Season> {
    // The API reads the clock; shared code never does.
    return this.seasons.put(slug, user, body, new Date().toISOString().slice(0, 10), locale);
  }

  /** Proposes species for the season with why; writes nothing. */
  @Post('share-list/propose')
  @HttpCode(200)
  @ZodResponse(shareListSchema)
  propose(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(shareListRequestSchema) body: ShareListRequest,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<ShareList> {
    return this.seasons.propose(slug, user, body, locale);
  }

  /** Replaces the whole target list. */
  @Put('targets')
  @ZodResponse(seasonSchema)
  setTargets(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(targetsRequestSchema) body: TargetsRequest,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<Season> {
    return this.seasons.setTargets(slug, user, body, locale);
  }

  @Get('seed-list')
  @AnswersInLanguage()
  @ZodResponse(seasonSeedListSchema)
  seedList(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<SeasonSeedList> {
    return this.seasons.seedList(slug, user, locale);
  }

  @Get('seed-list.csv')
  @FileResponse('text/csv', 'The seed list as CSV')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="homeground-seed-list.csv"')
  seedListCsv(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<string> {
    return this.seasons.seedListCsv(slug, user, locale);
  }
}
