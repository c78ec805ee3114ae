import { slugSchema } from '@homeground/shared';

/** Small readers for query-string values: a bad or stale value is dropped, never thrown. */

export function oneOf<T extends string>(allowed: readonly T[], value: string | null): T | undefined {
  return value !== null && (allowed as readonly string[]).includes(value) ? (value as T) : undefined;
}

export function wholeNumber(value: string | null, min: number, max: number): number | undefined {
  if (value === null || !/^\d+$/.test(value)) return undefined;
  const n = Number(value);
  return n >= min && n <= max ? n : undefined;
}

/** Any finite number, or undefined for an empty or non-numeric value. */
export function finiteNumber(value: string | null): number | undefined {
  if (value === null || value.trim() === '') return undefined;
  const n = Number(value);
  return Number.isFinite(n) ? n : undefined;
}

/**
 * `a,b,a` → ["a", "b"]: well-formed slugs only (lower-cased, trimmed), first mention kept, order kept.
 */
export function slugList(value: string | null): string[] {
  if (!value) return [];
  const out: string[] = [];
  for (const raw of value.split(',')) {
    const slug = raw.trim().toLowerCase();
    if (slugSchema.safeParse(slug).success && !out.includes(slug)) out.push(slug);
  }
  return out;
}

/** "/species" + params → "/species?q=aster", or the bare path when there are none. */
export function withQuery(path: string, params: URLSearchParams): string {
  const query = params.toString();
  return query ? `${path}?${query}` : path;
}
