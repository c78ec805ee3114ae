import { useMemo } from 'react';
import { LOCALE_TAGS, type Locale } from './locales.js';
import { useLocale } from './use-locale.js';

/** Numbers and dates in a language's own way: "1,250.5" / "1250,5", "June 13, 2026" / "13 de junio de 2026". */
export interface Formatters {
  locale: Locale;
  number(value: number, options?: Intl.NumberFormatOptions): string;
  /** A calendar date stored as "YYYY-MM-DD", read as that day wherever the browser is. */
  date(isoDate: string, options?: Intl.DateTimeFormatOptions): string;
  /** An instant (ISO timestamp) as a date and time in the browser's time zone: "Dec 2, 2026, 10:15 PM". */
  moment(isoInstant: string): string;
}

export function formattersFor(locale: Locale): Formatters {
  const tag = LOCALE_TAGS[locale];
  return {
    locale,
    number: (value, options) => new Intl.NumberFormat(tag, options).format(value),
    date: (isoDate, options = { dateStyle: 'long' }) =>
      // Read at noon UTC and shown in UTC so no time zone moves the day.
      new Intl.DateTimeFormat(tag, { timeZone: 'UTC', ...options }).format(new Date(`${isoDate}T12:00:00Z`)),
    moment: (isoInstant) =>
      new Intl.DateTimeFormat(tag, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(isoInstant)),
  };
}

/** The formatters of the page's language. */
export function useFormatters(): Formatters {
  const { locale } = useLocale();
  return useMemo(() => formattersFor(locale), [locale]);
}
