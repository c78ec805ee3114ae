import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import {
  ecoregionListSchema,
  mixResponseSchema,
  placeLookupSchema,
  recommendationsResponseSchema,
  sowingCalendarSchema,
  speciesDetailSchema,
  speciesPageSchema,
} from '@homeground/shared';
import type { z } from 'zod';
import { createTestApp, type TestApp } from './support/test-app.js';

type Schema = { type?: string; properties?: Record<string, unknown>; additionalProperties?: unknown; $ref?: string };
interface Operation {
  parameters?: { name: string; in: string; schema?: Schema }[];
  requestBody?: { content?: Record<string, { schema?: Schema }> };
  responses?: Record<string, { content?: Record<string, { schema?: Schema }> }>;
}

/**
 * Walks the OpenAPI document the way a client generator would: every route that takes a body must
 * publish its schema, so `/api/docs` tells a client the shape it has to send.
 */
describe('OpenAPI document (e2e)', () => {
  let t: TestApp;
  let operations: { route: string; method: string; op: Operation }[];

  beforeAll(async () => {
    t = await createTestApp();
    const doc = (await t.http.get('/api/docs/openapi.json').expect(200)).body as {
      paths: Record<string, Record<string, Operation>>;
    };
    operations = Object.entries(doc.paths).flatMap(([route, methods]) =>
      Object.entries(methods).map(([method, op]) => ({ route, method, op })),
    );
  });
  afterAll(() => t.close());

  it('documents a request schema for every route that takes a body', () => {
    const withBody = operations.filter((o) => ['post', 'put', 'patch'].includes(o.method));
    expect(withBody.length).toBeGreaterThanOrEqual(17);
    const missing = withBody
      .filter(({ op }) => {
        const content = Object.values(op.requestBody?.content ?? {});
        return content.length === 0 || !content.every((c) => c.schema && (c.schema.properties || c.schema.$ref));
      })
      .map((o) => `${o.method.toUpperCase()} ${o.route}`);
    expect(missing).toEqual([]);
  });

  it('publishes JSON bodies as closed objects, as validation refuses unknown fields', () => {
    const open = operations
      .filter(({ op }) => op.requestBody?.content?.['application/json'])
      .filter(({ op }) => op.requestBody!.content!['application/json'].schema!.additionalProperties !== false)
      .map((o) => `${o.method.toUpperCase()} ${o.route}`);
    expect(open).toEqual([]);
  });

  it('documents the answer of every route: a schema for each success with a body', () => {
    const undocumented = operations
      .filter(({ op }) => {
        const ok = Object.entries(op.responses ?? {}).filter(([status]) => /^2\d\d$/.test(status));
        if (ok.length === 0) return true;
        return ok.some(([status, r]) => status !== '204' && !Object.values(r.content ?? {}).some((c) => c.schema));
      })
      .map((o) => `${o.method.toUpperCase()} ${o.route}`);
    expect(undocumented).toEqual([]);
    const register = operations.find((o) => o.route === '/api/auth/register')!.op;
    expect(Object.keys(register.responses!['202'].content!['application/json'].schema!.properties!).sort()).toEqual([
      'email',
      'expiresInHours',
      'status',
    ]);
    expect(register.responses!['400'].content!['application/json'].schema!.properties).toHaveProperty('fields');
  });

  it('describes real answers: the engine, catalogue and place answers parse with their published schemas', async () => {
    const site = { sun: 'full', moisture: 'dry', areaSqFt: 500, deerPressure: 'medium', goals: ['monarchs'] };
    const region = { state: 'WI', ecoregionCode: '52' };
    const calendar = {
      lastFrost: '2027-05-10',
      today: '2026-10-01',
      plans: [{ slug: 'zizia-aurea', method: 'winter-sowing' }],
    };
    const answers: [z.ZodType, unknown][] = [
      [speciesPageSchema, (await t.http.get('/api/species?state=WI&pageSize=5').expect(200)).body],
      [speciesDetailSchema, (await t.http.get('/api/species/zizia-aurea').expect(200)).body],
      [ecoregionListSchema, (await t.http.get('/api/ecoregions?state=WI').expect(200)).body],
      [placeLookupSchema, (await t.http.get('/api/places/lookup?zip=54665').expect(200)).body],
      [
        recommendationsResponseSchema,
        (await t.http.post('/api/recommendations').send({ site, region }).expect(200)).body,
      ],
      [mixResponseSchema, (await t.http.post('/api/mixes/balance').send({ site, region }).expect(200)).body],
      [sowingCalendarSchema, (await t.http.post('/api/calendar').send(calendar).expect(200)).body],
    ];
    for (const [schema, body] of answers) expect(schema.safeParse(body).error?.issues ?? []).toEqual([]);
  });

  it('gives every path and query parameter a schema', () => {
    const bare = operations.flatMap(({ route, method, op }) =>
      (op.parameters ?? [])
        .filter((p) => !p.schema?.type)
        .map((p) => `${method.toUpperCase()} ${route} ${p.in}:${p.name}`),
    );
    expect(bare).toEqual([]);
    const lookup = operations.find((o) => o.route === '/api/places/lookup')!;
    expect(
      lookup.op
        .parameters!.filter((p) => p.in === 'query')
        .map((p) => p.name)
        .sort(),
    ).toEqual(['lat', 'lon', 'zip']);
    // The lookup answers in the reader's language, and says so.
    expect(lookup.op.parameters!.filter((p) => p.in === 'header').map((p) => p.name)).toEqual(['Accept-Language']);
    const engine = operations.find((o) => o.route === '/api/mixes/balance')!.op.requestBody!.content![
      'application/json'
    ].schema!;
    expect(Object.keys(engine.properties!)).toEqual(expect.arrayContaining(['site', 'region', 'options']));
  });
});
