import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, type TestApp } from './support/test-app.js';

const SEASON = '/api/groups/larkfield-commons-growers/season';
const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
const today = () => new Date().toISOString().slice(0, 10);

/**
 * Germination really reached becomes the group's default next season. In the demo 2027 season
 * Amara sowed 150 butterfly milkweed seeds (demo-batches.ts); she logs 81 come up, 54 %. When the
 * organiser plans 2028, a target left without a rate takes 54 % (seedlings over seeds sown, the
 * ordinary definition of a germination percentage, common practice); a rate the organiser types
 * wins; a species whose batches logged nothing come up keeps the catalogue's rate.
 */
describe('reached germination as next season’s default (e2e, demo data)', () => {
  let t: TestApp;
  let mara: string;
  let amara: string;
  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100' });
    const signIn = async (email: string, password: string) =>
      (await t.http.post('/api/auth/login').send({ email, password }).expect(200)).body.accessToken as string;
    mara = await signIn('mara.ellsworth@example.org', 'larkfield-mara');
    amara = await signIn('amara.reyes@example.org', 'larkfield-amara');
  });
  afterAll(() => t.close());

  it('fills next season’s targets with the rate the group reached, unless the organiser gives one', async () => {
    const batches = (await t.http.get(`${SEASON}/batches`).set(bearer(amara)).expect(200)).body.batches as {
      id: string;
      slug: string;
    }[];
    const milkweed = batches.find((b) => b.slug === 'asclepias-tuberosa')!;
    await t.http
      .post(`${SEASON}/batches/${milkweed.id}/log`)
      .set(bearer(amara))
      .send({ kind: 'germinated', count: 81, date: today() })
      .expect(201);

    await t.http
      .put(SEASON)
      .set(bearer(mara))
      .send({ year: 2028, lastFrost: '2028-05-10', plantShareDate: '2028-06-10' })
      .expect(200);
    const res = await t.http
      .put(`${SEASON}/targets`)
      .set(bearer(mara))
      .send({
        targets: [
          { slug: 'asclepias-tuberosa', targetPlants: 60 },
          { slug: 'symphyotrichum-lateriflorum', targetPlants: 40 }, // sown in 2027, nothing logged up
          { slug: 'monarda-fistulosa', targetPlants: 40, germinationRatePct: 70 },
        ],
      })
      .expect(200);
    expect(res.body.year).toBe(2028);
    const rate = (slug: string) =>
      (res.body.targets as { slug: string; germinationRatePct?: number }[]).find((x) => x.slug === slug)
        ?.germinationRatePct;
    expect(rate('asclepias-tuberosa')).toBe(54); // 81 / 150 = 0.54
    expect(rate('symphyotrichum-lateriflorum')).toBeUndefined();
    expect(rate('monarda-fistulosa')).toBe(70);

    // The seed list of 2028 works from 54 % for the milkweed, as the group's own rate.
    const seeds = (await t.http.get(`${SEASON}/seed-list`).set(bearer(mara)).expect(200)).body as {
      rows: { slug: string; germinationRatePct: number; germinationFrom: string }[];
    };
    expect(seeds.rows.find((r) => r.slug === 'asclepias-tuberosa')).toMatchObject({
      germinationRatePct: 54,
      germinationFrom: 'yours',
    });
  });
});
