import { describe, expect, it } from 'vitest';
import { apiError, installFakeApi } from '../testing/fake-api.js';
import { ApiRequestError } from './api-request-error.js';
import { createHttpClient, httpClient } from './http-client.js';
import { createI18n } from './i18n/index.js';

// The error shape under test is the API contract in shared/src/types/auth.ts (ApiError).
const client = createHttpClient({ baseUrl: '', getToken: () => 'stored-token' });

describe('httpClient', () => {
  it('turns an ApiError body into an ApiRequestError carrying status, message and fields', async () => {
    installFakeApi({
      'POST /api/auth/register': apiError(400, 'Some fields are wrong', {
        error: 'Bad Request',
        fields: [
          { field: 'email', message: 'must be an e-mail address' },
          { field: 'password', message: 'must be at least 10 characters' },
        ],
      }),
    });
    const failure = await client.post('/api/auth/register', { email: 'x' }).catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(ApiRequestError);
    const error = failure as ApiRequestError;
    expect(error.statusCode).toBe(400);
    expect(error.error).toBe('Bad Request');
    expect(error.message).toBe('Some fields are wrong');
    expect(error.fieldMessages()).toEqual({
      email: 'must be an e-mail address',
      password: 'must be at least 10 characters',
    });
  });

  it('sends the stored token as a bearer token and the body as JSON', async () => {
    const api = installFakeApi({ 'POST /api/echo': { body: { ok: true } } });
    await expect(client.post('/api/echo', { a: 1 })).resolves.toEqual({ ok: true });
    const [call] = api.callsTo('POST', '/api/echo');
    expect(call.headers.authorization).toBe('Bearer stored-token');
    expect(call.headers['content-type']).toBe('application/json');
    expect(call.body).toEqual({ a: 1 });
  });

  it('leaves the token off when asked to', async () => {
    const api = installFakeApi();
    await client.get('/api/stats', { token: null });
    expect(api.callsTo('GET', '/api/stats')[0].headers.authorization).toBeUndefined();
  });

  it('describes an answer without the error shape (a proxy page) in words', async () => {
    installFakeApi({ 'GET /api/stats': { status: 502, body: undefined } });
    const error = (await client.get('/api/stats').catch((e: unknown) => e)) as ApiRequestError;
    expect(error.statusCode).toBe(502);
    expect(error.message).toMatch(/server is having trouble/);
  });

  it('says in words when the server cannot be reached', async () => {
    const api = installFakeApi();
    api.fetch.mockRejectedValueOnce(new TypeError('Failed to fetch'));
    const error = (await client.get('/api/stats').catch((e: unknown) => e)) as ApiRequestError;
    expect(error).toBeInstanceOf(ApiRequestError);
    expect(error.isNetworkError).toBe(true);
    expect(error.message).toMatch(/could not reach its server/);
  });

  // Accept-Language (RFC 9110 §12.5.4) carries the page's language, so the API answers in it.
  it("sends the page's language as Accept-Language, following a switch", async () => {
    const api = installFakeApi({ 'GET /api/echo': { body: { ok: true } } });
    const i18n = createI18n('es');
    await httpClient.get('/api/echo');
    await i18n.changeLanguage('en');
    await httpClient.get('/api/echo');
    expect(api.callsTo('GET', '/api/echo').map((c) => c.headers['accept-language'])).toEqual(['es', 'en']);
  });
});
