/**
 * `npm run bench:load`: the built API under load on loopback against a bare node:http server in the
 * same run. Four routes: species search, the mix (POST /api/mixes/balance), reservations at the plant
 * share, and a grower's batch log (twice: fresh, then after that run's entries, to show whether a
 * write slows as the log grows). Each run is bounded in request count and in time; the figures are
 * printed (p50/p95/p99 latency, throughput) with their ratio to the bare server answering the same
 * bytes. Nothing here asserts a time: the goals are read off the figures.
 */
import { randomUUID } from 'node:crypto';
import { cpus, loadavg } from 'node:os';
import Database from 'better-sqlite3';
import autocannon from 'autocannon';
import { DEMO_PEOPLE } from '../src/demo/demo-people.js';
import { percentile, startBareServer, startBuiltApi } from './support.js';

const GROUP = 'larkfield-commons-growers';
/** Bounds of each run: whichever comes first ends it. Small by default (shared two-core machines). */
const MAX_REQUESTS = Number(process.env.BENCH_REQUESTS ?? 1500);
const MAX_SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 10);
/** Entries added straight into the batch's log before its second run, so that run writes to a long log. */
const GROWN_LOG = Number(process.env.BENCH_LOG_ENTRIES ?? 2000);
/** Only the scenarios whose label contains one of these words (comma-separated, e.g. `batch log`); all when unset. */
const ONLY = (process.env.BENCH_ONLY ?? '')
  .split(',')
  .map((w) => w.trim().toLowerCase())
  .filter(Boolean);

interface Figures {
  requests: number;
  seconds: number;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  non2xx: number;
  errors: number;
}

interface Scenario {
  label: string;
  path: string;
  method: 'GET' | 'POST';
  headers?: Record<string, string>;
  /** The body of request number `i` (so writes can differ, e.g. one e-mail per household). */
  body?: (i: number) => string;
  /** Paths to rotate through for reads (e.g. several search words). */
  paths?: string[];
  /** At most this many requests (writes are capped by what the scenario can accept). */
  amount: number;
  /** Runs before the scenario (e.g. grows the batch log). */
  prepare?: () => void;
}

/** One bounded autocannon run; stopped at `MAX_SECONDS` if the count has not been reached. */
async function run(baseUrl: string, s: Scenario): Promise<Figures> {
  let i = 0;
  const started = performance.now();
  let done!: (r: autocannon.Result) => void;
  let failed!: (e: unknown) => void;
  const finished = new Promise<autocannon.Result>((res, rej) => ((done = res), (failed = rej)));
  const instance = autocannon(
    {
      url: baseUrl,
      connections: CONNECTIONS,
      pipelining: 1,
      amount: s.amount,
      requests: [
        {
          method: s.method,
          headers: { 'content-type': 'application/json', ...s.headers },
          setupRequest: (req) => {
            const n = i++;
            return {
              ...req,
              path: s.paths ? s.paths[n % s.paths.length] : s.path,
              ...(s.body ? { body: s.body(n) } : {}),
            };
          },
        },
      ],
    },
    (err, result) => (err ? failed(err) : done(result)),
  );
  // autocannon's summary has no p95, so every response time is kept and the percentiles taken here.
  const times: number[] = [];
  instance.on('response', (_client, _status, _bytes, ms: number) => times.push(ms));
  const timer = setTimeout(() => instance.stop(), MAX_SECONDS * 1000);
  const r = await finished;
  clearTimeout(timer);
  const seconds = (performance.now() - started) / 1000;
  times.sort((a, b) => a - b);
  const at = (p: number) => +percentile(times, p).toFixed(2);
  return {
    requests: times.length,
    seconds,
    rps: times.length / seconds,
    p50: at(50),
    p95: at(95),
    p99: at(99),
    non2xx: r.non2xx,
    errors: r.errors,
  };
}

async function json<T>(res: Response, what: string): Promise<T> {
  if (!res.ok) throw new Error(`${what} answered ${res.status}: ${await res.text()}`);
  return (await res.json()) as T;
}

