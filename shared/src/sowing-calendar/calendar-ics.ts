import { addDays } from './calendar-date.js';
import type { CalendarEvent, SowingCalendar } from './calendar-types.js';
import { uidsFor } from './event-uid.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';

/** Options for writing a calendar as iCalendar. */
export interface IcsOptions {
  /** Today (YYYY-MM-DD), written as DTSTAMP; passed in so the same calendar gives the same file. */
  today: string;
  /** The plan id that goes into every UID (see `uidsFor`). */
  planId?: string;
  /** The language of the file's own words (its name, "Please note"); events come already in it. */
  locale?: WordLocale;
}

/** The file's own words, by language. */
const ICS_WORDS: Record<WordLocale, { name: string; note: string }> = {
  en: { name: 'Homeground sowing calendar', note: 'Please note:' },
  es: { name: 'Calendario de siembra de Homeground', note: 'Ten en cuenta:' },
};

const encoder = new TextEncoder();

/**
 * Fold one content line at 75 octets (RFC 5545 §3.1): continuation lines start with a space, and a
 * line is never cut inside a UTF-8 sequence, so "°C" or "–" survive.
 */
export function foldLine(line: string): string {
  const parts: string[] = [];
  let current = '';
  let octets = 0;
  let limit = 75;
  for (const ch of line) {
    const size = encoder.encode(ch).length;
    if (octets + size > limit) {
      parts.push(current);
      current = '';
      octets = 0;
      limit = 74; // the leading space of a continuation line counts
    }
    current += ch;
    octets += size;
  }
  parts.push(current);
  return parts.join('\r\n ');
}

/** TEXT value escaping (RFC 5545 §3.3.11): backslash, semicolon, comma and newlines. */
export function escapeText(text: string): string {
  return text.replace(/\\/g, '\\\\').replace(/;/g, '\\;').replace(/,/g, '\\,').replace(/\r?\n/g, '\\n');
}

const dateValue = (iso: string) => iso.replace(/-/g, '');

/** The warnings of an event's species and method, so they travel with the events they concern. */
function warningsFor(calendar: SowingCalendar, e: CalendarEvent): string[] {
  if (!e.speciesSlug) return [];
  return calendar.warnings
    .filter((w) => w.speciesSlug === e.speciesSlug && (!w.method || !e.method || w.method === e.method))
    .map((w) => w.message);
}

/**
 * The calendar as an iCalendar file (RFC 5545): one all-day VEVENT per event (DTEND the next day),
 * each with a UID that stays the same when other species are added or removed, and each species'
 * warnings in the DESCRIPTION of its events under "Please note". Lines end in CRLF, folded at 75 octets.
 */
export function calendarToIcs(calendar: SowingCalendar, options: IcsOptions): string {
  const uids = uidsFor(calendar.events, options.planId);
  const stamp = `${dateValue(options.today)}T000000Z`;
  const words = ICS_WORDS[options.locale ?? 'en'];
  const lines = [
    'BEGIN:VCALENDAR',
    'VERSION:2.0',
    'PRODID:-//Homeground//Sowing calendar//EN',
    'CALSCALE:GREGORIAN',
    'METHOD:PUBLISH',
    `X-WR-CALNAME:${escapeText(words.name)}`,
  ];
  calendar.events.forEach((e, i) => {
    const notes = warningsFor(calendar, e);
    const description =
      notes.length > 0 ? `${e.detail}\n\n${words.note}\n${notes.map((n) => `- ${n}`).join('\n')}` : e.detail;
    lines.push(
      'BEGIN:VEVENT',
      `UID:${uids[i]}`,
      `DTSTAMP:${stamp}`,
      `DTSTART;VALUE=DATE:${dateValue(e.date)}`,
      `DTEND;VALUE=DATE:${dateValue(addDays(e.date, 1))}`,
      `SUMMARY:${escapeText(e.title)}`,
      `DESCRIPTION:${escapeText(description)}`,
      `CATEGORIES:Homeground,${escapeText(e.kind)}`,
      'TRANSP:TRANSPARENT',
      'END:VEVENT',
    );
  });
  lines.push('END:VCALENDAR');
  return `${lines.map(foldLine).join('\r\n')}\r\n`;
}
