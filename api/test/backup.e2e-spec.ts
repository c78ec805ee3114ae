import { execFile } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import Database from 'better-sqlite3';
import { DataSource } from 'typeorm';
import { ShareMailQueue } from '../src/plant-share/share-mail-queue.js';
import { type BuiltApi, builtApiExists, startBuiltApi } from './support/built-api.js';
import { bearer, demoTokens, PUBLIC, SHARE } from './support/plant-share.js';
import { createTestApp, type TestApp } from './support/test-app.js';

const API_DIR = path.resolve(import.meta.dirname, '..');
/** Demo data (scrypt-hashing eight people) in process and again in the restored built API: generous on a busy machine. */
const SLOW = 300_000;

/** Every row of every table, in a stable order: two databases with equal dumps hold the same data. */
function dump(file: string): Record<string, unknown[]> {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const tables = db
      .prepare(`SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name`)
      .all() as { name: string }[];
    return Object.fromEntries(
      tables.map(({ name }) => [name, db.prepare(`SELECT * FROM "${name}" ORDER BY rowid`).all()]),
    );
  } finally {
    db.close();
  }
}

/**
 * `npm run db:backup` against a running API: the online backup (SQLite's backup API) is taken while the
 * app holds its connection open and recent commits are still in the WAL file, then restored the way the
 * README says (the copy becomes the database file) and served again by the built API.
 */
describe('db:backup: an online backup of a running database, restored and compared', () => {
  let t: TestApp;
  let restored: BuiltApi | undefined;
  const restoreDir = mkdtempSync(path.join(tmpdir(), 'homeground-restore-'));
  const backupFile = path.join(restoreDir, 'backups', 'nightly.sqlite');
  let tokens: Awaited<ReturnType<typeof demoTokens>>;

  beforeAll(async () => {
    if (!builtApiExists()) throw new Error('dist/ is missing: run `npm run build` first (npm test does).');
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100' });
    tokens = await demoTokens(t);
  }, SLOW);
  afterAll(async () => {
    await restored?.stop();
    await t?.close();
    rmSync(restoreDir, { recursive: true, force: true });
  }, SLOW);

  it(
    'copies every committed row, WAL included, while the API runs; the restored copy serves the same data',
    async () => {
      const live = path.join(t.dataDir, 'test.sqlite');
      // Writes just before the backup: a reservation and a new slot, still in the WAL file (no checkpoint yet).
      const slot = await t.http
        .post(`${SHARE}/slots`)
        .set(bearer(tokens.organiser))
        .send({ start: '2027-06-12T16:00:00-05:00', end: '2027-06-12T16:30:00-05:00', capacity: 12 })
        .expect(201);
      const slotId = slot.body.slots.find((s: { capacity: number }) => s.capacity === 12).id;
      const share = (await t.http.get(SHARE).set(bearer(tokens.organiser)).expect(200)).body;
      const slug = share.stock.find((s: { remaining: number }) => s.remaining > 0).speciesSlug;
      await t.http
        .post(`${PUBLIC}/reservations`)
        .send({
          name: 'Backup Household',
          email: 'backup@example.org',
          zip: '54665',
          slotId,
          lines: [{ speciesSlug: slug, count: 1 }],
        })
        .expect(201);
      expect(existsSync(`${live}-wal`)).toBe(true);
      // The confirmation e-mail lands in the outbox after the answer: let it, so the copy and the later
      // comparison see the same rows.
      await t.app.get(ShareMailQueue).idle();

      // The command itself, as an operator runs it beside the live app (its connection stays open).
      const { stdout } = await promisify(execFile)(
        process.execPath,
        ['dist/database/backup-cli.js', '--out', backupFile],
        {
          cwd: API_DIR,
          env: { PATH: process.env.PATH ?? '', DATABASE: live, DATA_DIR: t.dataDir },
        },
      );
      expect(stdout).toMatch(/integrity ok/);

      // Same rows in every table as the live database now (nothing was written after the backup).
      const before = dump(live);
      expect(Object.keys(before).length).toBeGreaterThan(10);
      expect(dump(backupFile)).toEqual(before);
      const [{ n }] = await t.app
        .get(DataSource)
        .query(`SELECT COUNT(*) AS n FROM share_reservations WHERE email = 'backup@example.org'`);
      expect(Number(n)).toBe(1);

      // Restore as the README says: the copy becomes the database file of a stopped API, then start it.
      const dataDir = path.join(restoreDir, 'data');
      const restoredFile = path.join(dataDir, 'homeground.sqlite');
      mkdirSync(dataDir, { recursive: true });
      copyFileSync(backupFile, restoredFile);
      copyFileSync(path.join(t.dataDir, 'jwt-secret'), path.join(dataDir, 'jwt-secret'));
      // No demo loading on the restored copy: everything it serves comes from the backup.
      restored = await startBuiltApi(dataDir, { DEMO_DATA: 'false' });
      const login = await fetch(`${restored.baseUrl}/api/auth/login`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ email: 'mara.ellsworth@example.org', password: 'larkfield-mara' }),
      });
      expect(login.status).toBe(200);
      const token = ((await login.json()) as { accessToken: string }).accessToken;
      const again = await fetch(`${restored.baseUrl}${SHARE}`, { headers: bearer(token) });
      const liveShare = (await t.http.get(SHARE).set(bearer(tokens.organiser)).expect(200)).body;
      expect(await again.json()).toEqual(liveShare);
      await restored.stop();
      restored = undefined;
      // Starting it ran migrations (none pending) and wrote only the sign-in activity; the rest is as backed up.
      const after = dump(restoredFile);
      for (const table of Object.keys(before).filter((k) => !/sign_in|users|outbox/.test(k)))
        expect([table, after[table]]).toEqual([table, before[table]]);
    },
    SLOW,
  );

  it('refuses to back up a file that does not exist, with a message and a failing exit code', async () => {
    const run = promisify(execFile)(
      process.execPath,
      ['dist/database/backup-cli.js', '--out', path.join(restoreDir, 'x.sqlite')],
      {
        cwd: API_DIR,
        env: { PATH: process.env.PATH ?? '', DATABASE: path.join(restoreDir, 'missing.sqlite') },
      },
    );
    await expect(run).rejects.toMatchObject({ code: 1, stderr: expect.stringMatching(/Backup failed/) });
  });
});
