import { cmToInches, squareFeetToSquareMetres } from '@homeground/shared';
import { useMemo } from 'react';
import { LOCALE_TAGS, type Locale } from './locales.js';
import { useLocale } from './use-locale.js';

/** Numbers and dates in a language's own way: by `Intl` with the locale's tag (en-US, es-US), "June 13, 2026" / "13 de junio de 2026". */
export interface Formatters {
  locale: Locale;
  number(value: number, options?: Intl.NumberFormatOptions): string;
  /** A calendar date stored as "YYYY-MM-DD", read as that day wherever the browser is. */
  date(isoDate: string, options?: Intl.DateTimeFormatOptions): string;
  /** An instant (ISO timestamp) as a date and time in the browser's time zone: "Dec 2, 2026, 10:15 PM". */
  moment(isoInstant: string): string;
  /** "500 ft² (46.5 m²)", US first and metric in brackets as the voice guide asks. */
  area(areaSqFt: number): string;
  /** One length: inches under 90 cm, feet to 3 m, then feet and metres. */
  height(cm: number): string;
  /** A height or spread range in the same units as `height`: "1.5–3 ft (46–91 cm)". */
  heightRange(minCm: number, maxCm: number): string;
  /** A planting distance: "18 in (46 cm)". */
  spacing(inches: number): string;
}

export function formattersFor(locale: Locale): Formatters {
  const tag = LOCALE_TAGS[locale];
  const number = (value: number, options?: Intl.NumberFormatOptions) =>
    new Intl.NumberFormat(tag, options).format(value);
  // At most `decimals` places, none shown when the value is whole (as the shared English formatters round).
  const n = (value: number, decimals: number) => number(value, { maximumFractionDigits: decimals });
  const ft = (cm: number) => cmToInches(cm) / 12;
  return {
    locale,
    number,
    date: (isoDate, options = { dateStyle: 'long' }) =>
      // Read at noon UTC and shown in UTC so no time zone moves the day.
      new Intl.DateTimeFormat(tag, { timeZone: 'UTC', ...options }).format(new Date(`${isoDate}T12:00:00Z`)),
    moment: (isoInstant) =>
      new Intl.DateTimeFormat(tag, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(isoInstant)),
    area: (sqFt) => `${n(sqFt, 0)} ft² (${n(squareFeetToSquareMetres(sqFt), 1)} m²)`,
    height: (cm) => {
      if (cm < 90) return `${n(cmToInches(cm), 0)} in (${n(cm, 0)} cm)`;
      if (cm < 300) return `${n(ft(cm), 1)} ft (${n(cm, 0)} cm)`;
      return `${n(ft(cm), 0)} ft (${n(cm / 100, 1)} m)`;
    },
    heightRange: (min, max) => {
      if (max < 90) return `${n(cmToInches(min), 0)}–${n(cmToInches(max), 0)} in (${n(min, 0)}–${n(max, 0)} cm)`;
      if (max < 300) return `${n(ft(min), 1)}–${n(ft(max), 1)} ft (${n(min, 0)}–${n(max, 0)} cm)`;
      return `${n(ft(min), 0)}–${n(ft(max), 0)} ft (${n(min / 100, 1)}–${n(max / 100, 1)} m)`;
    },
    spacing: (inches) => `${n(inches, 0)} in (${n(inches * 2.54, 0)} cm)`,
  };
}

/** The formatters of the page's language. */
export function useFormatters(): Formatters {
  const { locale } = useLocale();
  return useMemo(() => formattersFor(locale), [locale]);
}
