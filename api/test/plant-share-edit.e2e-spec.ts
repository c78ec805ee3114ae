import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { DEMO_RESERVATIONS, DEMO_SHARE } from '../src/demo/demo-share.js';
import { ShareMailQueue } from '../src/plant-share/share-mail-queue.js';
import { bearer, demoTokens, mailTo, PUBLIC, PUBLIC_URL, SHARE, shareSnapshot } from './support/plant-share.js';
import { createTestApp, type TestApp } from './support/test-app.js';

type Tokens = Awaited<ReturnType<typeof demoTokens>>;
interface StockLine {
  speciesSlug: string;
  offered: number;
  remaining: number;
}

// The organiser's changes after opening: never below what households were promised. The demo share
// (invented, DESIGN.md) has Priya's 3 butterfly milkweed + 2 wild bergamot and Sol's 2 + 4 + 2 reserved.
describe('changing an open plant share (e2e, demo data)', () => {
  let t: TestApp;
  let tokens: Tokens;
  let slotIds: string[];
  const household = (n: number) => ({
    name: `Household ${n}`,
    email: `household-${n}@example.org`,
    zip: '54665',
  });

  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100', PUBLIC_URL });
    tokens = await demoTokens(t);
    slotIds = (await t.http.get(PUBLIC).expect(200)).body.slots.map((s: { id: string }) => s.id);
  });
  afterAll(async () => {
    await t.app.get(ShareMailQueue).idle();
    await t.close();
  });

  it("reports germination by method and grower from the growers' batch logs, as counts and first names", async () => {
    // The demo season has sowings logged (invented, DESIGN.md); the report's sums must equal the log's own.
    const db = t.app.get(DataSource);
    const logged: { method: string; kind: string; n: number }[] = await db.query(
      `SELECT b.method, e.kind, SUM(e.count) AS n FROM batch_log_entries e JOIN batches b ON b.id = e.batch_id
       GROUP BY b.method, e.kind`,
    );
    const sum = (method: string, kind: string) =>
      Number(logged.find((l) => l.method === method && l.kind === kind)?.n ?? 0);
    const report = await t.http.get(`${SHARE}/report`).set(bearer(tokens.organiser)).expect(200);
    const g = report.body.germination;
    expect(g).not.toBeNull();
    expect(g.byMethod.length).toBeGreaterThan(0);
    for (const m of g.byMethod)
      expect(m).toEqual({
        method: m.method,
        sown: sum(m.method, 'sown'),
        germinated: sum(m.method, 'germinated'),
        ready: sum(m.method, 'ready'),
      });
    const sownInAll = logged.filter((l) => l.kind === 'sown').reduce((n, l) => n + Number(l.n), 0);
    expect(g.byGrower.reduce((n: number, r: { sown: number }) => n + r.sown, 0)).toBe(sownInAll);
    // First names only (DESIGN.md's growers: Juniper Okafor, Theo Lindqvist, Amara Reyes).
    expect(JSON.stringify(g)).not.toMatch(/Okafor|Lindqvist|Reyes|@/);
    const csv = await t.http.get(`${SHARE}/report.csv`).set(bearer(tokens.organiser)).expect(200);
    expect(csv.text).toMatch(/germination by method,/);
  });

  it('refuses limits below what a household has reserved, naming each limit, and writes nothing', async () => {
    // Sol's demo reservation has 4 of one species and 8 plants in all: the largest of the two.
    const most = Math.max(...DEMO_RESERVATIONS.flatMap((r) => r.lines.map((l) => l.count)));
    const total = Math.max(...DEMO_RESERVATIONS.map((r) => r.lines.reduce((n, l) => n + l.count, 0)));
    expect([most, total]).toEqual([4, 8]);
    const before = await shareSnapshot(t);
    const res = await t.http
      .patch(SHARE)
      .set(bearer(tokens.organiser))
      .send({ limits: { perSpecies: 3, total: 7 } })
      .expect(400);
    expect(res.body.fields).toEqual([
      { field: 'limits.perSpecies', message: expect.stringContaining('at least 4') },
      { field: 'limits.total', message: expect.stringContaining('at least 8') },
    ]);
    expect(await shareSnapshot(t)).toEqual(before);
    // At exactly what is reserved it is accepted.
    const ok = await t.http
      .patch(SHARE)
      .set(bearer(tokens.organiser))
      .send({ limits: { perSpecies: 4, total: 8 } })
      .expect(200);
    expect(ok.body.limits).toEqual({ perSpecies: 4, total: 8 });
    await t.http.patch(SHARE).set(bearer(tokens.organiser)).send({ limits: DEMO_SHARE.limits }).expect(200);
  });

  it('refuses to move the day once households have booked on it (409 naming the date), writing nothing', async () => {
    const before = await shareSnapshot(t);
    const days = await t.app.get(DataSource).query(`SELECT starts_at FROM share_slots ORDER BY starts_at_ms`);
    const res = await t.http.patch(SHARE).set(bearer(tokens.organiser)).send({ date: '2027-06-19' }).expect(409);
    expect(res.body.fields).toEqual([{ field: 'date', message: expect.any(String) }]);
    expect(res.body.message).toMatch(/2 households have booked/);
    expect(await shareSnapshot(t)).toEqual(before);
    expect(await t.app.get(DataSource).query(`SELECT starts_at FROM share_slots ORDER BY starts_at_ms`)).toEqual(days);
  });

  it('says what to bring on the public page, the confirmation page and in the confirmation e-mail', async () => {
    const words = 'A sturdy box, and any clean 4-inch pots you can spare.';
    const edited = await t.http.patch(SHARE).set(bearer(tokens.organiser)).send({ whatToBring: words }).expect(200);
    expect(edited.body.whatToBring).toBe(words);
    expect((await t.http.get(PUBLIC).expect(200)).body.whatToBring).toBe(words);
    const made = await t.http
      .post(`${PUBLIC}/reservations`)
      .send({ ...household(1), slotId: slotIds[2], lines: [{ speciesSlug: 'rudbeckia-hirta', count: 1 }] })
      .expect(201);
    expect(made.body.share.whatToBring).toBe(words);
    const mail = await mailTo(t, tokens.organiser, 'plant-share-reservation', household(1).email);
    expect(mail?.text).toContain(`What to bring: ${words}`);
    // An empty note clears it.
    const cleared = await t.http.patch(SHARE).set(bearer(tokens.organiser)).send({ whatToBring: '' }).expect(200);
    expect(cleared.body.whatToBring).toBeNull();
  });

  it('adds a new species to the stock and offers new plants to the waitlist in the order households joined', async () => {
    const slug = 'penstemon-digitalis';
    const share = await t.http.get(SHARE).set(bearer(tokens.organiser)).expect(200);
    // Not in the demo season's stock: a species that got ready without being planned.
    expect(share.body.stock.find((s: StockLine) => s.speciesSlug === slug)).toBeUndefined();
    const added = await t.http
      .post(`${SHARE}/stock/add`)
      .set(bearer(tokens.organiser))
      .send({ lines: [{ speciesSlug: slug, count: 1 }] })
      .expect(200);
    expect(added.body.stock.at(-1)).toMatchObject({ speciesSlug: slug, offered: 1, remaining: 1 });
    expect((await t.http.get(PUBLIC).expect(200)).body.species.map((s: { slug: string }) => s.slug)).toContain(slug);
    // One household takes it; two more join its waitlist.
    await t.http
      .post(`${PUBLIC}/reservations`)
      .send({ ...household(2), slotId: slotIds[3], lines: [{ speciesSlug: slug, count: 1 }] })
      .expect(201);
    for (const n of [3, 4])
      await t.http
        .post(`${PUBLIC}/waitlist`)
        .send({ ...household(n), lines: [{ speciesSlug: slug, count: 2 }] })
        .expect(201);
    // Members see no one else's name: the waitlist is the organisers'.
    await t.http.get(`${SHARE}/waitlist`).set(bearer(tokens.member)).expect(403);
    const waiting = await t.http.get(`${SHARE}/waitlist`).set(bearer(tokens.organiser)).expect(200);
    const entries = waiting.body.species.find((s: { speciesSlug: string }) => s.speciesSlug === slug).entries;
    expect(
      entries.map((e: { name: string; position: number; status: string }) => [e.name, e.position, e.status]),
    ).toEqual([
      ['Household 3', 1, 'waiting'],
      ['Household 4', 2, 'waiting'],
    ]);

    // Three plants got ready: two are held for Household 3 (first in line), one for Household 4.
    await t.http
      .post(`${SHARE}/stock/add`)
      .set(bearer(tokens.organiser))
      .send({ lines: [{ speciesSlug: slug, count: 3 }] })
      .expect(200);
    const offered = await t.http.get(`${SHARE}/waitlist`).set(bearer(tokens.organiser)).expect(200);
    const now = offered.body.species.find((s: { speciesSlug: string }) => s.speciesSlug === slug);
    expect(now.entries.map((e: { name: string; held: number; status: string }) => [e.name, e.held, e.status])).toEqual([
      ['Household 3', 2, 'offered'],
      ['Household 4', 1, 'offered'],
    ]);
    expect(now.remaining).toBe(0);
    // Held for two days (Homeground's rule, OFFER_HOLD_MS), and each household is e-mailed its offer.
    expect(Date.parse(now.entries[0].heldUntil) - Date.now()).toBeGreaterThan(47 * 3600_000);
    expect(await mailTo(t, tokens.organiser, 'plant-share-waitlist-offer', household(3).email)).toBeDefined();
  });
});
