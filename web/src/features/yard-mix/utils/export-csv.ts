import type { TFunction } from 'i18next';
import { cmToInches, csvField as field, roundTo, type Vocabulary } from '@homeground/shared';
import type { MixRow } from './mix-rows.js';

/** The columns in order, as keys of the mix catalogue's `csv` headers. */
const COLUMNS = [
  'scientificName',
  'commonName',
  'role',
  'bloom',
  'heightIn',
  'heightCm',
  'plants',
  'spacingIn',
  'spacingCm',
  'seeds',
  'weightG',
  'weightOz',
] as const;

/** A height range as "12–30"; one number when both ends agree. */
function range(min: number, max: number): string {
  return min === max ? String(min) : `${min}–${max}`;
}

/**
 * The mix as CSV, one species a line, built in the browser (no request needed). Headers and month
 * names are in the page's language; numbers stay plain (a dot for decimals) so spreadsheets read them.
 */
export function mixCsv(rows: readonly MixRow[], t: TFunction<'mix'>, words: Vocabulary): string {
  const lines = rows.map((r) => {
    const q = r.quantity;
    return [
      r.species.scientificName,
      r.species.commonName,
      r.chosen.roles.join('; '),
      words.formatMonths(r.species.bloomMonths),
      range(roundTo(cmToInches(r.species.heightCm.min), 0), roundTo(cmToInches(r.species.heightCm.max), 0)),
      range(r.species.heightCm.min, r.species.heightCm.max),
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
  return [COLUMNS.map((c) => field(t(`csv.${c}`))).join(','), ...lines].join('\r\n') + '\r\n';
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
