import { Body, Controller, Header, HttpCode, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { type CalendarResponse, type MixQuantity, mixQuantities } from '@homeground/shared';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { CalendarService } from './calendar.service.js';
import { type CalendarRequest, calendarRequestSchema } from './dto/calendar-request.js';
import { type QuantitiesRequest, quantitiesRequestSchema } from './dto/quantities-request.js';
import { MixContextService } from '../mix-context/mix-context.service.js';

/** Quantities and the sowing calendar for any list of species (a mix, a season plan, a batch). */
@ApiTags('planning')
@Controller()
export class PlanningController {
  constructor(
    private readonly ctx: MixContextService,
    private readonly calendar: CalendarService,
  ) {}

  @Post('quantities')
  @HttpCode(200)
  quantities(@Body(new ZodValidationPipe(quantitiesRequestSchema)) body: QuantitiesRequest): MixQuantity[] {
    this.ctx.assertKnown(body.species.map((s, i) => ({ field: `species.${i}.slug`, slug: s.slug })));
    const spacingIn = Object.fromEntries(body.species.filter((s) => s.spacingIn).map((s) => [s.slug, s.spacingIn!]));
    return mixQuantities(body.species.map((s) => this.ctx.get(s.slug)!), body.areaSqFt, { lossFactor: body.lossFactor, spacingIn, grassShare: body.grassShare });
  }

  @Post('calendar')
  @HttpCode(200)
  json(@Body(new ZodValidationPipe(calendarRequestSchema)) body: CalendarRequest): CalendarResponse {
    return this.calendar.build(body);
  }

  @Post('calendar.csv')
  @HttpCode(200)
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="homeground-sowing-calendar.csv"')
  csv(@Body(new ZodValidationPipe(calendarRequestSchema)) body: CalendarRequest): string {
    return this.calendar.toCsv(this.calendar.build(body));
  }

  @Post('calendar.ics')
  @HttpCode(200)
  @Header('Content-Type', 'text/calendar; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="homeground-sowing-calendar.ics"')
  ics(@Body(new ZodValidationPipe(calendarRequestSchema)) body: CalendarRequest): string {
    return this.calendar.toIcs(this.calendar.build(body));
  }
}
