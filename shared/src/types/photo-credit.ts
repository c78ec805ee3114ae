import { z } from 'zod';
import type { Species } from './species.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';

/**
 * Licences a species photo may carry. Identifiers are SPDX licence ids where one exists (an open
 * standard); the last two are the usual plain cases a curator meets.
 */
export const PHOTO_LICENCES = [
  'CC0-1.0',
  'CC-BY-4.0',
  'CC-BY-SA-4.0',
  'CC-BY-NC-4.0',
  'CC-BY-NC-SA-4.0',
  'public-domain',
  'with-permission',
] as const;
export type PhotoLicence = (typeof PHOTO_LICENCES)[number];

/** How each licence is named in a credit line. */
export const PHOTO_LICENCE_WORDS = {
  'CC0-1.0': 'CC0 1.0',
  'CC-BY-4.0': 'CC BY 4.0',
  'CC-BY-SA-4.0': 'CC BY-SA 4.0',
  'CC-BY-NC-4.0': 'CC BY-NC 4.0',
  'CC-BY-NC-SA-4.0': 'CC BY-NC-SA 4.0',
  'public-domain': 'public domain',
  'with-permission': "used with the photographer's permission",
} as const satisfies Record<PhotoLicence, string>;

/** Who took a photo, under which licence, and where it came from; required with every upload. */
export const photoCreditSchema = z
  .object({
    photographer: z
      .string()
      .trim()
      .min(1, 'is required: who took the photo')
      .max(120, 'must be at most 120 characters'),
    licence: z.enum(PHOTO_LICENCES, { message: `must be one of ${PHOTO_LICENCES.join(', ')}` }),
    sourceUrl: z
      .url({ protocol: /^https?$/, error: 'must be the http:// or https:// address the photo came from' })
      .max(500, 'must be at most 500 characters'),
  })
  .strict();
export type PhotoCredit = z.infer<typeof photoCreditSchema>;

/** The licences' names in Spanish: SPDX names stay as they are, the plain cases are said in words. */
export const PHOTO_LICENCE_WORDS_ES = {
  ...PHOTO_LICENCE_WORDS,
  'public-domain': 'dominio público',
  'with-permission': 'usada con permiso de quien la tomó',
} as const satisfies Record<PhotoLicence, string>;

/** A licence's name in a language ("public domain" / "dominio público"). */
export function photoLicenceWords(licence: PhotoLicence, locale: WordLocale = 'en'): string {
  return (locale === 'es' ? PHOTO_LICENCE_WORDS_ES : PHOTO_LICENCE_WORDS)[licence];
}

/** "Photo: Ada Moss, CC BY 4.0" / "Foto: Ada Moss, dominio público" — a credit line's words (the source link goes beside it). */
export function photoCreditLine(c: Pick<PhotoCredit, 'photographer' | 'licence'>, locale: WordLocale = 'en'): string {
  const licence = photoLicenceWords(c.licence, locale);
  return locale === 'es' ? `Foto: ${c.photographer}, ${licence}` : `Photo: ${c.photographer}, ${licence}`;
}

/** A species record as `GET /api/species/:slug` answers it: the record, whether it has a photo, and the photo's credit. */
export interface SpeciesDetail extends Species {
  hasPhoto: boolean;
  /** Null when there is no photo, or for an upload from before credits were asked for. */
  photoCredit: PhotoCredit | null;
}
