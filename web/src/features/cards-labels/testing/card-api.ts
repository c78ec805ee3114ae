import type { SpeciesSummary } from '@homeground/shared';
import { vi } from 'vitest';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import type { FakeRoutes } from '../../../testing/fake-api.js';
import { summaryOf } from './card-fixtures.js';

/** Fake detail answers for each record: GET /api/species/<slug>. */
export function detailRoutes(records: readonly SpeciesDetail[]): FakeRoutes {
  return Object.fromEntries(records.map((r) => [`GET /api/species/${r.slug}`, { body: r }]));
}

/**
 * The shared fake API keys routes by path only, but a search answer depends on `q`; this wraps the
 * installed fake so GET /api/species answers from `search(q)` and everything else passes through.
 */
export function fakeSpeciesSearch(search: (q: string) => readonly SpeciesDetail[]) {
  const inner = globalThis.fetch;
  const queries: string[] = [];
  vi.stubGlobal('fetch', async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(typeof input === 'string' ? input : input.toString(), 'http://homeground.test');
    if (url.pathname !== '/api/species') return inner(input, init);
    const q = url.searchParams.get('q') ?? '';
    queries.push(q);
    const items: SpeciesSummary[] = search(q).map(summaryOf);
    return new Response(JSON.stringify({ items, total: items.length, page: 1, pageSize: 8 }), {
      status: 200,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  return { queries };
}
