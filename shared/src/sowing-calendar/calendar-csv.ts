import { csvField } from '../csv/csv-cell.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import type { SowingCalendar } from './calendar-types.js';

/** Names shown in the CSV for a species slug. */
export interface CsvNames {
  commonName: string;
  scientificName: string;
}

/**
 * The file's own words by language: the header row (same six columns, same order) and the title
 * of a warning row. Kinds ("sow", "warning:<kind>") and methods stay codes in every language, so a
 * spreadsheet can filter on them whichever language the file was asked in.
 */
const CSV_WORDS: Record<WordLocale, { header: readonly string[]; note: string }> = {
  en: { header: ['date', 'species', 'scientificName', 'kind', 'title', 'detail'], note: 'Please note' },
  es: { header: ['fecha', 'especie', 'nombre científico', 'tipo', 'título', 'detalle'], note: 'Ten en cuenta' },
};

/**
 * The calendar as CSV (RFC 4180, CRLF): one row per event in date order, then one row per warning
 * (kind "warning:<kind>", dated on its schedule's sowing day, the method in its title), so a
 * spreadsheet keeps every caution. The English columns are unchanged from the first CSV export;
 * `locale` words the header and warning titles (events come already in it, see `calendarIn`).
 * `names` maps a species slug to the names to show; an unknown slug shows the slug.
 */
export function calendarToCsv(
  calendar: SowingCalendar,
  names: (slug: string) => CsvNames | undefined,
  locale: WordLocale = 'en',
): string {
  const words = CSV_WORDS[locale];
  const nameCells = (slug: string | null) => {
    if (!slug) return ['', ''];
    const n = names(slug);
    return [n?.commonName ?? slug, n?.scientificName ?? ''];
  };
  const rows: string[][] = calendar.events.map((e) => [e.date, ...nameCells(e.speciesSlug), e.kind, e.title, e.detail]);
  for (const w of calendar.warnings) {
    const schedule = calendar.schedules.find(
      (s) => s.speciesSlug === w.speciesSlug && (!w.method || s.method === w.method),
    );
    rows.push([
      schedule?.sowDate ?? '',
      ...nameCells(w.speciesSlug),
      `warning:${w.kind}`,
      w.method ? `${words.note} (${w.method})` : words.note,
      w.message,
    ]);
  }
  return [words.header, ...rows].map((r) => r.map(csvField).join(',')).join('\r\n');
}
