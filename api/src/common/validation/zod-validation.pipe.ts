import { schemaSentenceIn, zodIssueWordsFor, type WordLocale } from '@homeground/shared';
import type { z } from 'zod';
import { apiWords } from '../i18n/api-i18n.js';
import { badRequest, type FieldProblem, pleaseCheck } from './bad-request.js';

/** Turns zod issues into the API's 400 fields: each bad field (dotted path) with its reason. */
export function zodFields(error: z.ZodError, prefix?: string, locale: WordLocale = 'en'): FieldProblem[] {
  const notAField = apiWords(locale)('validation.notAField');
  return error.issues.flatMap((i) => {
    const at = [prefix, ...i.path.map(String)].filter(Boolean).join('.');
    // An unknown key is named itself, so the client learns which field to drop.
    if (i.code === 'unrecognized_keys') {
      return i.keys.map((k) => ({ field: at ? `${at}.${k}` : k, message: notAField }));
    }
    // The schemas word their own checks in English; the common ones are said in the reader's language.
    return [{ field: at || 'body', message: schemaSentenceIn(locale, i.message) }];
  });
}

/**
 * Parses a body, query string or path parameter with a shared zod schema and answers 400 naming
 * each bad field, in the reader's language: zod's own reasons through the shared issue words, the
 * schema's own messages as the schema says them. `prefix` names a path parameter (its value has no
 * field name of its own).
 */
export function parseRequestPart<S extends z.ZodType>(
  schema: S,
  value: unknown,
  locale: WordLocale,
  prefix?: string,
): z.infer<S> {
  const error = zodIssueWordsFor(locale);
  const result = schema.safeParse(prefix === undefined ? (value ?? {}) : value, error ? { error } : undefined);
  if (result.success) return result.data;
  const fields = zodFields(result.error, prefix, locale);
  throw badRequest(fields, pleaseCheck(fields, locale));
}
