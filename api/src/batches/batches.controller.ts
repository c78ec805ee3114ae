import { Controller, Get, Header, HttpCode, Post, Put } from '@nestjs/common';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import { ApiTags } from '@nestjs/swagger';
import {
  batchSchema,
  batchSplitProposalSchema,
  batchSplitRequestSchema,
  growerSetupRequestSchema,
  logEntryAnswerSchema,
  logEntryRequestSchema,
  seasonBatchesSchema,
  seasonGrowerListSchema,
  seasonGrowerSchema,
  seasonProgressSchema,
  slugParamSchema,
  splitProposalRequestSchema,
  type SplitProposalRequest,
  uuidParamSchema,
  type Batch,
  type BatchSplitProposalAnswer,
  type BatchSplitRequest,
  type GrowerSetupRequest,
  type LogEntryAnswer,
  type LogEntryRequest,
  type SeasonBatches,
  type SeasonGrower,
  type SeasonProgress,
  type WordLocale,
} from '@homeground/shared';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { FileResponse, ZodBody, ZodParam, ZodResponse } from '../common/decorators/zod.decorators.js';
import { BatchesService } from './batches.service.js';

/** The API reads the clock; shared code never does. */
const today = () => new Date().toISOString().slice(0, 10);

/**
 * Growers, batches, batch logs and progress of a group's newest season. Organisers split the
 * targets and watch progress; each grower states their methods and logs their own batches.
 */
@ApiTags('batches')
@AnswersInLanguage()
@Controller('groups/:slug/season')
@Auth()
export class BatchesController {
  constructor(private readonly batches: BatchesService) {}

  /** Organisers: every grower with methods and capacity; a grower: themself. */
  @Get('growers')
  @ZodResponse(seasonGrowerListSchema)
  growers(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<SeasonGrower[]> {
    return this.batches.growers(slug, user, locale);
  }

  /** A grower's methods and capacity (the grower themself, or an organiser). */
  @Put('growers/:userId')
  @ZodResponse(seasonGrowerSchema)
  setGrower(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodParam('userId', uuidParamSchema) userId: string,
    @ZodBody(growerSetupRequestSchema) body: GrowerSetupRequest,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<SeasonGrower> {
    return this.batches.setGrower(slug, user, userId, body, locale);
  }

  /** Proposes a split of the targets into batches by method and capacity; writes nothing. */
  @Post('batches/propose')
  @HttpCode(200)
  @ZodResponse(batchSplitProposalSchema)
  propose(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(splitProposalRequestSchema) body: SplitProposalRequest,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<BatchSplitProposalAnswer> {
    return this.batches.propose(slug, user, body, locale);
  }

  /** Replaces the split (organisers). */
  @Put('batches')
  @ZodResponse(seasonBatchesSchema)
  setSplit(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(batchSplitRequestSchema) body: BatchSplitRequest,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<SeasonBatches> {
    return this.batches.setSplit(slug, user, body, today(), locale);
  }

  /** Batches with dates, logs and supplies: all for organisers, their own for a grower. */
  @Get('batches')
  @AnswersInLanguage()
  @ZodResponse(seasonBatchesSchema)
  list(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<SeasonBatches> {
    return this.batches.list(slug, user, today(), locale);
  }

  /** The caller's own batches as an iCalendar file, each step an all-day event. */
  @Get('my-batches.ics')
  @FileResponse('text/calendar', "The caller's batches as iCalendar")
  @Header('Content-Type', 'text/calendar; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="homeground-my-batches.ics"')
  @AnswersInLanguage()
  myBatchesIcs(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<string> {
    return this.batches.myBatchesIcs(slug, user, today(), locale);
  }

  @Get('batches/:id')
  @AnswersInLanguage()
  @ZodResponse(batchSchema)
  get(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodParam('id', uuidParamSchema) id: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<Batch> {
    return this.batches.get(slug, user, id, today(), locale);
  }

  /**
   * Adds an entry to the batch log (the batch's grower only); answers the entry as stored and the
   * batch's totals after it (GET the batch for its dates and forecast).
   */
  @Post('batches/:id/log')
  @ZodResponse(logEntryAnswerSchema, 201)
  log(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodParam('id', uuidParamSchema) id: string,
    @ZodBody(logEntryRequestSchema) body: LogEntryRequest,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<LogEntryAnswer> {
    return this.batches.log(slug, user, id, body, today(), locale);
  }

  /** Targets against sown, up and ready per species and grower, with the ready forecast (organisers). */
  @Get('progress')
  @AnswersInLanguage()
  @ZodResponse(seasonProgressSchema)
  progress(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<SeasonProgress> {
    return this.batches.progress(slug, user, today(), locale);
  }
}
