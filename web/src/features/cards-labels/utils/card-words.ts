import type { TFunction } from 'i18next';

/** Sun, moisture, bloom and caution words come from the shared vocabulary (`useWords()`). */

/** Caterpillar host value of the genus, always with its source (Tallamy & Shropshire 2009). */
export function hostWords(genus: string, count: number | null, t: TFunction<'cards'>): string {
  if (count === null) return t('card.hostNotListed', { genus });
  if (count === 0) return t('card.hostNone', { genus });
  return t('card.hosts', { genus, count });
}

/** Today as YYYY-MM-DD in the person's own time zone (what a date input holds). */
export function todayIso(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** "2026-03-02" → "Mar 2, 2026"; an empty or bad date prints a blank line to fill in by hand. */
export function sowDateWords(iso: string, localeTag = 'en-US'): string {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(iso)) return '____________';
  const date = new Date(`${iso}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return '____________';
  return date.toLocaleDateString(localeTag, { timeZone: 'UTC', month: 'short', day: 'numeric', year: 'numeric' });
}
