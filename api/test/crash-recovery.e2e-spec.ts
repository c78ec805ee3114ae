import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import Database from 'better-sqlite3';
import Papa from 'papaparse';
import { DataSource } from 'typeorm';
import { databaseOptions } from '../src/database/data-source.js';
import { type BuiltApi, builtApiExists, startBuiltApi } from './support/built-api.js';

const GROUP = 'larkfield-commons-growers';
const SHARE = `/api/groups/${GROUP}/plant-share`;
const SLUG = 'rudbeckia-hirta';
const today = () => new Date().toISOString().slice(0, 10);
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
/** Each test starts the built API twice (scrypt-hashing the demo people): generous on a busy two-core machine. */
const SLOW = 300_000;

/**
 * Faults: the built API is killed with SIGKILL (no shutdown hooks, no flush) while it writes, then
 * started again on the same SQLite file. Every write it acknowledged (2xx) must be there, the plant
 * share's stock must still add up, and a CSV import cut off halfway must have landed whole or not at all.
 * The durability rule checked is SQLite's own: a committed WAL transaction survives the process
 * (sqlite.org/wal.html, "Durability"); the app must only answer 2xx after its transaction commits.
 */
describe('crash recovery: SIGKILL during writes, restart on the same SQLite file', () => {
  let dataDir: string;
  let api: BuiltApi | undefined;
  const file = () => path.join(dataDir, 'homeground.sqlite');

  beforeAll(() => {
    if (!builtApiExists()) throw new Error('dist/main.js is missing: run `npm run build` first (npm test does).');
    dataDir = mkdtempSync(path.join(tmpdir(), 'homeground-crash-'));
  });
  afterAll(async () => {
    await api?.stop();
    rmSync(dataDir, { recursive: true, force: true });
  }, SLOW);

  async function call(method: string, url: string, token?: string, body?: unknown) {
    const res = await fetch(`${api!.baseUrl}${url}`, {
      method,
      headers: {
        ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
        ...(token ? { Authorization: `Bearer ${token}` } : {}),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await res.text();
    return {
      status: res.status,
      body: text && res.headers.get('content-type')?.includes('json') ? JSON.parse(text) : text,
    };
  }
  async function signIn(email: string, password: string): Promise<{ token: string; id: string }> {
    const res = await call('POST', '/api/auth/login', undefined, { email, password });
    expect(res.status).toBe(200);
    return { token: res.body.accessToken, id: res.body.user.id };
  }
  /** Read the file with a connection of our own, as an operator would after the crash. */
  function readDb<T>(fn: (db: Database.Database) => T): T {
    const db = new Database(file(), { readonly: true, fileMustExist: true });
    try {
      return fn(db);
    } finally {
      db.close();
    }
  }

  it('runs SQLite in WAL mode with a busy timeout (the settings the app opens its file with)', async () => {
    const probe = path.join(dataDir, 'probe', 'probe.sqlite');
    const ds = new DataSource({ ...databaseOptions({ databasePath: probe, databaseUrl: null }), migrationsRun: false });
    await ds.initialize();
    try {
      expect(await ds.query('PRAGMA journal_mode')).toEqual([{ journal_mode: 'wal' }]);
      const [{ timeout }] = await ds.query('PRAGMA busy_timeout');
      expect(Number(timeout)).toBeGreaterThanOrEqual(1000);
    } finally {
      await ds.destroy();
    }
  });

  it(
    'keeps every acknowledged reservation and batch log entry, and the stock adds up',
    async () => {
      api = await startBuiltApi(dataDir);
      expect(readDb((db) => db.pragma('journal_mode', { simple: true }))).toBe('wal');
      const mara = await signIn('mara.ellsworth@example.org', 'larkfield-mara');
      const juniper = await signIn('juniper.okafor@example.org', 'larkfield-juniper');
      expect(
        (await call('PUT', `${SHARE}/stock`, mara.token, { stock: [{ speciesSlug: SLUG, count: 5000 }] })).status,
      ).toBe(200);
      const slotIds: string[] = [];
      for (const hour of ['15', '16']) {
        const start = `2027-06-12T${hour}:00:00-05:00`;
        const res = await call('POST', `${SHARE}/slots`, mara.token, {
          start,
          end: `2027-06-12T${hour}:30:00-05:00`,
          capacity: 500,
        });
        expect(res.status).toBe(201);
        slotIds.push(res.body.slots.find((s: { start: string }) => Date.parse(s.start) === Date.parse(start)).id);
      }
      const batches = await call('GET', `/api/groups/${GROUP}/season/batches`, juniper.token);
      const batchId: string = batches.body.batches.find((b: { growerId: string }) => b.growerId === juniper.id).id;

      // A busy timeout, not an error, when another connection holds the write lock for a moment.
      const locker = new Database(file());
      locker.exec('BEGIN IMMEDIATE');
      const waiting = call('POST', `/api/plant-shares/${GROUP}/reservations`, undefined, {
        name: 'Patient Household',
        email: 'patient@example.org',
        zip: '54665',
        slotId: slotIds[0],
        lines: [{ speciesSlug: SLUG, count: 1 }],
      });
      const waitingLog = call('POST', `/api/groups/${GROUP}/season/batches/${batchId}/log`, juniper.token, {
        kind: 'sown',
        count: 1,
        date: today(),
      });
      await sleep(400);
      locker.exec('COMMIT');
      locker.close();
      const [patient, logged] = await Promise.all([waiting, waitingLog]);
      if (patient.status !== 201 || logged.status !== 201) console.log(api.output());
      expect([patient.status, logged.status]).toEqual([201, 201]);

      // Writers: households reserving and the grower logging, until the process is killed under them.
      const acknowledgedEmails: string[] = ['patient@example.org'];
      const acknowledgedEntries: string[] = [];
      let n = 0;
      let killed = false;
      const reserver = async () => {
        while (!killed) {
          const email = `crash-${n++}@example.org`;
          const res = await call('POST', `/api/plant-shares/${GROUP}/reservations`, undefined, {
            name: `Household ${n}`,
            email,
            zip: '54665',
            slotId: slotIds[n % 2],
            lines: [{ speciesSlug: SLUG, count: 1 + (n % 3) }],
          }).catch(() => undefined);
          if (res && res.status >= 200 && res.status < 300) acknowledgedEmails.push(email);
          else if (res && !killed) throw new Error(`a reservation answered ${res.status}: ${JSON.stringify(res.body)}`);
        }
      };
      const logger = async () => {
        while (!killed) {
          const clientId = randomUUID();
          const res = await call('POST', `/api/groups/${GROUP}/season/batches/${batchId}/log`, juniper.token, {
            kind: 'sown',
            count: 3,
            date: today(),
            clientId,
          }).catch(() => undefined);
          if (res && res.status >= 200 && res.status < 300) acknowledgedEntries.push(clientId);
          else if (res && !killed) throw new Error(`a log entry answered ${res.status}: ${JSON.stringify(res.body)}`);
        }
      };
      const writers = [reserver(), reserver(), reserver(), reserver(), logger(), logger()];
      const began = Date.now();
      while (acknowledgedEmails.length + acknowledgedEntries.length < 80 && Date.now() - began < 20_000)
        await sleep(20);
      await api.kill();
      killed = true;
      await Promise.all(writers);
      const attempted = n;

      api = await startBuiltApi(dataDir);
      expect((await call('GET', '/api/health')).status).toBe(200);
      const { emails, entries, stock, badStock } = readDb((db) => ({
        emails: new Set(
          (
            db.prepare(`SELECT email FROM share_reservations WHERE status = 'confirmed'`).all() as { email: string }[]
          ).map((r) => r.email),
        ),
        entries: new Set(
          (
            db.prepare(`SELECT client_id FROM batch_log_entries WHERE batch_id = ?`).all(batchId) as {
              client_id: string;
            }[]
          ).map((r) => r.client_id),
        ),
        stock: db
          .prepare(
            `SELECT s.offered, s.remaining,
             (SELECT COALESCE(SUM(l.count), 0) FROM share_reservation_lines l JOIN share_reservations r ON r.id = l.reservation_id
               WHERE r.share_id = s.share_id AND l.slug = s.slug AND r.status IN ('confirmed', 'picked-up')) AS reserved
           FROM share_stock s WHERE s.slug = ?`,
          )
          .get(SLUG) as { offered: number; remaining: number; reserved: number },
        // The same sum for every species on offer (held waitlist plants and walk-ups also take from the stock).
        badStock: db
          .prepare(
            `SELECT s.slug, s.offered, s.remaining FROM share_stock s WHERE s.offered <> s.remaining
             + (SELECT COALESCE(SUM(l.count), 0) FROM share_reservation_lines l JOIN share_reservations r ON r.id = l.reservation_id
                 WHERE r.share_id = s.share_id AND l.slug = s.slug AND r.status IN ('confirmed', 'picked-up'))
             + (SELECT COALESCE(SUM(w.held), 0) FROM share_waitlist w WHERE w.share_id = s.share_id AND w.slug = s.slug)
             + (SELECT COALESCE(SUM(l.count), 0) FROM share_walk_up_lines l JOIN share_walk_ups u ON u.id = l.walk_up_id
                 WHERE u.share_id = s.share_id AND l.slug = s.slug)`,
          )
          .all(),
      }));
      console.log(
        `kill test: ${acknowledgedEmails.length} reservations and ${acknowledgedEntries.length} log entries acknowledged ` +
          `before SIGKILL (${attempted} reservations attempted); after restart ${emails.size} confirmed reservations, ` +
          `${entries.size} log entries; stock offered ${stock.offered} = remaining ${stock.remaining} + reserved ${stock.reserved}`,
      );
      expect(acknowledgedEmails.length).toBeGreaterThan(10);
      expect(acknowledgedEntries.length).toBeGreaterThan(5);
      for (const email of acknowledgedEmails) expect(emails.has(email)).toBe(true);
      for (const id of acknowledgedEntries) expect(entries.has(id)).toBe(true);
      // Nothing beyond what was attempted, and nothing written twice.
      expect([...emails].filter((e) => e.startsWith('crash-')).length).toBeLessThanOrEqual(attempted);
      expect(stock.offered).toBe(5000);
      expect(stock.offered).toBe(stock.remaining + stock.reserved);
      expect(badStock).toEqual([]);
      // Each slot's booked count is its confirmed reservations (a decrement without its reservation would show here).
      const slots = readDb(
        (db) =>
          db
            .prepare(
              `SELECT s.id, s.booked, (SELECT COUNT(*) FROM share_reservations r WHERE r.slot_id = s.id AND r.status IN ('confirmed', 'picked-up')) AS n
             FROM share_slots s WHERE s.id IN (?, ?)`,
            )
            .all(...slotIds) as { booked: number; n: number }[],
      );
      for (const s of slots) expect(s.booked).toBe(s.n);

      // The restarted API answers from the same data: the organiser sees the same remaining stock.
      const share = await call('GET', SHARE, mara.token);
      expect(share.body.stock.find((s: { speciesSlug: string }) => s.speciesSlug === SLUG).remaining).toBe(
        stock.remaining,
      );
    },
    SLOW,
  );

  it(
    'lands a species CSV import killed halfway whole or not at all',
    async () => {
      const ines = await signIn('ines.calder@example.org', 'larkfield-ines');
      const exported = await call('GET', '/api/species/export.csv');
      expect(exported.status).toBe(200);
      const parsed = Papa.parse<Record<string, string>>(exported.body as string, {
        header: true,
        skipEmptyLines: true,
      });
      const rows = parsed.data;
      const heightOf = new Map(rows.map((r) => [r.slug, Number(r.heightMaxCm)]));
      /** The whole catalogue with every maximum height raised by `by` cm: one write per species in one transaction. */
      const fileWith = (by: number) =>
        Papa.unparse(
          {
            fields: parsed.meta.fields!,
            data: rows.map((r) => ({ ...r, heightMaxCm: String(heightOf.get(r.slug)! + by) })),
          },
          { newline: '\r\n' },
        );
      const importFile = (csv: string, signal?: AbortSignal) => {
        const form = new FormData();
        form.append('file', new Blob([csv], { type: 'text/csv' }), 'all-heights.csv');
        return fetch(`${api!.baseUrl}/api/species/import`, {
          method: 'POST',
          headers: { Authorization: `Bearer ${ines.token}` },
          body: form,
          signal,
        });
      };
      const raisedBy = (by: number) =>
        readDb(
          (db) =>
            (db.prepare('SELECT slug, height_max_cm AS h FROM species').all() as { slug: string; h: number }[]).filter(
              (r) => heightOf.has(r.slug) && r.h === heightOf.get(r.slug)! + by,
            ).length,
        );

      // A first import, run to the end, shows how long one takes here; the second is killed at about half that.
      const t0 = Date.now();
      const first = await importFile(fileWith(1));
      expect(first.status).toBe(200);
      expect(await first.json()).toMatchObject({ created: 0, updated: rows.length, dryRun: false });
      const took = Date.now() - t0;
      expect(raisedBy(1)).toBe(rows.length);

      let answered: number | undefined;
      const second = importFile(fileWith(2)).then(
        (r) => (answered = r.status),
        () => undefined,
      );
      await sleep(Math.max(20, Math.round(took * 0.5)));
      await api!.kill();
      await second;

      api = await startBuiltApi(dataDir);
      const landed = raisedBy(2);
      const stayed = raisedBy(1);
      console.log(
        `import kill test: ${rows.length} species, a full import took ${took} ms; killed at ${Math.round(took * 0.5)} ms, ` +
          `${answered ? `answered ${answered} first` : 'no answer'}; after restart ${landed} rows carry the new value, ${stayed} the old`,
      );
      // All or nothing: either every row carries the killed import's value or every row the previous one.
      expect([0, rows.length]).toContain(landed);
      expect(landed + stayed).toBe(rows.length);
      if (answered === 200) expect(landed).toBe(rows.length);
      // The change history agrees: one "import" change per species per import that landed.
      const imports = readDb(
        (db) =>
          (db.prepare(`SELECT COUNT(*) AS n FROM species_changes WHERE kind = 'import'`).get() as { n: number }).n,
      );
      expect(imports).toBe(rows.length * (landed ? 2 : 1));
      // The restarted API's read model agrees with the file.
      const again = Papa.parse<Record<string, string>>((await call('GET', '/api/species/export.csv')).body as string, {
        header: true,
        skipEmptyLines: true,
      }).data;
      const by = landed ? 2 : 1;
      expect(again.filter((r) => Number(r.heightMaxCm) === heightOf.get(r.slug)! + by)).toHaveLength(rows.length);
    },
    SLOW,
  );
});
