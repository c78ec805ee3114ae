import { afterAll, afterEach, beforeAll, describe, expect, it, jest } from '@jest/globals';
import { Clock } from '../src/plant-share/clock.js';
import { ShareMailQueue } from '../src/plant-share/share-mail-queue.js';
import { SharePurgeService } from '../src/plant-share/share-purge.service.js';
import { DEMO_RESERVATIONS, DEMO_SHARE } from '../src/demo/demo-share.js';
import { DEMO_TARGETS } from '../src/demo/demo-season.js';
import {
  bearer,
  demoTokens,
  linkSecret,
  mailTo,
  PUBLIC,
  PUBLIC_URL,
  SHARE,
  shareSnapshot,
} from './support/plant-share.js';
import { createTestApp, type TestApp } from './support/test-app.js';

type Tokens = Awaited<ReturnType<typeof demoTokens>>;
interface Slot {
  id: string;
  start: string;
  end: string;
  left: number;
}

describe('the plant share (e2e, demo data)', () => {
  let t: TestApp;
  let tokens: Tokens;
  let slots: Slot[];
  const taker = (n: string, lines: { speciesSlug: string; count: number }[], slot = 3) => ({
    name: n,
    email: `${n.toLowerCase().replace(/ /g, '.')}@example.org`,
    zip: '54665',
    slotId: slots[slot].id,
    lines,
  });

  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100', PUBLIC_URL });
    tokens = await demoTokens(t);
    slots = (await t.http.get(PUBLIC).expect(200)).body.slots;
  });
  afterAll(async () => {
    await t.app.get(ShareMailQueue).idle();
    await t.close();
  });
  afterEach(() => {
    jest.restoreAllMocks();
  });

  it('loads the demo share: Larkfield Commons Hall on the second Saturday of June 2027, six slots, two reservations', async () => {
    const res = await t.http.get(SHARE).set(bearer(tokens.organiser)).expect(200);
    // 1 June 2027 is a Tuesday (Gregorian calendar), so the second Saturday is 12 June.
    expect(res.body).toMatchObject({ date: '2027-06-12', status: 'open', place: { name: 'Larkfield Commons Hall' } });
    expect(new Date('2027-06-12T12:00:00Z').getUTCDay()).toBe(6);
    expect(res.body.slots).toHaveLength(DEMO_SHARE.slots.length);
    expect(res.body.households.confirmed).toBe(DEMO_RESERVATIONS.length);
    const tuberosa = res.body.stock.find((s: { speciesSlug: string }) => s.speciesSlug === 'asclepias-tuberosa');
    // Initial stock is the season's target; Priya's demo reservation holds 3 of them.
    expect(tuberosa).toMatchObject({ offered: 50, remaining: 47, reserved: 3, given: 0 });
    expect(res.body.personalDataKeptUntil).toBe('2027-07-12');
  });

  it('shows the public list with plants left and the fact-card cautions, and ranks it for a wet sunny yard', async () => {
    const plain = await t.http.get(PUBLIC).expect(200);
    expect(plain.body.species).toHaveLength(DEMO_TARGETS.length);
    const tuberosa = plain.body.species.find((s: { slug: string }) => s.slug === 'asclepias-tuberosa');
    expect(tuberosa.remaining).toBe(47);
    // Milkweed sap irritates eyes (UF-MW in CHECK-VALUES: cardiac glycosides, corneal injury).
    expect(tuberosa.cautions.map((c: { kind: string }) => c.kind)).toContain('sap-irritant');
    expect(JSON.stringify(plain.body)).not.toMatch(/example\.org|Vantongeren|Marchetti/);
    expect(plain.body.notes.join(' ')).toMatch(/811/);

    const wet = await t.http.get(PUBLIC).query({ sun: 'full', moisture: 'wet' }).expect(200);
    const order = wet.body.species.map((s: { slug: string }) => s.slug);
    // Swamp milkweed is a plant of wet ground, butterfly weed of dry (from memory; the records agree).
    expect(order.indexOf('asclepias-incarnata')).toBeLessThan(order.indexOf('asclepias-tuberosa'));
    const incarnata = wet.body.species.find((s: { slug: string }) => s.slug === 'asclepias-incarnata');
    expect(incarnata.fit.fit).toBe('thrives');
    expect(incarnata.fit.why.join(' ')).toMatch(/wet/);
    expect(JSON.stringify(wet.body)).not.toMatch(/"score"|points/);
    await t.http.get(PUBLIC).query({ sun: 'full' }).expect(400);
  });

  it('runs the whole flow: reserve → e-mail with the slot → change by link → check in → walk-up → report', async () => {
    const reserved = await t.http
      .post(`${PUBLIC}/reservations`)
      .send(
        taker('Amara Reyes', [
          { speciesSlug: 'asclepias-incarnata', count: 3 },
          { speciesSlug: 'monarda-fistulosa', count: 2 },
        ]),
      )
      .expect(201);
    expect(reserved.body).toMatchObject({ status: 'confirmed', name: 'Amara Reyes', canChange: true });
    expect(reserved.body.slot.start).toBe('2027-06-12T10:30:00-05:00');

    const mail = await mailTo(t, tokens.organiser, 'plant-share-reservation', 'amara.reyes@example.org');
    expect(mail).toBeDefined();
    expect(mail!.subject).toContain('10:30–11:00');
    expect(mail!.text).toContain('Pickup slot: Sat, Jun 12, 2027, 10:30–11:00.');
    expect(mail!.text).toContain('Larkfield Commons Hall');
    // The care sheet: sun, moisture, spacing in both units, and the milkweed's cautions.
    expect(mail!.text).toMatch(/swamp milkweed \(Asclepias incarnata\): Best in full sun/i);
    expect(mail!.text).toMatch(/apart/);
    expect(mail!.text).toMatch(/Irritating sap/);
    const secret = linkSecret(mail!.text, 'reservations');
    expect(reserved.body.manageUrl).toBe(`${PUBLIC_URL}/plant-share/reservations/${secret}`);

    const seen = await t.http.get(`/api/reservations/${secret}`).expect(200);
    expect(seen.body.lines.map((l: { count: number }) => l.count)).toEqual([3, 2]);

    const changed = await t.http
      .put(`/api/reservations/${secret}`)
      .send({ slotId: slots[4].id, lines: [{ speciesSlug: 'asclepias-incarnata', count: 4 }] })
      .expect(200);
    expect(changed.body.slot.id).toBe(slots[4].id);
    const after = (await t.http.get(SHARE).set(bearer(tokens.organiser)).expect(200)).body;
    const stockOf = (slug: string) => after.stock.find((s: { speciesSlug: string }) => s.speciesSlug === slug);
    // 50 − 2 (Sol's demo reservation) − 4; monarda back to 50 − 2 (Priya's).
    expect(stockOf('asclepias-incarnata').remaining).toBe(44);
    expect(stockOf('monarda-fistulosa').remaining).toBe(48);
    expect(after.slots[3].booked).toBe(0);
    expect(after.slots[4].booked).toBe(1);
    const changedMail = await mailTo(
      t,
      tokens.organiser,
      'plant-share-reservation',
      'amara.reyes@example.org',
      /has changed/,
    );
    expect(changedMail).toBeDefined();
    expect(changedMail!.text).toContain('11:00–11:30');

    const list = await t.http
      .get(`${SHARE}/slots/${slots[4].id}/pickup-list`)
      .set(bearer(tokens.organiser))
      .expect(200);
    expect(list.body.households).toEqual([
      expect.objectContaining({ name: 'Amara Reyes', email: 'amara.reyes@example.org', plants: 4 }),
    ]);
    const checked = await t.http
      .post(`${SHARE}/reservations/${reserved.body.id}/check-in`)
      .set(bearer(tokens.organiser))
      .send({ outcome: 'picked-up' })
      .expect(200);
    expect(checked.body.household.status).toBe('picked-up');
    await t.http
      .post(`${SHARE}/reservations/${reserved.body.id}/check-in`)
      .set(bearer(tokens.organiser))
      .send({ outcome: 'no-show' })
      .expect(409);
    await t.http.put(`/api/reservations/${secret}`).send({ slotId: slots[5].id }).expect(409);

    await t.http
      .post(`${SHARE}/walk-ups`)
      .set(bearer(tokens.organiser))
      .send({ lines: [{ speciesSlug: 'solidago-speciosa', count: 2 }], zip: '53703' })
      .expect(201);

    const report = (await t.http.get(`${SHARE}/report`).set(bearer(tokens.organiser)).expect(200)).body;
    // Hand-counted: 4 swamp milkweed picked up + 2 showy goldenrod at walk-up; 2 households; 12 targets × 50.
    expect(report.totals).toMatchObject({
      plantsGiven: 6,
      households: 2,
      walkUps: 1,
      milkweedPlants: 4,
      species: 2,
      targetPlants: 600,
      shareOfTargets: 0.01,
    });
    expect(report.zipAreas).toEqual([
      { area: '537', households: 1 },
      { area: '546', households: 1 },
    ]);
    // Germination comes from the demo batch logs (plant-share-edit.e2e-spec checks its sums).
    expect(report.germination).not.toBeNull();
    const text = JSON.stringify(report);
    // No taker's name, e-mail or full ZIP. Growers appear by first name only, and the demo grower
    // Amara shares hers with this test's taker, so the taker's surname is what must not appear.
    expect(text).not.toMatch(/example\.org|Reyes|54665|53703/);
    const csv = await t.http.get(`${SHARE}/report.csv`).set(bearer(tokens.organiser)).expect(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(csv.text).toContain('546xx');
    expect(csv.text).not.toMatch(/example\.org|Reyes|54665/);
  });

  it('refuses bad input with 400 naming the field, and writes nothing', async () => {
    const cases: [string, unknown, string][] = [
      ['a count of 0', taker('Theo Lindqvist', [{ speciesSlug: 'asclepias-tuberosa', count: 0 }]), 'lines.0.count'],
      [
        'a count of 1,000',
        taker('Theo Lindqvist', [{ speciesSlug: 'asclepias-tuberosa', count: 1000 }]),
        'lines.0.count',
      ],
      [
        'over the limit per species',
        taker('Theo Lindqvist', [{ speciesSlug: 'asclepias-tuberosa', count: 5 }]),
        'lines.0.count',
      ],
      [
        'over the total limit',
        taker('Theo Lindqvist', [
          { speciesSlug: 'asclepias-tuberosa', count: 4 },
          { speciesSlug: 'monarda-fistulosa', count: 4 },
          { speciesSlug: 'rudbeckia-hirta', count: 4 },
          { speciesSlug: 'viola-canadensis', count: 1 },
        ]),
        'lines',
      ],
      [
        'a species not on offer',
        taker('Theo Lindqvist', [{ speciesSlug: 'zizia-aurea', count: 1 }]),
        'lines.0.speciesSlug',
      ],
      [
        'a slot of another share',
        {
          ...taker('Theo Lindqvist', [{ speciesSlug: 'rudbeckia-hirta', count: 1 }]),
          slotId: '0b7b1d1e-4a4f-4c59-9d4a-0d1f4e8b9c21',
        },
        'slotId',
      ],
      [
        'a ZIP of four digits',
        { ...taker('Theo Lindqvist', [{ speciesSlug: 'rudbeckia-hirta', count: 1 }]), zip: '5466' },
        'zip',
      ],
      [
        'a phone number nobody asked for',
        { ...taker('Theo Lindqvist', [{ speciesSlug: 'rudbeckia-hirta', count: 1 }]), phone: '555' },
        'phone',
      ],
    ];
    for (const [what, body, field] of cases) {
      const before = await shareSnapshot(t);
      const res = await t.http.post(`${PUBLIC}/reservations`).send(body as object);
      expect({ what, status: res.status }).toEqual({ what, status: 400 });
      expect(res.body.fields.map((f: { field: string }) => f.field)).toContain(field);
      expect(await shareSnapshot(t)).toEqual(before);
    }
  });

  it('refuses a slot in the past (400) and a full slot (409), naming the slot, and writes nothing', async () => {
    // The clock moves to 09:45 Central on share day: the 09:00 and 09:30 slots have started.
    jest.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date('2027-06-12T14:45:00Z'));
    let before = await shareSnapshot(t);
    const past = await t.http
      .post(`${PUBLIC}/reservations`)
      .send(taker('Theo Lindqvist', [{ speciesSlug: 'rudbeckia-hirta', count: 1 }], 1))
      .expect(400);
    expect(past.body.fields).toEqual([{ field: 'slotId', message: expect.stringMatching(/past/) }]);
    expect(await shareSnapshot(t)).toEqual(before);
    jest.restoreAllMocks();

    const added = await t.http
      .post(`${SHARE}/slots`)
      .set(bearer(tokens.organiser))
      .send({ start: '2027-06-12T12:00:00-05:00', end: '2027-06-12T12:30:00-05:00', capacity: 1 })
      .expect(201);
    const small = added.body.slots.find((s: { capacity: number }) => s.capacity === 1);
    await t.http
      .post(`${PUBLIC}/reservations`)
      .send({ ...taker('Theo Lindqvist', [{ speciesSlug: 'rudbeckia-hirta', count: 1 }]), slotId: small.id })
      .expect(201);
    before = await shareSnapshot(t);
    const full = await t.http
      .post(`${PUBLIC}/reservations`)
      .send({ ...taker('Juniper Okafor', [{ speciesSlug: 'rudbeckia-hirta', count: 1 }]), slotId: small.id })
      .expect(409);
    expect(full.body.fields).toEqual([{ field: 'slotId', message: 'is full' }]);
    expect(await shareSnapshot(t)).toEqual(before);
    // A second reservation by the same household is refused too: the limits hold across reservations.
    const twice = await t.http
      .post(`${PUBLIC}/reservations`)
      .send(taker('Theo Lindqvist', [{ speciesSlug: 'rudbeckia-hirta', count: 1 }]))
      .expect(409);
    expect(twice.body.fields[0].field).toBe('email');
    expect(await shareSnapshot(t)).toEqual(before);
  });

  it('answers a paused or closed share with 409, and a forged link with 403, writing nothing', async () => {
    for (const status of ['paused', 'closed'] as const) {
      await t.http.put(`${SHARE}/status`).set(bearer(tokens.organiser)).send({ status }).expect(200);
      const before = await shareSnapshot(t);
      const res = await t.http
        .post(`${PUBLIC}/reservations`)
        .send(taker('Ines Calder', [{ speciesSlug: 'rudbeckia-hirta', count: 1 }]))
        .expect(409);
      expect(res.body.message).toMatch(status === 'paused' ? /paused/ : /closed/);
      expect(await shareSnapshot(t)).toEqual(before);
    }
    await t.http.put(`${SHARE}/status`).set(bearer(tokens.organiser)).send({ status: 'open' }).expect(200);

    const before = await shareSnapshot(t);
    const forged = 'A'.repeat(43);
    await t.http.get(`/api/reservations/${forged}`).expect(403);
    await t.http.put(`/api/reservations/${forged}`).send({ slotId: slots[5].id }).expect(403);
    await t.http.delete(`/api/reservations/${forged}`).expect(403);
    const bad = await t.http.get('/api/reservations/not-a-link').expect(400);
    expect(bad.body.fields[0].field).toBe('token');
    expect(await shareSnapshot(t)).toEqual(before);
  });

  it('answers "all taken" with a waitlist offer, and offers freed plants to the waitlist in order', async () => {
    await t.http
      .put(`${SHARE}/stock`)
      .set(bearer(tokens.organiser))
      .send({ stock: [{ speciesSlug: 'packera-aurea', count: 2 }] })
      .expect(200);
    const first = await t.http
      .post(`${PUBLIC}/reservations`)
      .send(taker('Wes Hollenbeck', [{ speciesSlug: 'packera-aurea', count: 2 }]))
      .expect(201);
    const before = await shareSnapshot(t);
    const taken = await t.http
      .post(`${PUBLIC}/reservations`)
      .send(taker('Ines Calder', [{ speciesSlug: 'packera-aurea', count: 1 }]))
      .expect(409);
    expect(taken.body.message).toMatch(/^All taken/);
    expect(taken.body.waitlist).toEqual({
      speciesSlugs: ['packera-aurea'],
      path: '/api/plant-shares/larkfield-commons-growers/waitlist',
    });
    expect(await shareSnapshot(t)).toEqual(before);

    for (const who of ['Ines Calder', 'Juniper Okafor']) {
      const joined = await t.http
        .post(taken.body.waitlist.path)
        .send({
          name: who,
          email: `${who.toLowerCase().replace(' ', '.')}@example.org`,
          zip: '54665',
          lines: [{ speciesSlug: 'packera-aurea', count: 1 }],
        })
        .expect(201);
      expect(joined.body.entries[0].speciesSlug).toBe('packera-aurea');
    }
    // Wes cancels one of his two: the plant goes to Ines, who joined first; none back on offer.
    const wesLink = /reservations\/([A-Za-z0-9_-]{43})$/.exec(first.body.manageUrl)![1];
    await t.http
      .put(`/api/reservations/${wesLink}`)
      .send({ lines: [{ speciesSlug: 'packera-aurea', count: 1 }] })
      .expect(200);
    const offer = await mailTo(t, tokens.organiser, 'plant-share-waitlist-offer', 'ines.calder@example.org');
    expect(offer?.text).toMatch(/1 × golden ragwort/i);
    expect(
      await mailTo(t, tokens.organiser, 'plant-share-waitlist-offer', 'juniper.okafor@example.org'),
    ).toBeUndefined();
    const share = (await t.http.get(SHARE).set(bearer(tokens.organiser)).expect(200)).body;
    expect(share.stock.find((s: { speciesSlug: string }) => s.speciesSlug === 'packera-aurea')).toMatchObject({
      remaining: 0,
      waitlisted: 1,
    });
    const offerView = await t.http.get(`/api/waitlist-offers/${linkSecret(offer!.text, 'offers')}`).expect(200);
    expect(offerView.body).toMatchObject({
      speciesSlug: 'packera-aurea',
      count: 1,
      status: 'offered',
      joinsReservation: false,
    });
    expect(offerView.body.slots).toHaveLength(slots.length + 1);
    await t.http.get(`/api/waitlist-offers/${'B'.repeat(43)}`).expect(403);
    const claimed = await t.http
      .post(`/api/waitlist-offers/${linkSecret(offer!.text, 'offers')}/claim`)
      .send({ slotId: slots[5].id })
      .expect(201);
    expect(claimed.body.lines).toEqual([expect.objectContaining({ speciesSlug: 'packera-aurea', count: 1 })]);
    await t.http
      .post(`/api/waitlist-offers/${linkSecret(offer!.text, 'offers')}/claim`)
      .send({ slotId: slots[5].id })
      .expect(410);

    // Wes cancels his last one: it is held for Juniper, next on the list, for two days; unclaimed, it goes back on offer.
    await t.http.delete(`/api/reservations/${wesLink}`).expect(200);
    const second = await mailTo(t, tokens.organiser, 'plant-share-waitlist-offer', 'juniper.okafor@example.org');
    expect(second?.text).toMatch(/We hold them for you until/);
    const juniperLink = linkSecret(second!.text, 'offers');
    const held = (await t.http.get(`/api/waitlist-offers/${juniperLink}`).expect(200)).body;
    const heldMs = Date.parse(held.heldUntil) - Date.now();
    expect(heldMs).toBeGreaterThan(47 * 3600_000);
    expect(heldMs).toBeLessThanOrEqual(48 * 3600_000);
    const purge = t.app.get(SharePurgeService);
    expect(await purge.expireOffers()).toBe(0);
    jest.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(Date.parse(held.heldUntil) + 60_000));
    expect(await purge.expireOffers()).toBe(1);
    await t.http.post(`/api/waitlist-offers/${juniperLink}/claim`).send({ slotId: slots[5].id }).expect(410);
    jest.restoreAllMocks();
    expect((await t.http.get(`/api/waitlist-offers/${juniperLink}`).expect(200)).body.status).toBe('expired');
    const after = (await t.http.get(SHARE).set(bearer(tokens.organiser)).expect(200)).body;
    expect(after.stock.find((s: { speciesSlug: string }) => s.speciesSlug === 'packera-aurea')).toMatchObject({
      remaining: 1,
      waitlisted: 0,
    });
  });

  it('releases the plants of a no-show: to the waitlist first, the rest back on offer', async () => {
    const list = await t.http
      .get(`${SHARE}/slots/${slots[2].id}/pickup-list`)
      .set(bearer(tokens.organiser))
      .expect(200);
    const sol = list.body.households.find((h: { name: string }) => h.name === 'Sol Marchetti');
    expect(sol.lines.map((l: { speciesSlug: string; count: number }) => [l.speciesSlug, l.count])).toEqual([
      ['asclepias-incarnata', 2],
      ['symphyotrichum-lateriflorum', 4],
      ['carex-vulpinoidea', 2],
    ]);
    // One household waits for a fox sedge: it gets one of Sol's two; the other goes back on offer.
    await t.http
      .put(`${SHARE}/stock`)
      .set(bearer(tokens.organiser))
      .send({ stock: [{ speciesSlug: 'carex-vulpinoidea', count: 0 }] })
      .expect(200);
    await t.http
      .post(`${PUBLIC}/waitlist`)
      .send({
        name: 'Theo Lindqvist',
        email: 'theo.lindqvist@example.org',
        zip: '54665',
        lines: [{ speciesSlug: 'carex-vulpinoidea', count: 1 }],
      })
      .expect(201);
    const res = await t.http
      .post(`${SHARE}/reservations/${sol.reservationId}/check-in`)
      .set(bearer(tokens.organiser))
      .send({ outcome: 'no-show' })
      .expect(200);
    expect(res.body.household.status).toBe('no-show');
    expect(res.body.released).toEqual([
      { speciesSlug: 'asclepias-incarnata', toWaitlist: 0, toStock: 2 },
      { speciesSlug: 'symphyotrichum-lateriflorum', toWaitlist: 0, toStock: 4 },
      { speciesSlug: 'carex-vulpinoidea', toWaitlist: 1, toStock: 1 },
    ]);
    const share = (await t.http.get(SHARE).set(bearer(tokens.organiser)).expect(200)).body;
    expect(share.stock.find((s: { speciesSlug: string }) => s.speciesSlug === 'carex-vulpinoidea').remaining).toBe(1);
    const offer = await mailTo(t, tokens.organiser, 'plant-share-waitlist-offer', 'theo.lindqvist@example.org');
    expect(offer?.text).toMatch(/1 × fox sedge/i);
  });

  it('keeps the share, its takers and their e-mails to the group organisers and admins (role matrix)', async () => {
    const slotId = slots[5].id;
    const reservationId = '0b7b1d1e-4a4f-4c59-9d4a-0d1f4e8b9c21';
    const slot = { start: '2027-06-12T13:00:00-05:00', end: '2027-06-12T13:30:00-05:00', capacity: 5 };
    const routes: [string, 'get' | 'post' | 'put' | 'patch', string, object | undefined][] = [
      [
        'open a share',
        'post',
        SHARE,
        { date: '2027-06-12', place: DEMO_SHARE.place, slots: [slot], limits: DEMO_SHARE.limits },
      ],
      ['read the share', 'get', SHARE, undefined],
      ['edit the share', 'patch', SHARE, { retentionDays: 30 }],
      ['add a slot', 'post', `${SHARE}/slots`, slot],
      [
        'edit a slot',
        'put',
        `${SHARE}/slots/${slotId}`,
        { ...slot, start: DEMO_SHARE.slots[5].start, end: DEMO_SHARE.slots[5].end, capacity: 12 },
      ],
      ['read a pickup list', 'get', `${SHARE}/slots/${slotId}/pickup-list`, undefined],
      ['set stock', 'put', `${SHARE}/stock`, { stock: [{ speciesSlug: 'viola-canadensis', count: 40 }] }],
      ['add stock', 'post', `${SHARE}/stock/add`, { lines: [{ speciesSlug: 'viola-canadensis', count: 1 }] }],
      ['set the status', 'put', `${SHARE}/status`, { status: 'open' }],
      ['check in', 'post', `${SHARE}/reservations/${reservationId}/check-in`, { outcome: 'picked-up' }],
      ['record a walk-up', 'post', `${SHARE}/walk-ups`, { lines: [{ speciesSlug: 'viola-canadensis', count: 1 }] }],
      ['say what to bring', 'patch', SHARE, { whatToBring: DEMO_SHARE.whatToBring }],
      ['read the waitlist', 'get', `${SHARE}/waitlist`, undefined],
      ['read the report', 'get', `${SHARE}/report`, undefined],
      ['read the report CSV', 'get', `${SHARE}/report.csv`, undefined],
    ];
    for (const [what, method, url, body] of routes) {
      const send = (token?: string) => {
        let req = t.http[method](url);
        if (token) req = req.set(bearer(token));
        return body ? req.send(body) : req;
      };
      const anon = await send();
      expect({ what, status: anon.status }).toEqual({ what, status: 401 });
      for (const role of ['member', 'grower', 'outsider'] as const) {
        const res = await send(tokens[role]);
        expect({ what, role, status: res.status }).toEqual({ what, role, status: 403 });
      }
      for (const role of ['organiser', 'admin'] as const) {
        const res = await send(tokens[role]);
        // Opening again is refused (one share a season) and the check-in id is unknown: both past the role check.
        const expected =
          what === 'open a share'
            ? 409
            : what === 'check in'
              ? 404
              : method === 'post' && !url.endsWith('/add')
                ? 201
                : 200;
        expect({ what, role, status: res.status }).toEqual({ what, role, status: expected });
      }
    }
    // The public routes need no account and answer everyone alike, showing no one's name or e-mail;
    // a reservation or an offer opens by its private link only, whoever asks.
    for (const token of [undefined, ...Object.values(tokens)]) {
      const auth = token ? bearer(token) : {};
      const open = await t.http.get(PUBLIC).set(auth).expect(200);
      expect(JSON.stringify(open.body)).not.toMatch(/@/);
      await t.http
        .get(`/api/reservations/${'C'.repeat(43)}`)
        .set(auth)
        .expect(403);
      await t.http
        .get(`/api/waitlist-offers/${'C'.repeat(43)}`)
        .set(auth)
        .expect(403);
    }
    // E-mails of takers: in the organiser's pickup list only.
    const list = await t.http
      .get(`${SHARE}/slots/${slots[0].id}/pickup-list`)
      .set(bearer(tokens.organiser))
      .expect(200);
    expect(list.body.households[0]).toMatchObject({
      name: 'Priya Vantongeren',
      email: 'priya.vantongeren@example.org',
    });
  });

  it('deletes names and e-mails once the retention has passed; the report keeps its counts', async () => {
    await t.app.get(ShareMailQueue).idle();
    const reportBefore = (await t.http.get(`${SHARE}/report`).set(bearer(tokens.organiser)).expect(200)).body;
    const purge = t.app.get(SharePurgeService);
    // The day the retention ends (share date + 30 days): nothing yet.
    jest.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date('2027-07-12T23:00:00Z'));
    expect(await purge.purge()).toBe(0);
    jest.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date('2027-07-13T08:00:00Z'));
    expect(await purge.purge()).toBe(1);
    expect(await purge.purge()).toBe(0);
    jest.restoreAllMocks();

    const list = await t.http
      .get(`${SHARE}/slots/${slots[0].id}/pickup-list`)
      .set(bearer(tokens.organiser))
      .expect(200);
    expect(list.body.households[0]).toMatchObject({ name: null, email: null, zip: '546' });
    const outbox = await t.http.get('/api/outbox').set(bearer(tokens.admin)).expect(200);
    expect(outbox.body.filter((m: { kind: string }) => m.kind.startsWith('plant-share-'))).toEqual([]);
    const reportAfter = (await t.http.get(`${SHARE}/report`).set(bearer(tokens.organiser)).expect(200)).body;
    expect(reportAfter).toEqual(reportBefore);
  });
});
