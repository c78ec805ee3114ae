import type { z } from 'zod';
import { isApiRequestError } from '../../../lib/api-request-error.js';

export type FieldErrors<K extends string> = Partial<Record<K, string>>;

export const WRONG_CREDENTIALS_MESSAGE = 'E-mail or password is wrong';
export const THROTTLED_MESSAGE = 'Too many attempts: wait a minute and try again';
export const EMAIL_TAKEN_MESSAGE = 'An account with this e-mail already exists. Sign in instead.';

/** The schemas say "must be …" so the API can prefix a field name; beside an input it starts the sentence. */
function asSentence(message: string): string {
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

export interface AuthFailure<K extends string> {
  fields: FieldErrors<K>;
  /** For the whole form; null when every problem sits beside a field. */
  message: string | null;
}

/** Turns a failed sign-in or register call into words beside fields or above the form. */
export function describeAuthFailure<K extends string>(error: unknown, action: 'sign-in' | 'register', knownFields: readonly K[]): AuthFailure<K> {
  if (!isApiRequestError(error)) return { fields: {}, message: 'Something went wrong. Try again.' };
  if (error.statusCode === 429) return { fields: {}, message: THROTTLED_MESSAGE };
  if (action === 'sign-in' && error.statusCode === 401) return { fields: {}, message: WRONG_CREDENTIALS_MESSAGE };
  if (action === 'register' && error.statusCode === 409) {
    return { fields: { email: EMAIL_TAKEN_MESSAGE } as FieldErrors<K>, message: null };
  }
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
