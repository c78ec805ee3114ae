import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { bearer, demoTokens, PUBLIC } from './support/plant-share.js';
import { createTestApp, type TestApp } from './support/test-app.js';

type Tokens = Awaited<ReturnType<typeof demoTokens>>;
interface Offered {
  slug: string;
  fit: { fit: string; rank: number; why: string[] } | null;
}

// "Fits my yard" by ZIP or by a saved mix: the ZIP is resolved by the places lookup (USPS ZIP centroid
// from the zipcodes package, county outline, EPA Level III crosswalk) and a saved mix brings its own
// site and region. ZIP 54665 is Viroqua, Wisconsin, in the Driftless Area, EPA Level III ecoregion 52
// (EPA's Level III table; the same ZIP as the places e2e test).
describe('"fits my yard" by ZIP or saved mix (e2e, demo data)', () => {
  let t: TestApp;
  let tokens: Tokens;
  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100' });
    tokens = await demoTokens(t);
  });
  afterAll(() => t.close());

  const slugs = (body: { species: Offered[] }) => body.species.map((s) => s.slug);

  it('ranks for the place a ZIP is in, and says the place in words', async () => {
    const byZip = await t.http.get(PUBLIC).query({ sun: 'full', moisture: 'wet', zip: '54665' }).expect(200);
    expect(byZip.body.yard).toMatchObject({ sun: 'full', moisture: 'wet', from: 'zip', mixName: null });
    expect(byZip.body.yard.place).toMatch(/WI, in the Driftless Area \(EPA Level III ecoregion 52\)/);
    // Swamp milkweed is a plant of wet ground, butterfly weed of dry (from memory; the records agree).
    const order = slugs(byZip.body);
    expect(order.indexOf('asclepias-incarnata')).toBeLessThan(order.indexOf('asclepias-tuberosa'));
    expect(byZip.body.species.every((s: Offered) => s.fit && s.fit.why.length > 0)).toBe(true);
    expect(JSON.stringify(byZip.body)).not.toMatch(/"score"|points/);
    // The group is in the same ecoregion, so its own answers rank the same.
    const byAnswers = await t.http.get(PUBLIC).query({ sun: 'full', moisture: 'wet' }).expect(200);
    expect(byAnswers.body.yard.from).toBe('answers');
    expect(slugs(byAnswers.body)).toEqual(order);
  });

  it('refuses a ZIP without sun and moisture, an unknown ZIP and one outside the 48 states, naming the field', async () => {
    const alone = await t.http.get(PUBLIC).query({ zip: '54665' }).expect(400);
    expect(alone.body.fields.map((f: { field: string }) => f.field)).toContain('sun');
    const unknown = await t.http.get(PUBLIC).query({ sun: 'full', moisture: 'wet', zip: '00000' }).expect(400);
    expect(unknown.body.fields).toEqual([{ field: 'zip', message: expect.stringMatching(/not a US ZIP code/) }]);
    // 99501 is Anchorage, Alaska (USPS): outside the conterminous states the catalogue covers.
    const alaska = await t.http.get(PUBLIC).query({ sun: 'full', moisture: 'wet', zip: '99501' }).expect(400);
    expect(alaska.body.fields).toEqual([{ field: 'zip', message: expect.stringMatching(/outside the 48/) }]);
  });

  it("ranks for a saved mix's own site, and refuses an unknown mix or a mix with answers", async () => {
    const site = { sun: 'full', moisture: 'dry', areaSqFt: 500, deerPressure: 'medium', goals: ['monarchs'] };
    const request = { site, region: { state: 'WI', ecoregionCode: '52' }, options: { locked: [], excluded: [] } };
    const saved = await t.http
      .post('/api/mixes')
      .set(bearer(tokens.member))
      .send({ name: 'Dry front bed', request, chosen: ['asclepias-tuberosa'] })
      .expect(201);
    const byMix = await t.http.get(PUBLIC).query({ mix: saved.body.id }).expect(200);
    expect(byMix.body.yard).toMatchObject({ sun: 'full', moisture: 'dry', from: 'mix', mixName: 'Dry front bed' });
    const order = slugs(byMix.body);
    // On dry ground the order turns round: butterfly weed before swamp milkweed (from memory; records agree).
    expect(order.indexOf('asclepias-tuberosa')).toBeLessThan(order.indexOf('asclepias-incarnata'));
    expect(JSON.stringify(byMix.body)).not.toMatch(/Vantongeren|example\.org/);

    const missing = await t.http.get(PUBLIC).query({ mix: '0b7b1d1e-4a4f-4c59-9d4a-0d1f4e8b9c21' }).expect(400);
    expect(missing.body.fields).toEqual([{ field: 'mix', message: expect.stringMatching(/not a saved mix/) }]);
    const both = await t.http.get(PUBLIC).query({ mix: saved.body.id, sun: 'full', moisture: 'dry' }).expect(400);
    expect(both.body.fields.map((f: { field: string }) => f.field)).toContain('mix');
  });
});
