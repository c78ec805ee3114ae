import { readFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { loadCatalogue } from '@homeground/species-data';
import { REFERENCE_DIR, referenceAvailable } from './support/reference.js';
import { createTestApp, type TestApp } from './support/test-app.js';

/** A row's value column from the reference check-value table, found by the words that start its label. */
function checkValue(table: string, label: RegExp): number {
  const row = table.split('\n').find((l) => label.test(l));
  if (!row) throw new Error(`no row ${label} in CHECK-VALUES.md`);
  return Number(row.split('|')[2].trim());
}

/**
 * The bloom rules met, not only reported: a large, sunny, dry 40-species planting in the Driftless Area
 * (EPA Level III 52, Wisconsin), where the catalogue has enough forbs in flower from April to October
 * (smaller or moister mixes there fall short in April, and the rule says so). The
 * targets are read from the reference check values (CP42-IN: USDA NRCS Indiana, Pollinator Habitat Job
 * Sheet, CRP CP42, 2012): at least 3 species per bloom period, 9 flowering species in all; the periods
 * are early April to mid-June, mid-June to July, August to October. The species' bloom months are the
 * catalogue's (each sourced, USDA PLANTS where it has them).
 */
describe('bloom rules met for a site the catalogue allows (e2e)', () => {
  let t: TestApp;
  const catalogue = new Map(loadCatalogue().species.map((s) => [s.slug, s]));

  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('meets every CP42 rule and each period really has the species in flower', async () => {
    const site = { sun: 'full', moisture: 'dry', areaSqFt: 4000, deerPressure: 'low', goals: ['pollinators'] };
    const res = await t.http
      .post('/api/mixes/balance')
      .send({ site, region: { state: 'WI', ecoregionCode: '52' }, options: { size: 40 } })
      .expect(200);
    const { constraints, chosen } = res.body.palette as {
      constraints: { id: string; met: boolean; applies: boolean }[];
      chosen: { slug: string }[];
    };
    const met = Object.fromEntries(constraints.map((c) => [c.id, c.met]));
    expect(met).toMatchObject({ 'cp42-early': true, 'cp42-mid': true, 'cp42-late': true, 'cp42-flowering': true });

    if (!referenceAvailable(['CHECK-VALUES.md'])) return;
    const table = readFileSync(path.join(REFERENCE_DIR, 'CHECK-VALUES.md'), 'utf8');
    const perPeriod = checkValue(table, /^\| CP42 minimum species per bloom period/);
    const flowering = checkValue(table, /^\| CP42 minimum pollinator-friendly flowering species/);
    expect([perPeriod, flowering]).toEqual([3, 9]);
    const species = chosen.map((c) => catalogue.get(c.slug)!);
    const flowers = species.filter((s) => s.growthForm !== 'graminoid' && s.growthForm !== 'fern');
    expect(flowers.length).toBeGreaterThanOrEqual(flowering);
    // CP42-IN periods by month: early April–mid-June, mid mid-June–July, late August–October.
    const periods = { early: [4, 5, 6], mid: [6, 7], late: [8, 9, 10] };
    for (const [period, months] of Object.entries(periods)) {
      const inFlower = flowers.filter((s) => s.bloomMonths.some((m) => months.includes(m)));
      expect([period, inFlower.length >= perPeriod]).toEqual([period, true]);
    }
  });
});
