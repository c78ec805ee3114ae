import { paths } from '../../../config/paths.js';

/** The species page as an absolute link, for a QR code on paper (a phone has no "current site"). */
export function speciesPageUrl(slug: string, origin: string = window.location.origin): string {
  return new URL(paths.speciesDetail.build(slug), origin).href;
}

const SLUG = /^[a-z0-9]+(-[a-z0-9]+)*$/;

/** `?species=a,b,a` → ["a", "b"]: well-formed slugs only, first mention kept, order kept. */
export function parseSpeciesParam(value: string | null): string[] {
  if (!value) return [];
  const out: string[] = [];
  for (const raw of value.split(',')) {
    const slug = raw.trim().toLowerCase();
    if (SLUG.test(slug) && !out.includes(slug)) out.push(slug);
  }
  return out;
}
