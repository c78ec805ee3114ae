import { Injectable } from '@nestjs/common';
import {
  buildSowingCalendar,
  calendarIn,
  calendarToCsv,
  calendarToIcs,
  type SowingCalendar,
  type WordLocale,
} from '@homeground/shared';
import type { CalendarRequest } from './dto/calendar-request.js';
import { MixContextService } from '../mix-context/mix-context.service.js';

/** The sowing calendar as JSON, CSV or iCalendar (RFC 5545); the writers are pure shared functions. */
@Injectable()
export class CalendarService {
  constructor(private readonly ctx: MixContextService) {}

  build(req: CalendarRequest, locale: WordLocale = 'en'): SowingCalendar {
    this.ctx.assertKnown(
      req.plans.map((p, i) => ({ field: `plans.${i}.slug`, slug: p.slug })),
      locale,
    );
    const today = this.today(req);
    return buildSowingCalendar({
      lastFrost: req.lastFrost,
      targetDate: req.targetDate,
      today,
      plans: req.plans.map((p) => ({ species: this.ctx.get(p.slug)!, method: p.method, sowDate: p.sowDate })),
    });
  }

  /** One row per event and warning; header, step titles, details and warnings in the reader's language. */
  toCsv(calendar: SowingCalendar, locale: WordLocale = 'en'): string {
    const words = calendarIn(calendar, locale, (slug) => this.ctx.get(slug));
    return calendarToCsv(
      words,
      (slug) => {
        const s = this.ctx.get(slug);
        return s && { commonName: s.commonNames[0], scientificName: s.scientificName };
      },
      locale,
    );
  }

  /**
   * All-day events in the reader's language; UIDs come from plan id, species, method and kind, so
   * they survive added species (and a change of language).
   */
  toIcs(calendar: SowingCalendar, req: CalendarRequest, locale: WordLocale = 'en'): string {
    const words = calendarIn(calendar, locale, (slug) => this.ctx.get(slug));
    return calendarToIcs(words, { today: this.today(req), planId: req.planId, locale });
  }

  // The API reads the clock; the shared calendar never does.
  private today(req: CalendarRequest): string {
    return req.today ?? new Date().toISOString().slice(0, 10);
  }
}
