import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { runSql } from '../src/common/database/dialect.js';
import { DemoDataService } from '../src/demo/demo-data.service.js';
import { createTestDatabase, TEST_PG_URL } from './support/postgres.js';
import { bearer, PUBLIC, SHARE, signIn } from './support/plant-share.js';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';

const SLUG = 'asclepias-tuberosa';
const NEW_NAME = 'Ember-hued prairie milkweed';

/**
 * Two API instances on one PostgreSQL database, as behind a load balancer: each has its own in-memory
 * catalogue (records, search index, list byte cache), and a curator's edit through one must be what the
 * other answers on its very next request; and a burst of plant-share reservations split over both
 * must not take more plants than there are. Each instance is a separately compiled Nest application
 * with its own providers; they share only the database (and, as configured, the JWT secret).
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

  it('lets 200 reservations raced across both instances take 50 plants exactly 50 times, never below zero', async () => {
    // The invented demo group's share (DESIGN.md), loaded through A; the organiser signs in through B.
    await a.app.get(DemoDataService).load();
    const organiser = await signIn(b, 'mara.ellsworth@example.org', 'larkfield-mara');
    await a.http
      .put(`${SHARE}/stock`)
      .set(bearer(organiser))
      .send({ stock: [{ speciesSlug: 'viola-canadensis', count: 50 }] })
      .expect(200);
    const slot = await b.http
      .post(`${SHARE}/slots`)
      .set(bearer(organiser))
      .send({ start: '2027-06-12T13:00:00-05:00', end: '2027-06-12T14:00:00-05:00', capacity: 500 })
      .expect(201);
    const slotId = slot.body.slots.find((s: { start: string }) => s.start === '2027-06-12T13:00:00-05:00').id;

    // Both instances on real sockets, as behind a load balancer: even requests to A, odd ones to B, all at once.
    const bases: string[] = [];
    for (const t of [a, b]) {
      await t.app.listen(0, '127.0.0.1');
      bases.push(`http://127.0.0.1:${(t.app.getHttpServer().address() as AddressInfo).port}`);
    }
    const results = await Promise.all(
      Array.from({ length: 200 }, async (_v, i) => {
        const res = await fetch(`${bases[i % 2]}${PUBLIC}/reservations`, {
          method: 'POST',
          headers: { 'Content-Type': 'application/json' },
          body: JSON.stringify({
            name: `Household ${i + 1}`,
            email: `race-${i + 1}@example.org`,
            zip: '54665',
            slotId,
            lines: [{ speciesSlug: 'viola-canadensis', count: 1 }],
          }),
        });
        return {
          status: res.status,
          body: (await res.json()) as { message: string; fields: unknown; waitlist: { speciesSlugs: string[] } },
        };
      }),
    );

    // Homeground's rule: no more plants reserved than there are; everyone else is told "all taken" and
    // offered the waitlist (the same answer plant-share-concurrency.e2e-spec.ts expects on one instance).
    const confirmed = results.filter((r) => r.status === 201);
    const refused = results.filter((r) => r.status !== 201);
    expect(confirmed).toHaveLength(50);
    expect(refused).toHaveLength(150);
    for (const r of refused) {
      expect(r.status).toBe(409);
      expect(r.body.message).toMatch(/^All taken/);
      expect(r.body.fields).toEqual([{ field: 'lines.0.count', message: 'all taken' }]);
      expect(r.body.waitlist.speciesSlugs).toEqual(['viola-canadensis']);
    }
    // Read back from the database itself, not from either instance's answers.
    const db = a.app.get(DataSource);
    const n = async (sql: string, ...params: unknown[]) => Number((await runSql<{ n: number }>(db, sql, params))[0].n);
    expect(await n(`SELECT remaining AS n FROM share_stock WHERE slug = 'viola-canadensis'`)).toBe(0);
    expect(await n('SELECT COUNT(*) AS n FROM share_stock WHERE remaining < 0')).toBe(0);
    expect(
      await n(
        `SELECT SUM(l.count) AS n FROM share_reservation_lines l JOIN share_reservations r ON r.id = l.reservation_id
         WHERE l.slug = 'viola-canadensis' AND r.status = 'confirmed' AND r.email LIKE 'race-%'`,
      ),
    ).toBe(50);
    expect(await n('SELECT booked AS n FROM share_slots WHERE id = ?', slotId)).toBe(50);
  });
});
