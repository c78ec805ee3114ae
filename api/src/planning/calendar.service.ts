import { Injectable } from '@nestjs/common';
import { buildSowingCalendar, addDays, type SowingCalendar } from '@homeground/shared';
import { createEvents, type EventAttributes } from 'ics';
import Papa from 'papaparse';
import type { CalendarRequest } from './dto/calendar-request.js';
import { MixContextService } from '../mix-context/mix-context.service.js';

const toParts = (iso: string) => iso.split('-').map(Number) as [number, number, number];

/** The sowing calendar as JSON, CSV or iCalendar (RFC 5545, through the `ics` package). */
@Injectable()
export class CalendarService {
  constructor(private readonly ctx: MixContextService) {}

  build(req: CalendarRequest): SowingCalendar {
    this.ctx.assertKnown(req.plans.map((p, i) => ({ field: `plans.${i}.slug`, slug: p.slug })));
    // The API reads the clock; the shared calendar never does.
    const today = req.today ?? new Date().toISOString().slice(0, 10);
    return buildSowingCalendar({
      lastFrost: req.lastFrost,
      targetDate: req.targetDate,
      today,
      plans: req.plans.map((p) => ({ species: this.ctx.get(p.slug)!, method: p.method, sowDate: p.sowDate })),
    });
  }

  toCsv(calendar: SowingCalendar): string {
    const name = (slug: string | null) => (slug ? this.ctx.get(slug)?.commonNames[0] ?? slug : '');
    return Papa.unparse(
      {
        fields: ['date', 'species', 'scientificName', 'kind', 'title', 'detail'],
        data: calendar.events.map((e) => [e.date, name(e.speciesSlug), e.speciesSlug ? this.ctx.get(e.speciesSlug)?.scientificName ?? '' : '', e.kind, e.title, e.detail]),
      },
      { newline: '\r\n' },
    );
  }

  /** All-day events (DTSTART;VALUE=DATE with DTEND the next day); UIDs are stable for the same plan. */
  toIcs(calendar: SowingCalendar): string {
    const events: EventAttributes[] = calendar.events.map((e, i) => ({
      uid: `${e.date}-${e.kind}-${e.speciesSlug ?? 'all'}-${i}@homeground`,
      start: toParts(e.date),
      end: toParts(addDays(e.date, 1)),
      title: e.title,
      description: e.detail,
      categories: ['Homeground', e.kind],
    }));
    const { error, value } = createEvents(events, { productId: '-//Homeground//Sowing calendar//EN', calName: 'Homeground sowing calendar' });
    if (error || !value) throw error ?? new Error('could not write the calendar');
    return value;
  }
}
