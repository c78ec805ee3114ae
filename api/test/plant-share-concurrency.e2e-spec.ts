import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { runSql } from '../src/common/database/dialect.js';
import { ShareMailQueue } from '../src/plant-share/share-mail-queue.js';
import { bearer, demoTokens, PUBLIC, PUBLIC_URL, SHARE } from './support/plant-share.js';
import { createTestApp, type TestApp } from './support/test-app.js';

interface Answer {
  status: number;
  body: { message: string; fields: { field: string; message: string }[]; waitlist: { speciesSlugs: string[] } };
}

/**
 * Many households reserving at once over real sockets: every reservation is one transaction of
 * conditional decrements, so the stock and the slot's places are taken exactly once each.
 */
describe('plant share under concurrent reservations (e2e, demo data)', () => {
  let t: TestApp;
  let base: string;
  let organiser: string;

  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100', PUBLIC_URL });
    organiser = (await demoTokens(t)).organiser;
    await t.app.listen(0, '127.0.0.1');
    base = `http://127.0.0.1:${(t.app.getHttpServer().address() as AddressInfo).port}`;
  });
  afterAll(async () => {
    // Confirmation e-mails go out after the answers: let the last ones reach the local server first.
    await t.app.get(ShareMailQueue).idle();
    await t.close();
  });

  /** Adds a slot on share day and answers its id. */
  async function addSlot(start: string, end: string, capacity: number): Promise<string> {
    const res = await t.http.post(`${SHARE}/slots`).set(bearer(organiser)).send({ start, end, capacity }).expect(201);
    return res.body.slots.find((s: { start: string }) => s.start === start).id;
  }

  /** `n` households at once, each asking for one plant of `slug` in `slotId`. */
  function race(n: number, tag: string, slug: string, slotId: string): Promise<Answer[]> {
    return Promise.all(
      Array.from({ length: n }, async (_v, i) => {
        const res = await fetch(`${base}${PUBLIC}/reservations`, {
          method: 'POST',
          headers: { 'Content-Type': 'application/json' },
          body: JSON.stringify({
            name: `Household ${i + 1}`,
            email: `${tag}-${i + 1}@example.org`,
            zip: '54665',
            slotId,
            lines: [{ speciesSlug: slug, count: 1 }],
          }),
        });
        return { status: res.status, body: (await res.json()) as Answer['body'] };
      }),
    );
  }

  const count = (sql: string, ...params: unknown[]) =>
    runSql<{ n: number }>(t.app.get(DataSource), sql, params).then((r) => Number(r[0].n));

  it('gives 200 concurrent reservations for 50 plants exactly 50 confirmations; the rest "all taken" with the waitlist', async () => {
    await t.http
      .put(`${SHARE}/stock`)
      .set(bearer(organiser))
      .send({ stock: [{ speciesSlug: 'viola-canadensis', count: 50 }] })
      .expect(200);
    const slotId = await addSlot('2027-06-12T13:00:00-05:00', '2027-06-12T14:00:00-05:00', 500);
    const results = await race(200, 'stock', 'viola-canadensis', slotId);

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
    const stock = await t.app
      .get(DataSource)
      .query(`SELECT remaining FROM share_stock WHERE slug = 'viola-canadensis'`);
    expect(stock).toEqual([{ remaining: 0 }]);
    expect(
      await count(
        `SELECT SUM(l.count) AS n FROM share_reservation_lines l JOIN share_reservations r ON r.id = l.reservation_id
         WHERE l.slug = 'viola-canadensis' AND r.status = 'confirmed' AND r.email LIKE 'stock-%'`,
      ),
    ).toBe(50);
    expect(await count('SELECT booked AS n FROM share_slots WHERE id = ?', slotId)).toBe(50);
    expect(await count('SELECT COUNT(*) AS n FROM share_stock WHERE remaining < 0')).toBe(0);
    // Each confirmed household got its e-mail.
    await t.app.get(ShareMailQueue).idle();
    expect(
      await count(
        `SELECT COUNT(*) AS n FROM outbox_messages WHERE kind = 'plant-share-reservation' AND "to" LIKE '%stock-%'`,
      ),
    ).toBe(50);
  });

  it('gives 100 concurrent reservations for a slot of 20 households exactly 20 places; the rest "slot full"', async () => {
    await t.http
      .put(`${SHARE}/stock`)
      .set(bearer(organiser))
      .send({ stock: [{ speciesSlug: 'rudbeckia-hirta', count: 1000 }] })
      .expect(200);
    const slotId = await addSlot('2027-06-12T14:00:00-05:00', '2027-06-12T14:30:00-05:00', 20);
    const results = await race(100, 'slot', 'rudbeckia-hirta', slotId);
    expect(results.filter((r) => r.status === 201)).toHaveLength(20);
    for (const r of results.filter((x) => x.status !== 201)) {
      expect(r.status).toBe(409);
      expect(r.body.fields).toEqual([{ field: 'slotId', message: 'is full' }]);
    }
    expect(await count('SELECT booked AS n FROM share_slots WHERE id = ?', slotId)).toBe(20);
    expect(await count(`SELECT COUNT(*) AS n FROM share_reservations WHERE slot_id = ?`, slotId)).toBe(20);
    // Refused requests took no plants: 1,000 on offer less the 20 given places.
    expect(await count(`SELECT remaining AS n FROM share_stock WHERE slug = 'rudbeckia-hirta'`)).toBe(980);
  });
});
