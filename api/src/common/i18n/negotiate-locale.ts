import { WORD_LOCALES, type WordLocale } from '@homeground/shared';

/** English when the reader names no language Homeground speaks. */
export const DEFAULT_API_LOCALE: WordLocale = 'en';

/**
 * The language to answer in, from an `Accept-Language` header (RFC 9110 §12.5.4): each range with
 * its `q` weight (1 when absent, 0 meaning "not this one"), the highest weight Homeground speaks
 * wins, ties in the order the reader gave. A region ("es-MX") counts for its language; "*" and
 * anything unreadable count for nothing.
 */
export function negotiateLocale(header: string | readonly string[] | undefined): WordLocale {
  const text: string = typeof header === 'string' ? header : (header ?? []).join(',');
  let best: { locale: WordLocale; q: number } | undefined;
  // A header is short; cap what is read so a huge one costs nothing.
  for (const range of text.slice(0, 512).split(',')) {
    const [tag, ...params] = range.trim().split(';');
    const base = tag.trim().toLowerCase().split('-')[0];
    if (!(WORD_LOCALES as readonly string[]).includes(base)) continue;
    const qParam = params.map((p) => p.trim().toLowerCase()).find((p) => p.startsWith('q='));
    const q = qParam === undefined ? 1 : Number(qParam.slice(2));
    if (!Number.isFinite(q) || q <= 0 || q > 1) continue;
    if (best === undefined || q > best.q) best = { locale: base as WordLocale, q };
  }
  return best?.locale ?? DEFAULT_API_LOCALE;
}
