import { forms } from '../../../locales/en/forms.js';
import { failureFromApi, type FieldErrors, type FormFailure } from '../../../lib/forms/field-errors.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';

// English here; the form says them in the page's language (lib/forms/schema-messages.ts).
export const WRONG_CREDENTIALS_MESSAGE = forms.messages.wrongCredentials;
export const THROTTLED_MESSAGE = forms.messages.throttled;
export const EMAIL_TAKEN_MESSAGE = forms.messages.emailTaken;

/**
 * A failed sign-in or register call in words: the answers only these two calls give (throttled,
 * wrong password, e-mail taken), then the API's 400 fields as any form reads them.
 */
export function describeAuthFailure<K extends string>(
  error: unknown,
  action: 'sign-in' | 'register',
  knownFields: readonly K[],
): FormFailure<K> {
  if (isApiRequestError(error)) {
    if (error.statusCode === 429) return { fields: {}, message: THROTTLED_MESSAGE };
    if (action === 'sign-in' && error.statusCode === 401) return { fields: {}, message: WRONG_CREDENTIALS_MESSAGE };
    if (action === 'register' && error.statusCode === 409) {
      return { fields: { email: EMAIL_TAKEN_MESSAGE } as FieldErrors<K>, message: null };
    }
  }
  return failureFromApi(error, knownFields);
}
