import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { runSql } from '../src/common/database/dialect.js';
import { PlantShareService } from '../src/plant-share/plant-share.service.js';
import { SeasonsService } from '../src/seasons/seasons.service.js';
import { DEMO_TARGETS } from '../src/demo/demo-season.js';
import { createTestApp, type TestApp } from './support/test-app.js';

// Where a new share's stock comes from: the plants growers logged ready, once there are any; until then
// the season's targets (the demo season, in early winter, has only sowings logged).
describe("a new plant share's starting stock (e2e, demo data)", () => {
  let t: TestApp;
  let db: DataSource;
  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100' });
    db = t.app.get(DataSource);
  });
  afterAll(() => t.close());

  const plan = async () => {
    const [{ group_id }] = await db.query(`SELECT group_id FROM seasons LIMIT 1`);
    const p = await t.app.get(SeasonsService).latestPlan(group_id);
    if (!p) throw new Error('the demo season is missing');
    return p;
  };

  it("starts from the season's targets while no batch has logged a ready plant", async () => {
    // The demo season has some plants logged ready (demo-batches.ts): take them out for this case.
    await db.query(`DELETE FROM batch_log_entries WHERE kind = 'ready'`);
    const stock = await t.app.get(PlantShareService).initialStockFor(await plan());
    expect(stock).toEqual(DEMO_TARGETS.map((d) => ({ speciesSlug: d.slug, count: d.targetPlants })));
  });

  it('starts from the ready counts once growers log plants ready, summed over batches of a species', async () => {
    const batches: { id: string; slug: string; grower_id: string }[] = await db.query(
      `SELECT id, slug, grower_id FROM batches ORDER BY position`,
    );
    const first = batches[0];
    const sameSpecies = batches.filter((b) => b.slug === first.slug);
    for (const [i, b] of sameSpecies.entries())
      await runSql(
        db,
        `INSERT INTO batch_log_entries (id, batch_id, kind, count, date, created_by) VALUES (?, ?, 'ready', ?, '2027-05-30', ?)`,
        [randomUUID(), b.id, 10 + i, b.grower_id],
      );
    const expected = sameSpecies.reduce((a, _b, i) => a + 10 + i, 0);
    const stock = await t.app.get(PlantShareService).initialStockFor(await plan());
    expect(stock.find((l) => l.speciesSlug === first.slug)?.count).toBe(expected);
    // Species nobody has logged ready yet start at 0, for the organiser to add as plants get ready.
    const others = stock.filter((l) => l.speciesSlug !== first.slug);
    expect(others.length).toBeGreaterThan(0);
    expect(others.every((l) => l.count === 0)).toBe(true);
  });
});
