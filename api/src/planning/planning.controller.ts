import { Controller, Header, HttpCode, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  type CalendarRequest,
  calendarRequestSchema,
  type CalendarResponse,
  mixQuantities,
  type MixQuantity,
  mixQuantitySchema,
  type QuantitiesRequest,
  quantitiesRequestSchema,
  sowingCalendarSchema,
  type WordLocale,
} from '@homeground/shared';
import { z } from 'zod';
import { FileResponse, ZodBody, ZodResponse } from '../common/decorators/zod.decorators.js';
import { CalendarService } from './calendar.service.js';
import { MixContextService } from '../mix-context/mix-context.service.js';
import { Public } from '../common/decorators/public.decorator.js';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';

/** Quantities and the sowing calendar for any list of species (a mix, a season plan, a batch). */
@ApiTags('planning')
@Public()
@Controller()
export class PlanningController {
  constructor(
    private readonly ctx: MixContextService,
    private readonly calendar: CalendarService,
  ) {}

  @Post('quantities')
  @ZodResponse(z.array(mixQuantitySchema))
  @HttpCode(200)
  @AnswersInLanguage()
  quantities(
    @ZodBody(quantitiesRequestSchema) body: QuantitiesRequest,
    @RequestLocale() locale: WordLocale,
  ): MixQuantity[] {
    this.ctx.assertKnown(
      body.species.map((s, i) => ({ field: `species.${i}.slug`, slug: s.slug })),
      locale,
    );
    const spacingIn = Object.fromEntries(body.species.filter((s) => s.spacingIn).map((s) => [s.slug, s.spacingIn!]));
    return mixQuantities(
      body.species.map((s) => this.ctx.get(s.slug)!),
      body.areaSqFt,
      { lossFactor: body.lossFactor, spacingIn, grassShare: body.grassShare },
    );
  }

  @Post('calendar')
  @ZodResponse(sowingCalendarSchema)
  @HttpCode(200)
  @AnswersInLanguage()
  json(@ZodBody(calendarRequestSchema) body: CalendarRequest, @RequestLocale() locale: WordLocale): CalendarResponse {
    return this.calendar.build(body, locale);
  }

  @Post('calendar.csv')
  @FileResponse('text/csv', 'The calendar as CSV, one row per event')
  @HttpCode(200)
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="homeground-sowing-calendar.csv"')
  @AnswersInLanguage()
  csv(@ZodBody(calendarRequestSchema) body: CalendarRequest, @RequestLocale() locale: WordLocale): string {
    return this.calendar.toCsv(this.calendar.build(body, locale), locale);
  }

  @Post('calendar.ics')
  @FileResponse('text/calendar', 'The calendar as iCalendar (RFC 5545) all-day events')
  @HttpCode(200)
  @Header('Content-Type', 'text/calendar; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="homeground-sowing-calendar.ics"')
  @AnswersInLanguage()
  ics(@ZodBody(calendarRequestSchema) body: CalendarRequest, @RequestLocale() locale: WordLocale): string {
    return this.calendar.toIcs(this.calendar.build(body, locale), body, locale);
  }
}
