import { roundTo } from '@homeground/shared';
import type { MixRow } from './mix-rows.js';

const HEADER = [
  'Scientific name',
  'Common name',
  'Plants',
  'Spacing (in)',
  'Spacing (cm)',
  'Seeds to sow',
  'Seed weight (g)',
  'Seed weight (oz)',
];

/** RFC 4180 quoting: a field with a comma, quote or line break is quoted, quotes doubled. */
function field(value: string | number | null | undefined): string {
  const text = value === null || value === undefined ? '' : String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** The mix as CSV, one species a line, built in the browser (no request needed). */
export function mixCsv(rows: readonly MixRow[]): string {
  const lines = rows.map((r) => {
    const q = r.quantity;
    return [
      r.species.scientificName,
      r.species.commonName,
      q?.plants,
      q?.spacingIn,
      q ? roundTo(q.spacingCm, 0) : undefined,
      q?.seedsToSow,
      q?.seedWeight ? q.seedWeight.grams : undefined,
      q?.seedWeight ? q.seedWeight.ounces : undefined,
    ]
      .map(field)
      .join(',');
  });
  return [HEADER.map(field).join(','), ...lines].join('\r\n') + '\r\n';
}

/** Offers the text as a file download through a temporary object URL. */
export function downloadText(text: string, fileName: string, type = 'text/csv;charset=utf-8'): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  document.body.append(a);
  a.click();
  a.remove();
  // Revoke after the click has been handled, or some browsers cancel the download.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
