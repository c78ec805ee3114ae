import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { runSql } from '../src/common/database/dialect.js';
import { createTestDatabase, TEST_PG_URL } from './support/postgres.js';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';

const SLUG = 'asclepias-tuberosa';
const NEW_NAME = 'Ember-hued prairie milkweed';

/**
 * Two API instances on one PostgreSQL database, as behind a load balancer: each has its own in-memory
 * catalogue (records, search index, list byte cache), and a curator's edit through one must be what the
 * other answers on its very next request. Each instance is a separately compiled Nest application with
 * its own providers; they share only the database (and, as configured, the JWT secret).
 */
const describeOnPostgres = TEST_PG_URL ? describe : describe.skip;
if (!TEST_PG_URL)
  console.log('two-instance test skipped: it needs PostgreSQL (HOMEGROUND_TEST_PG_URL, set by npm run test:pg in CI)');

describeOnPostgres('two API instances on one PostgreSQL database (e2e)', () => {
  let database: Awaited<ReturnType<typeof createTestDatabase>>;
  let a: TestApp;
  let b: TestApp;
  let curator: string;

  beforeAll(async () => {
    database = await createTestDatabase(TEST_PG_URL!);
    a = await createTestApp({ DATABASE_URL: database.url, LOGIN_THROTTLE_LIMIT: '100' });
    b = await createTestApp({ DATABASE_URL: database.url, LOGIN_THROTTLE_LIMIT: '100' });
    const c = await registerUser(a, { email: 'ines.calder@example.org', displayName: 'Ines Calder' });
    await runSql(a.app.get(DataSource), `UPDATE users SET role = 'curator' WHERE id = ?`, [c.id]);
    curator = c.token;
  });
  afterAll(async () => {
    await a?.close();
    await b?.close();
    await database?.drop();
  });

  const search = async (t: TestApp) =>
    (await t.http.get('/api/species').query({ q: NEW_NAME }).expect(200)).body.items.map(
      (s: { slug: string }) => s.slug,
    );

  it("shows a curator's edit made through one instance on the other's next request", async () => {
    // Instance B reads (and caches) the record and a list page before the edit.
    const before = (await b.http.get(`/api/species/${SLUG}`).expect(200)).body;
    expect(before.commonNames).not.toContain(NEW_NAME);
    expect(await search(b)).not.toContain(SLUG);
    expect(await search(b)).not.toContain(SLUG); // now answered from B's list byte cache

    // The edit goes through instance A, with a token A signed: sign-in is stateless, B accepts it too.
    delete before.hasPhoto;
    delete before.photoCredit;
    const edited = { ...before, commonNames: [...before.commonNames, NEW_NAME] };
    await a.http.put(`/api/species/${SLUG}`).set('Authorization', `Bearer ${curator}`).send(edited).expect(200);

    const after = (await b.http.get(`/api/species/${SLUG}`).expect(200)).body;
    expect(after.commonNames).toContain(NEW_NAME);
    expect(await search(b)).toContain(SLUG);
    const history = await b.http.get(`/api/species/${SLUG}/history`).set('Authorization', `Bearer ${curator}`);
    expect(history.status).toBe(200);
    expect(history.body[0]).toMatchObject({ kind: 'edit', changedBy: { displayName: 'Ines Calder' } });
  });

  it('answers the plant share with 503 and the reason on PostgreSQL, on both instances', async () => {
    for (const t of [a, b]) {
      const res = await t.http.get('/api/plant-shares/larkfield-commons-growers').expect(503);
      expect(res.body).toMatchObject({ statusCode: 503, message: expect.stringMatching(/PostgreSQL/) });
    }
  });
});
