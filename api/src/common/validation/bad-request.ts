import { BadRequestException } from '@nestjs/common';
import { schemaSentenceIn, type ApiError, type WordLocale } from '@homeground/shared';
import { apiWords } from '../i18n/api-i18n.js';

/** One bad field of a request and the reason, as the 400 lists it. */
export type FieldProblem = NonNullable<ApiError['fields']>[number];

/** The sentence that repeats each bad field and its reason, in the reader's language. */
export function pleaseCheck(fields: readonly FieldProblem[], locale: WordLocale = 'en'): string {
  const problems = fields.map((f) => `${f.field} ${f.message}`).join('; ');
  return apiWords(locale)('validation.pleaseCheck', { problems });
}

/**
 * A 400 from the reasons of a shared check (season dates, batch log), each reason and the sentence
 * in the reader's language through the shared sentence table; English reasons stay as they are.
 */
export function badRequestIn(locale: WordLocale, fields: readonly FieldProblem[]): BadRequestException {
  const said = fields.map((f) => ({ ...f, message: schemaSentenceIn(locale, f.message) }));
  return badRequest(said, pleaseCheck(said, locale));
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
