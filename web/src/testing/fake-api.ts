import type { ApiError } from '@homeground/shared';
import { vi } from 'vitest';
import { groups, health, stats } from './fixtures.js';

export interface FakeRequest {
  method: string;
  path: string;
  /** The query string with its "?", or "" (routes are keyed by path alone). */
  search: string;
  body: unknown;
  headers: Record<string, string>;
}

export interface FakeResponse {
  status?: number;
  body?: unknown;
}

/** A fixed answer, or a function of the request (e.g. to check the bearer token). */
export type FakeRoute = FakeResponse | ((request: FakeRequest) => FakeResponse | Promise<FakeResponse>);

/** Routes keyed "METHOD /path", e.g. "POST /api/auth/login". */
export type FakeRoutes = Record<string, FakeRoute>;

/** The public answers every page may ask for. */
export function publicRoutes(): FakeRoutes {
  return {
    'GET /api/health': { body: health },
    'GET /api/stats': { body: stats },
    'GET /api/groups': { body: groups },
  };
}

export function apiError(statusCode: number, message: string, extra: Partial<ApiError> = {}): FakeResponse {
  return { status: statusCode, body: { statusCode, error: extra.error ?? 'Error', message, ...extra } };
}

function headersOf(init: RequestInit | undefined): Record<string, string> {
  const out: Record<string, string> = {};
  new Headers(init?.headers).forEach((value, key) => (out[key] = value));
  return out;
}

/**
 * Replaces global fetch with a stub that answers per path; nothing leaves the process.
 * Unknown paths answer 404 in the API's error shape. `calls` lists every request made.
 */
export function installFakeApi(routes: FakeRoutes = {}) {
  const all = { ...publicRoutes(), ...routes };
  const calls: FakeRequest[] = [];
  const fetchStub = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(typeof input === 'string' ? input : input.toString(), 'http://homeground.test');
    const method = (init?.method ?? 'GET').toUpperCase();
    const request: FakeRequest = {
      method,
      path: url.pathname,
      search: url.search,
      body: typeof init?.body === 'string' ? JSON.parse(init.body) : undefined,
      headers: headersOf(init),
    };
    calls.push(request);
    const route = all[`${method} ${url.pathname}`];
    const answer =
      route === undefined
        ? apiError(404, `No fake route for ${method} ${url.pathname}`)
        : typeof route === 'function'
          ? await route(request)
          : route;
    const status = answer.status ?? 200;
    return new Response(answer.body === undefined ? null : JSON.stringify(answer.body), {
      status,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchStub);
  return {
    calls,
    fetch: fetchStub,
    callsTo: (method: string, path: string) => calls.filter((c) => c.method === method && c.path === path),
  };
}
