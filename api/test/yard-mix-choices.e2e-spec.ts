import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { loadCatalogue } from '@homeground/species-data';
import { createTestApp, type TestApp } from './support/test-app.js';

/**
 * The yard-mix choices a user makes: shrubs on request, a species count, adding a species found by
 * search, swaps across growth forms, and rebalancing that keeps what the user chose.
 */
const DRIFTLESS = { state: 'WI', ecoregionCode: '52' };
const bed = {
  sun: 'full',
  moisture: 'medium',
  areaSqFt: 200,
  deerPressure: 'medium',
  goals: ['pollinators', 'monarchs'],
};
const WOODY = new Set(['shrub', 'tree', 'vine']);

type Chosen = { slug: string; locked: boolean };
const slugsOf = (palette: { chosen: Chosen[] }) => palette.chosen.map((c) => c.slug);

describe('yard mix choices (e2e)', () => {
  let t: TestApp;
  const catalogue = new Map(loadCatalogue().species.map((s) => [s.slug, s]));
  const balance = (body: object) => t.http.post('/api/mixes/balance').send(body);

  beforeAll(async () => {
    t = await createTestApp({ LOGIN_THROTTLE_LIMIT: '100' });
  });
  afterAll(() => t.close());

  it('is herbaceous unless shrubs are asked for, then holds at most one in a 200 ft² bed; the plants fit the bed', async () => {
    const plain = (await balance({ site: bed, region: DRIFTLESS }).expect(200)).body;
    expect(slugsOf(plain.palette).filter((s) => WOODY.has(catalogue.get(s)!.growthForm))).toEqual([]);
    expect(plain.totalFootprintSqFt).toBeLessThanOrEqual(200);
    expect(plain.seeding).toBeNull();
    const woody = (await balance({ site: { ...bed, woodyPlants: true }, region: DRIFTLESS }).expect(200)).body;
    expect(slugsOf(woody.palette).filter((s) => WOODY.has(catalogue.get(s)!.growthForm)).length).toBeLessThanOrEqual(1);
    expect(woody.totalFootprintSqFt).toBeLessThanOrEqual(200);
  });

  it('takes a species count', async () => {
    const res = (await balance({ site: bed, region: DRIFTLESS, options: { size: 5 } }).expect(200)).body;
    expect(res.palette.chosen).toHaveLength(5);
  });

  it('adds a species found by search, even a protected one, and keeps it through a rebalance', async () => {
    const found = (await t.http.get('/api/species').query({ q: 'prairie smoke', state: 'WI' }).expect(200)).body.items;
    const added = found[0]?.slug ?? 'asclepias-tuberosa';
    const res = (await balance({ site: bed, region: DRIFTLESS, options: { locked: [added] } }).expect(200)).body;
    expect(res.palette.chosen.find((c: Chosen) => c.slug === added)?.locked).toBe(true);
  });

  it('rebalance keeps kept and swapped-in species and leaves swapped-out ones out', async () => {
    const first = slugsOf((await balance({ site: bed, region: DRIFTLESS }).expect(200)).body.palette);
    const [kept, swappedOut] = first;
    const alt = (
      await t.http
        .post('/api/mixes/alternatives')
        .send({ site: bed, region: DRIFTLESS, chosen: first, slot: swappedOut })
        .expect(200)
    ).body;
    const swappedIn = alt.alternatives[0].slug;
    const next = (
      await balance({
        site: bed,
        region: DRIFTLESS,
        options: { locked: [kept, swappedIn], excluded: [swappedOut] },
      }).expect(200)
    ).body;
    expect(slugsOf(next.palette)).toEqual(expect.arrayContaining([kept, swappedIn]));
    expect(slugsOf(next.palette)).not.toContain(swappedOut);
  });

  it('swaps within the slot’s kind by default, across growth forms on request', async () => {
    const first = slugsOf(
      (await balance({ site: bed, region: DRIFTLESS, options: { size: 9 } }).expect(200)).body.palette,
    );
    const grass = first.find((s) => catalogue.get(s)!.growthForm === 'graminoid')!;
    const same = (
      await t.http
        .post('/api/mixes/alternatives')
        .send({ site: bed, region: DRIFTLESS, chosen: first, slot: grass })
        .expect(200)
    ).body;
    expect(same.alternatives.every((a: { slug: string }) => catalogue.get(a.slug)!.growthForm === 'graminoid')).toBe(
      true,
    );
    const across = (
      await t.http
        .post('/api/mixes/alternatives')
        .send({ site: bed, region: DRIFTLESS, chosen: first, slot: grass, acrossForms: true })
        .expect(200)
    ).body;
    expect(across.alternatives.some((a: { slug: string }) => catalogue.get(a.slug)!.growthForm !== 'graminoid')).toBe(
      true,
    );
  });

  it('says plainly where the catalogue does not cover the region (Sonoran Basin and Range, EPA 81)', async () => {
    const res = (
      await balance({ site: { ...bed, moisture: 'dry' }, region: { state: 'AZ', ecoregionCode: '81' } }).expect(200)
    ).body;
    expect(res.palette.chosen).toEqual([]);
    expect(res.palette.coverage.covered).toBe(false);
    const rec = (
      await t.http
        .post('/api/recommendations')
        .send({ site: bed, region: { state: 'AZ', ecoregionCode: '81' } })
        .expect(200)
    ).body;
    expect(rec.ranked).toEqual([]);
    expect(rec.coverage.message).toMatch(/does not cover/);
  });

  it('gives a meadow of an acre a seeding plan by seeds/ft²', async () => {
    const res = (await balance({ site: { ...bed, areaSqFt: 43_560 }, region: DRIFTLESS }).expect(200)).body;
    expect(res.palette.plantingMethod).toBe('seeding');
    const total = res.seeding.reduce((s: number, l: { seedsPerSqFt: number }) => s + l.seedsPerSqFt, 0);
    expect(total).toBeCloseTo(40, 0); // NRCS Elsberry PMC demo rate, CHECK-VALUES §3 (R)
  });

  it.each([
    ['woodyPlants not a yes/no', { site: { ...bed, woodyPlants: 'lots' }, region: DRIFTLESS }, 'site.woodyPlants'],
    ['a species count of 0', { site: bed, region: DRIFTLESS, options: { size: 0 } }, 'options.size'],
  ])('answers %s with 400 naming the field', async (_what, body, field) => {
    const res = await balance(body).expect(400);
    expect(res.body.fields.map((f: { field: string }) => f.field)).toContain(field);
  });

  it('answers acrossForms that is not a yes/no with 400 naming the field', async () => {
    const res = await t.http
      .post('/api/mixes/alternatives')
      .send({
        site: bed,
        region: DRIFTLESS,
        chosen: ['asclepias-tuberosa'],
        slot: 'asclepias-tuberosa',
        acrossForms: 'y',
      })
      .expect(400);
    expect(res.body.fields.map((f: { field: string }) => f.field)).toContain('acrossForms');
  });
});
