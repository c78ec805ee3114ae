import { afterAll, beforeAll, describe, expect, it, jest } from '@jest/globals';
import { createTestApp, type TestApp } from './support/test-app.js';

/** Headers helmet sets on every answer; a cached list page must carry the same ones. */
const SECURITY_HEADERS = [
  'content-security-policy',
  'cross-origin-opener-policy',
  'cross-origin-resource-policy',
  'origin-agent-cluster',
  'referrer-policy',
  'strict-transport-security',
  'x-content-type-options',
  'x-dns-prefetch-control',
  'x-download-options',
  'x-frame-options',
  'x-permitted-cross-domain-policies',
  'x-xss-protection',
];

describe('species list cache (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('answers a repeated list page from the cache with the same body and security headers', async () => {
    const url = '/api/species?state=WI&sun=full&pageSize=5';
    const fresh = await t.http.get(url).expect(200);
    const store = t.app.get((await import('../src/species/species-store.service.js')).SpeciesStore);
    // The first answer put the page in the cache, so the second comes from the middleware.
    expect(store.cachedForUrl(url)).toBeDefined();
    const lookup = jest.spyOn(store, 'cachedForUrl');
    const cached = await t.http.get(url).expect(200);
    expect(lookup.mock.results.some((r) => r.value !== undefined)).toBe(true);
    lookup.mockRestore();
    expect(cached.text).toBe(fresh.text);
    for (const h of SECURITY_HEADERS) {
      expect({ header: h, value: cached.headers[h] }).toEqual({ header: h, value: fresh.headers[h] });
      expect(cached.headers[h]).toBeDefined();
    }
    expect(cached.headers['content-type']).toMatch(/^application\/json/);
  });

  it('never answers another route from the list cache', async () => {
    await t.http.get('/api/species?pageSize=3').expect(200);
    const detail = await t.http.get('/api/species/zizia-aurea').expect(200);
    expect(detail.body.slug).toBe('zizia-aurea');
  });
});
