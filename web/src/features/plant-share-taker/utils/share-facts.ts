import type { Moisture, Sun, Vocabulary } from '@homeground/shared';
import { formattersFor, LOCALE_TAGS, type Locale } from '../../../lib/i18n/index.js';

/** The fact-card summary of one species on offer, as short lines (sun, soil, height, bloom). */
export interface SummaryFacts {
  sun: readonly Sun[];
  moisture: readonly Moisture[];
  heightMinCm: number;
  heightMaxCm: number;
  bloomMonths: readonly number[];
}

/** "Full sun or part shade · Dry or medium-moist soil · 1–2 ft (30–60 cm) tall · Blooms Jun–Aug", in the page's language. */
export function summaryLines(
  facts: SummaryFacts,
  words: Pick<Vocabulary, 'sunPhrase' | 'moisturePhrase' | 'bloomWords'>,
  tall: (minCm: number, maxCm: number) => string,
): string[] {
  return [
    facts.sun.length > 0 ? words.sunPhrase(facts.sun) : null,
    facts.moisture.length > 0 ? words.moisturePhrase(facts.moisture) : null,
    facts.heightMaxCm > 0 ? tall(facts.heightMinCm, facts.heightMaxCm) : null,
    words.bloomWords(facts.bloomMonths),
  ].filter((line): line is string => line !== null);
}

/**
 * "2027-06-12T09:00:00" or "09:00" → "9:00 am" (English) or "9:00 a.m." (Spanish, by Intl); a slot is
 * read in the share's own local time, so the clock digits are formatted as they are, never moved.
 */
export function clockWords(value: string, locale: Locale = 'en'): string {
  const m = /(\d{2}):(\d{2})/.exec(value.includes('T') ? value.split('T')[1] : value);
  if (!m) return value;
  const hours = Number(m[1]);
  if (locale !== 'en') {
    return new Intl.DateTimeFormat(LOCALE_TAGS[locale], { hour: 'numeric', minute: '2-digit', timeZone: 'UTC' }).format(
      new Date(Date.UTC(2000, 0, 1, hours, Number(m[2]))),
    );
  }
  const suffix = hours < 12 ? 'am' : 'pm';
  const h12 = hours % 12 === 0 ? 12 : hours % 12;
  return `${h12}:${m[2]} ${suffix}`;
}

/** A slot as "9:00 am – 9:30 am". */
export function slotWords(slot: { start: string; end: string }, locale: Locale = 'en'): string {
  return `${clockWords(slot.start, locale)} – ${clockWords(slot.end, locale)}`;
}

/** "2027-06-12" (or a date-time) → "Saturday, June 12, 2027" / "sábado, 12 de junio de 2027"; never shifted by time zone. */
export function shareDateWords(value: string, locale: Locale = 'en'): string {
  const day = value.slice(0, 10);
  if (!/^\d{4}-\d{2}-\d{2}$/.test(day)) return value;
  return formattersFor(locale).date(day, { weekday: 'long', month: 'long', day: 'numeric', year: 'numeric' });
}
