import { formattersFor, LOCALE_TAGS, type Locale } from '../../../lib/i18n/index.js';

/**
 * A slot's clock time on the share's date as the API wants it: a moment with its UTC offset
 * ("2027-06-12T09:00:00-05:00"). The offset is the organiser's own browser's for that date, which is
 * the share's when they plan it where it happens; the offset keeps the slot the same on every server.
 */
export function slotTime(date: string, clock: string): string | null {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date) || !/^\d{2}:\d{2}$/.test(clock)) return null;
  const local = new Date(`${date}T${clock}:00`);
  if (Number.isNaN(local.getTime())) return null;
  const minutes = -local.getTimezoneOffset();
  const sign = minutes >= 0 ? '+' : '-';
  const pad = (n: number) => String(Math.floor(Math.abs(n))).padStart(2, '0');
  return `${date}T${clock}:00${sign}${pad(minutes / 60)}:${pad(minutes % 60)}`;
}

/**
 * "2027-06-12T09:00:00-05:00" → "9:00 am" (English) or "9:00 a.m." (Spanish, by Intl): the clock the
 * organiser wrote, not the reader's zone, so the digits are formatted as they are, never moved.
 */
export function clockWords(value: string, locale: Locale = 'en'): string {
  const m = /T(\d{2}):(\d{2})/.exec(value) ?? /^(\d{2}):(\d{2})/.exec(value);
  if (!m) return value;
  const hours = Number(m[1]);
  if (locale !== 'en') {
    return new Intl.DateTimeFormat(LOCALE_TAGS[locale], { hour: 'numeric', minute: '2-digit', timeZone: 'UTC' }).format(
      new Date(Date.UTC(2000, 0, 1, hours, Number(m[2]))),
    );
  }
  const h12 = hours % 12 === 0 ? 12 : hours % 12;
  return `${h12}:${m[2]} ${hours < 12 ? 'am' : 'pm'}`;
}

export function slotWords(slot: { start: string; end: string }, locale: Locale = 'en'): string {
  return `${clockWords(slot.start, locale)} – ${clockWords(slot.end, locale)}`;
}

/** "2027-06-12" → "Saturday, June 12, 2027" / "sábado, 12 de junio de 2027"; never shifted by time zone. */
export function shareDateWords(day: string, locale: Locale = 'en'): string {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(day)) return day;
  return formattersFor(locale).date(day, { weekday: 'long', month: 'long', day: 'numeric', year: 'numeric' });
}
