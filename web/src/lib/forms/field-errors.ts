import { forms } from '../../locales/en/forms.js';
import type { z } from 'zod';
import { isApiRequestError } from '../api-request-error.js';

export type FieldErrors<K extends string> = Partial<Record<K, string>>;

/** What went wrong with a submit: words beside fields, and words for the whole form (or null). */
export interface FormFailure<K extends string> {
  fields: FieldErrors<K>;
  message: string | null;
}

/** The schemas say "must be …" so the API can prefix a field name; beside an input it starts the sentence. */
export function asSentence(message: string): string {
  return message.charAt(0).toUpperCase() + message.slice(1);
}

/** First zod issue per top-level field, worded for showing beside that field. */
export function fieldErrorsFromZod<K extends string>(error: z.ZodError): FieldErrors<K> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const field = String(issue.path[0] ?? '');
    if (field && !out[field]) out[field] = asSentence(issue.message);
  }
  return out as FieldErrors<K>;
}

/**
 * A failed API call as a form failure: a 400's `fields` go beside the form's own fields; fields the
 * form does not have, and failures without fields, are said above the form.
 */
export function failureFromApi<K extends string>(error: unknown, knownFields: readonly K[]): FormFailure<K> {
  if (!isApiRequestError(error)) return { fields: {}, message: forms.messages.somethingWrong };
  const fields: Record<string, string> = {};
  const loose: string[] = [];
  for (const [field, message] of Object.entries(error.fieldMessages())) {
    if ((knownFields as readonly string[]).includes(field)) fields[field] = asSentence(message);
    else loose.push(`${field}: ${message}`);
  }
  const hasFields = Object.keys(fields).length > 0;
  const message = loose.length > 0 ? loose.join('; ') : hasFields ? null : error.message;
  return { fields: fields as FieldErrors<K>, message };
}