const api = await startBuiltApi({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100' });

/** Adds `n` one-seed "sown" entries to a batch's log in one transaction, beside the running API. */
function growLog(batchId: string, userId: string, date: string, n: number): void {
  const db = new Database(api.databasePath);
  db.pragma('busy_timeout = 5000');
  const insert = db.prepare(
    `INSERT INTO batch_log_entries (id, batch_id, kind, count, date, created_by) VALUES (?, ?, 'sown', 1, ?, ?)`,
  );
  db.transaction(() => {
    for (let i = 0; i < n; i++) insert.run(randomUUID(), batchId, date, userId);
  })();
  db.close();
}
const stops: (() => Promise<void>)[] = [];
try {
  const base = api.baseUrl;
  const signIn = async (email: string) => {
    const p = DEMO_PEOPLE.find((d) => d.email === email)!;
    const body = await json<{ accessToken: string; user: { id: string } }>(
      await fetch(`${base}/api/auth/login`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ email: p.email, password: p.password }),
      }),
      `signing in ${email}`,
    );
    return { auth: { Authorization: `Bearer ${body.accessToken}` }, id: body.user.id };
  };
  const mara = await signIn('mara.ellsworth@example.org');
  const juniper = await signIn('juniper.okafor@example.org');
  const withJson = (h: Record<string, string>) => ({ ...h, 'Content-Type': 'application/json' });

  // Reservations need stock and room in a slot: one species with the most plants a line of stock takes,
  // and slots whose capacity covers the run.
  const share = `${base}/api/groups/${GROUP}/plant-share`;
  const slug = 'rudbeckia-hirta';
  await json(
    await fetch(`${share}/stock`, {
      method: 'PUT',
      headers: withJson(mara.auth),
      body: JSON.stringify({ stock: [{ speciesSlug: slug, count: 10_000 }] }),
    }),
    'setting the stock',
  );
  const slotIds: string[] = [];
  for (let h = 0; h < 4; h++) {
    const start = `2027-06-12T${String(15 + h).padStart(2, '0')}:00:00-05:00`;
    const end = `2027-06-12T${String(15 + h).padStart(2, '0')}:30:00-05:00`;
    const slots = await json<{ slots: { id: string; start: string }[] }>(
      await fetch(`${share}/slots`, {
        method: 'POST',
        headers: withJson(mara.auth),
        body: JSON.stringify({ start, end, capacity: 500 }),
      }),
      'adding a slot',
    );
    slotIds.push(slots.slots.find((s) => Date.parse(s.start) === Date.parse(start))!.id);
  }
  const today = new Date().toISOString().slice(0, 10);
  const batches = await json<{ batches: { id: string; growerId: string }[] }>(
    await fetch(`${base}/api/groups/${GROUP}/season/batches`, { headers: juniper.auth }),
    'reading the batches',
  );
  const batch = batches.batches.find((b) => b.growerId === juniper.id)!;

  const site = (sun: string, moisture: string) =>
    JSON.stringify({
      site: { sun, moisture, areaSqFt: 500, deerPressure: 'medium', goals: ['monarchs', 'pollinators'] },
      region: { state: 'WI', ecoregionCode: '52' },
    });
  const mixBodies = [site('full', 'medium'), site('part', 'medium'), site('full', 'dry'), site('shade', 'wet')];
  const words = ['milkweed', 'aster', 'bergamot', 'rudbekia', 'violet', 'golden', 'prairie', 'sedge'];

  const scenarios: Scenario[] = [
    {
      label: 'species search (GET /api/species?q=…)',
      method: 'GET',
      path: '/api/species?q=aster',
      paths: words.map((w) => `/api/species?q=${w}&state=WI`),
      amount: MAX_REQUESTS,
    },
    {
      label: 'the mix (POST /api/mixes/balance)',
      method: 'POST',
      path: '/api/mixes/balance',
      body: (i) => mixBodies[i % mixBodies.length],
      amount: MAX_REQUESTS,
    },
    {
      label: 'reservations (POST /api/plant-shares/:slug/reservations)',
      method: 'POST',
      path: `/api/plant-shares/${GROUP}/reservations`,
      body: (i) =>
        JSON.stringify({
          name: `Household ${i + 1}`,
          email: `load-${i + 1}@example.org`,
          zip: '54665',
          slotId: slotIds[i % slotIds.length],
          lines: [{ speciesSlug: slug, count: 1 }],
        }),
      // Four slots of 500 households: every request can be confirmed.
      amount: Math.min(MAX_REQUESTS, slotIds.length * 500),
    },
    {
      label: "a grower's batch log (POST …/season/batches/:id/log)",
      method: 'POST',
      path: `/api/groups/${GROUP}/season/batches/${batch.id}/log`,
      headers: juniper.auth,
      body: () => JSON.stringify({ kind: 'sown', count: 1, date: today }),
      amount: MAX_REQUESTS,
    },
    {
      // The same batch again, its log now holding the run above's entries and `GROWN_LOG` more (written
      // straight into the database file, WAL mode, as a long season would): a write should cost the same.
      label: `a grower's batch log, grown by ${GROWN_LOG} entries (POST …/season/batches/:id/log)`,
      prepare: () => growLog(batch.id, juniper.id, today, GROWN_LOG),
      method: 'POST',
      path: `/api/groups/${GROUP}/season/batches/${batch.id}/log`,
      headers: juniper.auth,
      body: () => JSON.stringify({ kind: 'sown', count: 1, date: today }),
      amount: MAX_REQUESTS,
    },
  ];

  console.log(
    `load on loopback: at most ${MAX_REQUESTS} requests or ${MAX_SECONDS} s per run, ${CONNECTIONS} connections; ` +
      `machine: ${cpus().length} cores, load average ${loadavg()[0].toFixed(1)} (1 min)`,
  );
  const rows: Record<string, string | number>[] = [];
  let confirmedReservations = 0;
  for (const s of scenarios.filter((x) => ONLY.length === 0 || ONLY.some((w) => x.label.toLowerCase().includes(w)))) {
    s.prepare?.();
    // The bare server answers every request with the bytes of one real answer of this route.
    const sample = await fetch(`${base}${s.paths?.[0] ?? s.path}`, {
      method: s.method,
      headers: { 'Content-Type': 'application/json', ...s.headers },
      ...(s.body ? { body: s.body(-1_000_000) } : {}),
    });
    const bytes = Buffer.from(await sample.arrayBuffer());
    const bare = await startBareServer(bytes, 'application/json; charset=utf-8');
    stops.push(bare.stop);
    const ours = await run(base, s);
    if (s.path.endsWith('/reservations')) confirmedReservations = ours.requests - ours.non2xx;
    const ceiling = await run(bare.url, { ...s, headers: {}, amount: s.amount });
    await bare.stop();
    stops.pop();
    const ratio = (a: number, b: number) => (b > 0 ? +(a / b).toFixed(2) : NaN);
    console.log(`\n${s.label}  (${bytes.length} bytes per answer)`);
    for (const [who, f] of [
      ['Homeground', ours],
      ['bare node:http', ceiling],
    ] as const) {
      console.log(
        `  ${who.padEnd(15)} ${f.requests} requests in ${f.seconds.toFixed(2)} s: ${f.rps.toFixed(0)} req/s; ` +
          `p50 ${f.p50} ms, p95 ${f.p95} ms, p99 ${f.p99} ms` +
          (f.non2xx || f.errors ? `; ${f.non2xx} non-2xx, ${f.errors} errors` : ''),
      );
    }
    const row = {
      route: s.label.split(' (')[0],
      'req/s': +ours.rps.toFixed(0),
      'bare req/s': +ceiling.rps.toFixed(0),
      'throughput ×bare': ratio(ours.rps, ceiling.rps),
      'p50 ×bare': ratio(ours.p50, ceiling.p50),
      'p95 ×bare': ratio(ours.p95, ceiling.p95),
      'p99 ×bare': ratio(ours.p99, ceiling.p99),
      'non-2xx': ours.non2xx,
    };
    console.log(
      `  ratio to bare: throughput ${row['throughput ×bare']}×, p50 ${row['p50 ×bare']}×, p99 ${row['p99 ×bare']}×`,
    );
    rows.push(row);
  }
  console.log('\nsummary (ratios to a bare node:http server on the same machine, same run):');
  console.table(rows);
  // Confirmation e-mails go out after the answers: let the local outbox catch up (at most 30 s) before
  // stopping, so the stop does not cut off a message being handed over.
  const waitedFrom = performance.now();
  let queued = true;
  while (queued && performance.now() - waitedFrom < 30_000) {
    const outbox = await fetch(`${base}/api/outbox?kind=plant-share-reservation`, { headers: mara.auth });
    queued = ((await outbox.json()) as unknown[]).length < confirmedReservations;
    if (queued) await new Promise((r) => setTimeout(r, 250));
  }
  if (queued)
    console.log(
      '(stopping with confirmation e-mails still queued: the local mail server refuses the rest as it stops)',
    );
} finally {
  for (const stop of stops) await stop();
  await api.stop();
}
