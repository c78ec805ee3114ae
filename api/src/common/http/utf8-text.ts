import { badRequest } from '../validation/bad-request.js';

const decoder = new TextDecoder('utf-8', { fatal: true });

/**
 * An uploaded text file as a string, refusing anything that is not UTF-8 (a spreadsheet saved as
 * Windows-1252 or UTF-16, say) instead of silently storing replacement characters. A leading byte-order
 * mark is dropped.
 */
export function utf8Text(bytes: Uint8Array, field: string): string {
  if (bytes.length >= 2 && ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)))
    throw badRequest([{ field, message: 'is UTF-16 text: save it as "CSV UTF-8" and upload it again' }]);
  try {
    return decoder.decode(bytes).replace(/^\uFEFF/, '');
  } catch {
    throw badRequest([
      {
        field,
        message: 'is not UTF-8 text (another encoding, or not text): save it as "CSV UTF-8" and upload it again',
      },
    ]);
  }
}
