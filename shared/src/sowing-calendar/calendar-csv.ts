import { csvField } from '../csv/csv-cell.js';
import type { SowingCalendar } from './calendar-types.js';

/** Names shown in the CSV for a species slug. */
export interface CsvNames {
  commonName: string;
  scientificName: string;
}

const CSV_FIELDS = ['date', 'species', 'scientificName', 'kind', 'title', 'detail'] as const;

/**
 * The calendar as CSV (RFC 4180, CRLF): one row per event in date order, then one row per warning
 * (kind "warning:<kind>", dated on its schedule's sowing day, the method in its title), so a
 * spreadsheet keeps every caution. The columns are unchanged from the first CSV export.
 * `names` maps a species slug to the names to show; an unknown slug shows the slug.
 */
export function calendarToCsv(calendar: SowingCalendar, names: (slug: string) => CsvNames | undefined): string {
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
      w.method ? `Please note (${w.method})` : 'Please note',
      w.message,
    ]);
  }
  return [CSV_FIELDS as readonly string[], ...rows].map((r) => r.map(csvField).join(',')).join('\r\n');
}
