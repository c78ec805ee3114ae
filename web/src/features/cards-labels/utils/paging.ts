/** Splits items into printed pages of `perPage` (the last page may be short); none → no pages. */
export function intoSheets<T>(items: readonly T[], perPage: number): T[][] {
  if (perPage < 1) throw new RangeError('perPage must be at least 1');
  const sheets: T[][] = [];
  for (let i = 0; i < items.length; i += perPage) sheets.push(items.slice(i, i + perPage));
  return sheets;
}
