import { BadRequestException } from '@nestjs/common';
import type { ApiError, WordLocale } from '@homeground/shared';
import { apiWords } from '../i18n/api-i18n.js';

/** One bad field of a request and the reason, as the 400 lists it. */
export type FieldProblem = NonNullable<ApiError['fields']>[number];

/** The sentence that repeats each bad field and its reason, in the reader's language. */
export function pleaseCheck(fields: readonly FieldProblem[], locale: WordLocale = 'en'): string {
  const problems = fields.map((f) => `${f.field} ${f.message}`).join('; ');
  return apiWords(locale)('validation.pleaseCheck', { problems });
}

/**
 * The API's one 400: `{message, fields}` with each bad field and its reason. The message repeats
 * them in a sentence unless a better one is given (e.g. "nothing was imported").
 */
export function badRequest(
  fields: FieldProblem[],
  message?: string,
  extra: Pick<ApiError, 'rows'> = {},
): BadRequestException {
  return new BadRequestException({ message: message ?? pleaseCheck(fields), fields, ...extra });
}
