import type { WordLocale } from '@homeground/shared';
import { apiWords } from '../i18n/api-i18n.js';
import { badRequest, pleaseCheck } from '../validation/bad-request.js';

const decoder = new TextDecoder('utf-8', { fatal: true });

/**
 * An uploaded text file as a string, refusing anything that is not UTF-8 (a spreadsheet saved as
 * Windows-1252 or UTF-16, say) instead of silently storing replacement characters. A leading byte-order
 * mark is dropped.
 */
export function utf8Text(bytes: Uint8Array, field: string, locale: WordLocale = 'en'): string {
  const refuse = (key: 'validation.utf16' | 'validation.notUtf8') => {
    const fields = [{ field, message: apiWords(locale)(key) }];
    return badRequest(fields, pleaseCheck(fields, locale));
  };
  if (bytes.length >= 2 && ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)))
    throw refuse('validation.utf16');
  try {
    return decoder.decode(bytes).replace(/^\uFEFF/, '');
  } catch {
    throw refuse('validation.notUtf8');
  }
}
