import { Controller, HttpCode, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  frostWarningAnswerSchema,
  frostWarningRequestSchema,
  slugParamSchema,
  weeklySummaryAnswerSchema,
  weeklySummaryRequestSchema,
  type FrostWarningAnswer,
  type FrostWarningRequest,
  type WeeklySummaryAnswer,
  type WeeklySummaryRequest,
  type WordLocale,
} from '@homeground/shared';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodBody, ZodParam, ZodResponse } from '../common/decorators/zod.decorators.js';
import { SeasonMailService } from './season-mail.service.js';

/** The API reads the clock; shared code never does. */
const today = () => new Date().toISOString().slice(0, 10);

/** E-mail an organiser sends to the season's growers. */
@ApiTags('batches')
@AnswersInLanguage()
@Controller('groups/:slug/season')
@Auth()
export class SeasonMailController {
  constructor(private readonly seasonMail: SeasonMailService) {}

  /** Warns every grower with batches outdoors of a frost, with what to close, cover or bring in (organisers). */
  @Post('frost-warning')
  @HttpCode(200)
  @ZodResponse(frostWarningAnswerSchema)
  frostWarning(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(frostWarningRequestSchema) body: FrostWarningRequest,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<FrostWarningAnswer> {
    return this.seasonMail.frostWarning(slug, user, body, today(), locale);
  }

  /** Sends this week's summary now to each grower who has not had it this week (organisers). */
  @Post('weekly-summary')
  @HttpCode(200)
  @ZodResponse(weeklySummaryAnswerSchema)
  weeklySummary(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(weeklySummaryRequestSchema) _body: WeeklySummaryRequest,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<WeeklySummaryAnswer> {
    return this.seasonMail.sendWeeklyNow(slug, user, today(), locale);
  }
}
