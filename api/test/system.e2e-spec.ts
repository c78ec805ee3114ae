import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, type TestApp } from './support/test-app.js';

// The invented scenario's site; the trailing slash given in the setting is dropped in the answer.
const PUBLIC_URL = 'https://plants.larkfield.example';

describe('health, stats and docs (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', PUBLIC_URL: `${PUBLIC_URL}/` });
  });
  afterAll(() => t.close());

  it('reports version and a live database with its migrations applied', async () => {
    const res = await t.http.get('/api/health').expect(200).expect('Content-Type', /json/);
    expect(res.body).toMatchObject({
      status: 'ok',
      version: expect.stringMatching(/^\d+\.\d+\.\d+/),
      database: { status: 'up' },
    });
    expect(res.body.database.migrations).toBeGreaterThanOrEqual(1);
  });

  it('publishes the configured public address for printed links, cacheable', async () => {
    const res = await t.http.get('/api/site').expect(200);
    expect(res.body).toEqual({ publicUrl: PUBLIC_URL });
    expect(res.headers['cache-control']).toBe('public, max-age=3600');
    const spec = await t.http.get('/api/docs/openapi.json').expect(200);
    expect(spec.body.paths['/api/site']).toBeDefined();
  });

  it('counts the demo group and people', async () => {
    const res = await t.http.get('/api/stats').expect(200);
    expect(res.body.groups).toBe(1);
    expect(res.body.users).toBe(8);
    // Only ecoregions the catalogue covers: of EPA's 85 Level III ecoregions, not the Rockies,
    // deserts and Pacific regions (e.g. 81 Sonoran Basin and Range), but the Driftless Area (52) and the rest of the East.
    expect(res.body.ecoregions).toBeGreaterThan(40);
    expect(res.body.ecoregions).toBeLessThan(85);
    const groups = await t.http.get('/api/groups').expect(200);
    expect(groups.body).toEqual([
      expect.objectContaining({ slug: 'larkfield-commons-growers', state: 'WI', ecoregionCode: '52', members: 5 }),
    ]);
  });

  it('serves OpenAPI docs from packaged assets, with no CDN in the page', async () => {
    const page = await t.http.get('/api/docs').redirects(1).expect(200);
    expect(page.text).toContain('swagger-ui');
    const loaded = [...page.text.matchAll(/(?:src|href)=["']([^"']+)["']/g)].map((m) => m[1]);
    expect(loaded.length).toBeGreaterThan(2);
    expect(loaded.filter((u) => /^(https?:)?\/\//.test(u))).toEqual([]);
    const init = await t.http.get('/api/docs/swagger-ui-init.js').expect(200);
    expect(init.text).toContain('"/api/auth/login"');
    const spec = await t.http.get('/api/docs/openapi.json').expect(200);
    expect(Object.keys(spec.body.paths)).toEqual(expect.arrayContaining(['/api/auth/login', '/api/me', '/api/health']));
  });

  it('answers unknown API routes with a JSON 404 and sets security headers', async () => {
    const res = await t.http.get('/api/no-such-thing').expect(404);
    expect(res.body).toMatchObject({ statusCode: 404, error: 'Not Found' });
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
  });
});
