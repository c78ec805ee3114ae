import { paths } from '../../../config/paths.js';

/** The species page as an absolute link, for a QR code on paper (a phone has no "current site"). */
export function speciesPageUrl(slug: string, origin: string): string {
  return new URL(paths.speciesDetail.build(slug), origin).href;
}
