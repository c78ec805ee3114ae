import type { ApiError } from '@homeground/shared';
import { env } from '../config/env.js';
import { readAccessToken } from './access-token.js';
import { readRequestLocale } from './i18n/request-locale.js';
import { ApiRequestError, isApiErrorBody, NETWORK_ERROR_STATUS } from './api-request-error.js';

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** Sent as JSON. */
  body?: unknown;
  signal?: AbortSignal;
  /** Overrides the stored token; `null` sends no Authorization header. */
  token?: string | null;
}

export interface HttpClientConfig {
  baseUrl: string;
  getToken: () => string | null;
  /** The page's language, sent as `Accept-Language` so messages and reasons come back in it. */
  getLocale?: () => string;
}

const NETWORK_MESSAGE = 'Homeground could not reach its server. Check your connection and try again.';

/** Words for an error answer that did not carry the API's JSON shape (e.g. a proxy's HTML page). */
function fallbackError(response: Response): ApiError {
  const status = response.status;
  const message =
    status >= 500
      ? `The Homeground server is having trouble (error ${status}). Try again in a minute.`
      : `The request failed (error ${status}).`;
  return { statusCode: status, error: response.statusText || 'Error', message };
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === '') return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** One fetch wrapper for the whole app: base URL, bearer token, JSON both ways, typed errors. */
export function createHttpClient(config: HttpClientConfig) {
  const languageHeader = (): Record<string, string> =>
    config.getLocale ? { 'Accept-Language': config.getLocale() } : {};

  async function request<T>(path: string, options: RequestOptions = {}): Promise<T> {
    const headers: Record<string, string> = { Accept: 'application/json', ...languageHeader() };
    const token = options.token === undefined ? config.getToken() : options.token;
    if (token) headers.Authorization = `Bearer ${token}`;
    // A FormData body (a file upload) sets its own multipart type and boundary.
    const isForm = options.body instanceof FormData;
    if (options.body !== undefined && !isForm) headers['Content-Type'] = 'application/json';

    let response: Response;
    try {
      response = await fetch(`${config.baseUrl}${path}`, {
        method: options.method ?? (options.body === undefined ? 'GET' : 'POST'),
        headers,
        body:
          options.body === undefined ? undefined : isForm ? (options.body as FormData) : JSON.stringify(options.body),
        signal: options.signal,
      });
    } catch (cause) {
      // A cancelled query is not a failure to report; TanStack Query expects the AbortError back.
      if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
      throw new ApiRequestError({ statusCode: NETWORK_ERROR_STATUS, error: 'Network error', message: NETWORK_MESSAGE });
    }

    const body = await readJson(response);
    if (!response.ok) throw new ApiRequestError(isApiErrorBody(body) ? body : fallbackError(response));
    return body as T;
  }

  async function requestFile(path: string, options: Omit<RequestOptions, 'method' | 'body'> = {}): Promise<Blob> {
    const headers: Record<string, string> = { ...languageHeader() };
    const token = options.token === undefined ? config.getToken() : options.token;
    if (token) headers.Authorization = `Bearer ${token}`;
    let response: Response;
    try {
      response = await fetch(`${config.baseUrl}${path}`, { method: 'GET', headers, signal: options.signal });
    } catch (cause) {
      if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
      throw new ApiRequestError({ statusCode: NETWORK_ERROR_STATUS, error: 'Network error', message: NETWORK_MESSAGE });
    }
    if (!response.ok) {
      const body = await readJson(response);
      throw new ApiRequestError(isApiErrorBody(body) ? body : fallbackError(response));
    }
    return response.blob();
  }

  return {
    request,
    get: <T>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
      request<T>(path, { ...options, method: 'GET' }),
    post: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
      request<T>(path, { ...options, method: 'POST', body }),
    put: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
      request<T>(path, { ...options, method: 'PUT', body }),
    patch: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
      request<T>(path, { ...options, method: 'PATCH', body }),
    delete: <T = void>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
      request<T>(path, { ...options, method: 'DELETE' }),
    /** A file the API sends behind sign-in (e.g. a CSV), as a Blob; a plain link could not carry the token. */
    file: (path: string, options?: Omit<RequestOptions, 'method' | 'body'>) => requestFile(path, options),
  };
}

export type HttpClient = ReturnType<typeof createHttpClient>;

export const httpClient: HttpClient = createHttpClient({
  baseUrl: env.apiBaseUrl,
  getToken: readAccessToken,
  getLocale: readRequestLocale,
});
