import { loginRequestSchema } from '@homeground/shared';
import { describe, expect, it } from 'vitest';
import { ApiRequestError } from '../../../lib/api-request-error.js';
import { fieldErrorsFromZod } from '../../../lib/forms/field-errors.js';
import { describeAuthFailure } from './form-errors.js';

// Expected words: the shared login schema (shared/src/types/auth.ts) and the task's API contract.
describe('fieldErrorsFromZod', () => {
  it('keeps the first message per field as a sentence', () => {
    const parsed = loginRequestSchema.safeParse({ email: 'not-an-address', password: '' });
    expect(parsed.success).toBe(false);
    if (parsed.success) return;
    expect(fieldErrorsFromZod(parsed.error)).toEqual({
      email: 'Must be an e-mail address',
      password: 'Must not be empty',
    });
  });
});

describe('describeAuthFailure', () => {
  const fields = ['email', 'password', 'displayName'] as const;

  it('says a wrong password on sign-in above the form, with no field marked', () => {
    const error = new ApiRequestError({
      statusCode: 401,
      error: 'Unauthorized',
      message: 'E-mail or password is wrong.',
    });
    expect(describeAuthFailure(error, 'sign-in', fields)).toEqual({
      fields: {},
      message: 'E-mail or password is wrong',
    });
  });

  it('shows server field messages beside known fields and the rest above the form', () => {
    const error = new ApiRequestError({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Invalid input',
      fields: [
        { field: 'displayName', message: 'must not be empty' },
        { field: 'captcha', message: 'is missing' },
      ],
    });
    expect(describeAuthFailure(error, 'register', fields)).toEqual({
      fields: { displayName: 'Must not be empty' },
      message: 'captcha: is missing',
    });
  });
});
