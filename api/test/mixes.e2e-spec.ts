import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { loadCatalogue } from '@homeground/species-data';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';

const DRIFTLESS = { state: 'WI', ecoregionCode: '52' };
const sunnyDry = {
  sun: 'full',
  moisture: 'dry',
  areaSqFt: 500,
  deerPressure: 'medium',
  goals: ['monarchs', 'pollinators'],
};

describe('recommendations, mixes, quantities and calendar (e2e)', () => {
  let t: TestApp;
  const catalogue = new Map(loadCatalogue().species.map((s) => [s.slug, s]));

  beforeAll(async () => {
    t = await createTestApp({ LOGIN_THROTTLE_LIMIT: '100' });
  });
  afterAll(() => t.close());

  it('scores only species native to the state, each with reasons in words', async () => {
    const res = await t.http.post('/api/recommendations').send({ site: sunnyDry, region: DRIFTLESS }).expect(200);
    expect(res.body.ranked.length).toBeGreaterThan(10);
    for (const r of res.body.ranked) {
      expect(catalogue.get(r.slug)!.nativeStates).toContain('WI');
      expect(r.parts.length).toBeGreaterThan(0);
      expect(r.parts.every((p: { reason: string }) => p.reason.length > 10)).toBe(true);
    }
    const scores = res.body.ranked.map((r: { score: number }) => r.score);
    expect(scores).toEqual([...scores].sort((a, b) => b - a));
  });

  it('balances a monarch mix: a native milkweed, quantities for each species, every rule reported', async () => {
    const res = await t.http.post('/api/mixes/balance').send({ site: sunnyDry, region: DRIFTLESS }).expect(200);
    const { palette, quantities, species } = res.body;
    expect(palette.chosen.length).toBe(palette.size);
    expect(palette.chosen.some((c: { slug: string }) => c.slug.startsWith('asclepias-'))).toBe(true);
    const ids = palette.constraints.map((c: { id: string }) => c.id);
    expect(ids).toEqual(
      expect.arrayContaining(['cp42-early', 'cp42-mid', 'cp42-late', 'cp42-flowering', 'monarch-milkweed']),
    );
    for (const c of palette.constraints) expect(typeof c.met).toBe('boolean');
    expect(palette.constraints.find((c: { id: string }) => c.id === 'monarch-milkweed').met).toBe(true);
    expect(quantities.map((q: { slug: string }) => q.slug).sort()).toEqual(
      palette.chosen.map((c: { slug: string }) => c.slug).sort(),
    );
    expect(Object.keys(species).sort()).toEqual(palette.chosen.map((c: { slug: string }) => c.slug).sort());
  });

  // The same request in Spanish (Accept-Language, RFC 9110 §12.5.4): the same species, points and
  // order, with every reason and role said in Spanish (words from shared's Spanish word tables).
  it('answers in Spanish when asked, with the same mix and the reasons in Spanish', async () => {
    const en = (await t.http.post('/api/mixes/balance').send({ site: sunnyDry, region: DRIFTLESS }).expect(200)).body;
    const es = (
      await t.http
        .post('/api/mixes/balance')
        .set('Accept-Language', 'es-MX,es;q=0.9,en;q=0.5')
        .send({ site: sunnyDry, region: DRIFTLESS })
        .expect(200)
    ).body;
    type Chosen = { slug: string; parts: { name: string; points: number; reason: string }[]; roles: string[] };
    expect(es.palette.chosen.map((c: Chosen) => c.slug)).toEqual(en.palette.chosen.map((c: Chosen) => c.slug));
    const reasons = (mix: typeof en) => mix.palette.chosen.flatMap((c: Chosen) => c.parts.map((p) => p.reason));
    expect(reasons(es)).toContain('Nativa de Wisconsin.');
    expect(reasons(es)).not.toContain('Native to Wisconsin.');
    expect(reasons(es).some((r: string) => /^Crece a pleno sol/.test(r))).toBe(true);
    expect(es.palette.chosen.flatMap((c: Chosen) => c.roles)).not.toContain('middle of the bed');
    // How this mix is balanced: every rule's detail in Spanish too (mix-words.ts), not English.
    type Rule = { id: string; detail: string };
    for (const c of es.palette.constraints as Rule[])
      expect(c.detail).not.toMatch(/\bThe mix\b|\bsuits?\b|\bspecies\b/);
    expect(es.palette.constraints.some((c: Rule) => /^La mezcla tiene \d+/.test(c.detail))).toBe(true);
    expect(es.palette.chosen[0].parts.map((p: { points: number }) => p.points)).toEqual(
      en.palette.chosen[0].parts.map((p: { points: number }) => p.points),
    );
  });

  it('keeps locked species, leaves excluded ones out, and offers alternatives for a slot', async () => {
    const first = (await t.http.post('/api/mixes/balance').send({ site: sunnyDry, region: DRIFTLESS }).expect(200)).body
      .palette;
    const [keep, drop] = first.chosen.map((c: { slug: string }) => c.slug);
    const next = (
      await t.http
        .post('/api/mixes/balance')
        .send({ site: sunnyDry, region: DRIFTLESS, options: { locked: [keep], excluded: [drop] } })
        .expect(200)
    ).body.palette;
    const slugs = next.chosen.map((c: { slug: string }) => c.slug);
    expect(slugs).toContain(keep);
    expect(slugs).not.toContain(drop);
    expect(next.chosen.find((c: { slug: string }) => c.slug === keep).locked).toBe(true);

    const alt = await t.http
      .post('/api/mixes/alternatives')
      .send({ site: sunnyDry, region: DRIFTLESS, chosen: slugs, slot: slugs[1] })
      .expect(200);
    expect(alt.body.alternatives.length).toBeGreaterThan(0);
    for (const a of alt.body.alternatives) expect(slugs).not.toContain(a.slug);
  });

  it.each([
    ['a sun level we do not know', { site: { ...sunnyDry, sun: 'dappled' }, region: DRIFTLESS }, 'site.sun'],
    ['the area in two units', { site: { ...sunnyDry, areaSqM: 40 }, region: DRIFTLESS }, 'site.areaSqFt'],
    ['an unknown ecoregion', { site: sunnyDry, region: { state: 'WI', ecoregionCode: '99' } }, 'region.ecoregionCode'],
    ['a state outside the 48', { site: sunnyDry, region: { state: 'HI' } }, 'region.state'],
  ])('answers %s with 400 naming the field', async (_what, body, field) => {
    const res = await t.http.post('/api/mixes/balance').send(body).expect(400);
    expect(res.body.fields.map((f: { field: string }) => f.field)).toContain(field);
  });

  it('saves a mix for a signed-in person and opens it by link for anyone; only the owner deletes it', async () => {
    const request = { site: sunnyDry, region: DRIFTLESS, options: { locked: [], excluded: [] } };
    const mix = (await t.http.post('/api/mixes/balance').send(request).expect(200)).body.palette;
    const chosen = mix.chosen.map((c: { slug: string }) => c.slug);
    await t.http.post('/api/mixes').send({ name: 'Front yard', request, chosen }).expect(401);
    const priya = await registerUser(t, { email: 'priya.vantongeren@example.org', displayName: 'Priya Vantongeren' });
    const saved = await t.http
      .post('/api/mixes')
      .set('Authorization', `Bearer ${priya.token}`)
      .send({ name: 'Front yard', request, chosen })
      .expect(201);
    const opened = await t.http.get(`/api/mixes/${saved.body.id}`).expect(200);
    // Anyone with the link sees the saver's first name only, never the full name.
    expect(opened.body).toMatchObject({ name: 'Front yard', chosen, ownerFirstName: 'Priya' });
    expect(JSON.stringify(opened.body)).not.toMatch(/Vantongeren/);
    expect(opened.body).not.toHaveProperty('ownerName');
    const sol = await registerUser(t, { email: 'sol.marchetti@example.org' });
    await t.http.delete(`/api/mixes/${saved.body.id}`).set('Authorization', `Bearer ${sol.token}`).expect(403);
    await t.http.delete(`/api/mixes/${saved.body.id}`).set('Authorization', `Bearer ${priya.token}`).expect(204);
    await t.http.get(`/api/mixes/${saved.body.id}`).expect(404);
    const bad = await t.http
      .post('/api/mixes')
      .set('Authorization', `Bearer ${priya.token}`)
      .send({ name: '', request, chosen: ['no-such-plant'] })
      .expect(400);
    expect(bad.body.fields.map((f: { field: string }) => f.field)).toContain('name');
  });

  it('works out plants at a spacing and seeds from the germination rate and a stated loss factor', async () => {
    const milkweed = catalogue.get('asclepias-tuberosa')!;
    const res = await t.http
      .post('/api/quantities')
      .send({ areaSqFt: 100, species: [{ slug: 'asclepias-tuberosa', spacingIn: 12 }], lossFactor: 0.2 })
      .expect(200);
    // 12 in on centre = 1 plant/ft² (144 ÷ 12², geometry); seeds = plants ÷ (germination × (1 − loss)).
    expect(res.body[0]).toMatchObject({ plants: 100, spacingIn: 12 });
    expect(res.body[0].seedsToSow).toBe(
      Math.ceil(100 / ((milkweed.germination.germinationRatePct / 100) * 0.8) - 1e-9),
    );
    const metric = await t.http
      .post('/api/quantities')
      .send({ areaSqM: 9.290304, species: [{ slug: 'asclepias-tuberosa', spacingIn: 12 }] })
      .expect(200);
    expect(metric.body[0].plants).toBe(100);
    await t.http
      .post('/api/quantities')
      .send({ areaSqFt: 100, species: [{ slug: 'nope-nope' }] })
      .expect(400);
  });

  it('back-schedules a 60-day stratification from an indoor sowing 8 weeks before the last frost, and exports .ics and CSV', async () => {
    const sixty = [...catalogue.values()].find(
      (s) =>
        s.germination.treatments.length === 1 &&
        s.germination.treatments[0].kind === 'cold-moist' &&
        s.germination.treatments[0].days === 60 &&
        s.germination.methods.includes('indoor-lights'),
    )!;
    const body = {
      lastFrost: '2027-05-10',
      today: '2026-12-02',
      plans: [{ slug: sixty.slug, method: 'indoor-lights' }],
    };
    const cal = await t.http.post('/api/calendar').send(body).expect(200);
    const events = cal.body.events.filter((e: { speciesSlug: string }) => e.speciesSlug === sixty.slug);
    // Worked by hand: 2027-05-10 − 56 d = 2027-03-15 (sow); − 60 d = 2027-01-14 (start in the refrigerator).
    expect(events.find((e: { kind: string }) => e.kind === 'sow').date).toBe('2027-03-15');
    expect(events.find((e: { kind: string }) => e.kind === 'cms-start').date).toBe('2027-01-14');

    const ics = await t.http
      .post('/api/calendar.ics')
      .send(body)
      .expect(200)
      .expect('Content-Type', /text\/calendar/);
    expect(ics.text).toMatch(/^BEGIN:VCALENDAR\r?\nVERSION:2\.0/);
    expect(ics.text).toContain('DTSTART;VALUE=DATE:20270114');
    expect(ics.text.match(/BEGIN:VEVENT/g)!.length).toBe(cal.body.events.length);
    const csv = await t.http.post('/api/calendar.csv').send(body).expect(200);
    expect(csv.text.split('\r\n')[0]).toBe('date,species,scientificName,kind,title,detail');
    expect(csv.text).toContain(`2027-01-14,${sixty.commonNames[0]}`);

    const bad = await t.http
      .post('/api/calendar')
      .send({ lastFrost: '2027-02-30', plans: [{ slug: 'x-y', method: 'by-hand' }] })
      .expect(400);
    expect(bad.body.fields.map((f: { field: string }) => f.field)).toEqual(
      expect.arrayContaining(['lastFrost', 'plans.0.method']),
    );
  });
});
