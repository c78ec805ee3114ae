/** Month abbreviations as people write them on seed packets and calendars. */
export const MONTH_SHORT = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;
export const MONTH_NAMES = [
  'January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December',
] as const;
/** One letter per month, printed under the detail page's bloom strip. */
export const MONTH_INITIALS = ['J', 'F', 'M', 'A', 'M', 'J', 'J', 'A', 'S', 'O', 'N', 'D'] as const;

/**
 * Runs of consecutive bloom months (1–12), each as [first, last]. December runs on into January,
 * so a winter bloomer ([11, 12, 1, 2]) is one run, Nov–Feb, not two.
 */
export function bloomRuns(bloomMonths: readonly number[]): [number, number][] {
  const months = [...new Set(bloomMonths)].filter((m) => m >= 1 && m <= 12).sort((a, b) => a - b);
  if (months.length === 0) return [];
  if (months.length === 12) return [[1, 12]];
  const runs: [number, number][] = [];
  for (const m of months) {
    const last = runs[runs.length - 1];
    if (last && m === last[1] + 1) last[1] = m;
    else runs.push([m, m]);
  }
  if (runs.length > 1 && runs[0][0] === 1 && runs[runs.length - 1][1] === 12) {
    const first = runs.shift()!;
    runs[runs.length - 1][1] = first[1];
  }
  // Start from the run that begins earliest in the growing year's reading order (a wrapped run sorts by its start).
  return runs.sort((a, b) => a[0] - b[0]);
}

/** "Jun–Aug", "May", "Apr–May and Sep", "all year"; empty string when no months are recorded. */
export function bloomRange(bloomMonths: readonly number[]): string {
  const runs = bloomRuns(bloomMonths);
  if (runs.length === 1 && runs[0][0] === 1 && runs[0][1] === 12) return 'all year';
  const parts = runs.map(([a, b]) => (a === b ? MONTH_SHORT[a - 1] : `${MONTH_SHORT[a - 1]}–${MONTH_SHORT[b - 1]}`));
  if (parts.length <= 1) return parts[0] ?? '';
  return `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}`;
}

/** The words a screen reader hears for a bloom strip, e.g. "Blooms Jun–Aug". */
export function bloomLabel(bloomMonths: readonly number[]): string {
  const range = bloomRange(bloomMonths);
  if (range === '') return 'No bloom months recorded';
  return range === 'all year' ? 'Blooms all year' : `Blooms ${range}`;
}
