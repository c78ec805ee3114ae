import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { runSql } from '../src/common/database/dialect.js';
import { ShareTxRunner, tx } from '../src/plant-share/share-tx.js';
import { createTestApp, type TestApp } from './support/test-app.js';

/**
 * The plant share's unit-of-work runner on the database this run uses (SQLite, or PostgreSQL in
 * `npm run test:pg`): conditional decrements taken by many units at once never go below zero, and a
 * unit that fails writes nothing. The demo share (invented Larkfield scenario) gives the rows.
 */
describe('plant-share units of work (e2e, demo data)', () => {
  let t: TestApp;
  let db: DataSource;
  let runner: ShareTxRunner;
  let shareId: string;
  let stockId: string;

  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true' });
    db = t.app.get(DataSource);
    runner = new ShareTxRunner(db);
    [{ share_id: shareId, id: stockId }] = await runSql<{ share_id: string; id: string }>(
      db,
      `SELECT share_id, id FROM share_stock ORDER BY position LIMIT 1`,
    );
  });
  afterAll(() => t.close());

  const remaining = async () =>
    Number((await runSql<{ n: number }>(db, 'SELECT remaining AS n FROM share_stock WHERE id = ?', [stockId]))[0].n);

  it('lets 200 units at once take 50 plants exactly 50 times, and never below zero', async () => {
    await runSql(db, 'UPDATE share_stock SET remaining = 50 WHERE id = ?', [stockId]);
    const took = await Promise.all(
      Array.from({ length: 200 }, () =>
        runner.atomically(function* () {
          yield* tx.lockShare(shareId);
          const before = yield* tx.get<{ remaining: number }>(
            'SELECT remaining FROM share_stock WHERE id = ?',
            stockId,
          );
          const changed = yield* tx.run(
            'UPDATE share_stock SET remaining = remaining - ? WHERE id = ? AND remaining >= ?',
            1,
            stockId,
            1,
          );
          return { changed, before: Number(before!.remaining) };
        }),
      ),
    );
    expect(took.filter((r) => r.changed === 1)).toHaveLength(50);
    expect(await remaining()).toBe(0);
    // With the share's row locked first, each unit read the count the one before it left.
    expect(new Set(took.filter((r) => r.changed === 1).map((r) => r.before)).size).toBe(50);
  });

  it('writes nothing of a unit that throws part-way', async () => {
    await runSql(db, 'UPDATE share_stock SET remaining = 7 WHERE id = ?', [stockId]);
    await expect(
      runner.atomically(function* () {
        yield* tx.run('UPDATE share_stock SET remaining = remaining - 3 WHERE id = ?', stockId);
        throw new Error('stopped after the first write');
      }),
    ).rejects.toThrow('stopped after the first write');
    expect(await remaining()).toBe(7);
  });

  it('reads outside a transaction with the same steps', async () => {
    const rows = await runner.read(() =>
      tx.all<{ id: string }>('SELECT id FROM share_stock WHERE share_id = ?', shareId),
    );
    expect(rows.map((r) => r.id)).toContain(stockId);
  });
});
