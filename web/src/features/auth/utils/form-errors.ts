import { forms } from '../../../locales/en/forms.js';
import { failureFromApi, type FormFailure } from '../../../lib/forms/field-errors.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';

// English here; the form says them in the page's language (lib/forms/schema-messages.ts).
export const WRONG_CREDENTIALS_MESSAGE = forms.messages.wrongCredentials;
export const THROTTLED_MESSAGE = forms.messages.throttled;

/**
 * A failed sign-in or register call in words: the answers only these two calls give (throttled,
 * wrong password), then the API's 400 fields as any form reads them. Register never says an address
 * is taken: that goes by e-mail to the address's owner.
 */
export function describeAuthFailure<K extends string>(
  error: unknown,
  action: 'sign-in' | 'register',
  knownFields: readonly K[],
): FormFailure<K> {
  if (isApiRequestError(error)) {
    if (error.statusCode === 429) return { fields: {}, message: THROTTLED_MESSAGE };
    if (action === 'sign-in' && error.statusCode === 401) return { fields: {}, message: WRONG_CREDENTIALS_MESSAGE };
  }
  return failureFromApi(error, knownFields);
}
