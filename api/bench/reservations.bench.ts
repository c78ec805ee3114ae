import { cpus, loadavg } from 'node:os';
import { DEMO_PEOPLE } from '../src/demo/demo-people.js';
import { percentile, startBuiltApi } from './support.js';

/**
 * Reservations under load: 500 households reserve one plant each for 100 plants on offer, over
 * loopback, first all at the same moment (500 in flight), then as 50 households at a time (the
 * latency each one sees under steady load). Prints how many were confirmed (must be exactly 100),
 * the latency percentiles and the throughput; the goal (p95 ≤ 200 ms) is read off the figures,
 * never asserted.
 */
const REQUESTS = 500;
const PLANTS = 100;
const GROUP = 'larkfield-commons-growers';

const api = await startBuiltApi({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100' });
try {
  const mara = DEMO_PEOPLE.find((p) => p.email === 'mara.ellsworth@example.org')!;
  const login = await fetch(`${api.baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: mara.email, password: mara.password }),
  });
  const auth = {
    'Content-Type': 'application/json',
    Authorization: `Bearer ${((await login.json()) as { accessToken: string }).accessToken}`,
  };
  const share = `${api.baseUrl}/api/groups/${GROUP}/plant-share`;
  const url = `${api.baseUrl}/api/plant-shares/${GROUP}/reservations`;
  let confirmedInAll = 0;

  /** One round: 100 plants of `slug` on offer, a slot for everyone, 500 requests with `inFlight` at a time. */
  async function round(slug: string, start: string, end: string, inFlight: number, tag: string): Promise<void> {
    const put = await fetch(`${share}/stock`, {
      method: 'PUT',
      headers: auth,
      body: JSON.stringify({ stock: [{ speciesSlug: slug, count: PLANTS }] }),
    });
    if (!put.ok) throw new Error(`setting the stock answered ${put.status}`);
    const slot = await fetch(`${share}/slots`, {
      method: 'POST',
      headers: auth,
      body: JSON.stringify({ start, end, capacity: REQUESTS }),
    });
    const slotId = ((await slot.json()) as { slots: { id: string; start: string }[] }).slots.find(
      (s) => s.start === start,
    )!.id;

    const results: { status: number; ms: number }[] = [];
    let next = 0;
    const cpu0 = api.cpuMs();
    const t0 = performance.now();
    await Promise.all(
      Array.from({ length: inFlight }, async () => {
        while (next < REQUESTS) {
          const i = next++;
          const began = performance.now();
          const res = await fetch(url, {
            method: 'POST',
            headers: { 'Content-Type': 'application/json' },
            body: JSON.stringify({
              name: `Household ${i + 1}`,
              email: `${tag}-${i + 1}@example.org`,
              zip: '54665',
              slotId,
              lines: [{ speciesSlug: slug, count: 1 }],
            }),
          });
          await res.arrayBuffer();
          results.push({ status: res.status, ms: performance.now() - began });
        }
      }),
    );
    const seconds = (performance.now() - t0) / 1000;
    const cpu1 = api.cpuMs();
    const ms = results.map((r) => r.ms).sort((a, b) => a - b);
    const byStatus = new Map<number, number>();
    for (const r of results) byStatus.set(r.status, (byStatus.get(r.status) ?? 0) + 1);
    confirmedInAll += byStatus.get(201) ?? 0;
    const after = await fetch(share, { headers: auth });
    const left = ((await after.json()) as { stock: { speciesSlug: string; remaining: number }[] }).stock.find(
      (s) => s.speciesSlug === slug,
    )!.remaining;
    console.log(
      `${REQUESTS} reservations for ${PLANTS} plants, ${inFlight} in flight at a time (one plant each, loopback, SQLite):`,
    );
    // Latency on a shared machine depends on what else runs: print the load beside the figures.
    console.log(`  machine: ${cpus().length} cores, load average ${loadavg()[0].toFixed(1)} (1 min)`);
    console.log(`  confirmed (201): ${byStatus.get(201) ?? 0}  (exactly ${PLANTS} expected)`);
    console.log(`  all taken (409): ${byStatus.get(409) ?? 0}`);
    const other = [...byStatus].filter(([s]) => s !== 201 && s !== 409);
    if (other.length) console.log(`  other answers: ${other.map(([s, n]) => `${s}×${n}`).join(', ')}`);
    console.log(`  plants left: ${left}`);
    console.log(
      `  latency p50 ${percentile(ms, 50).toFixed(1)} ms, p95 ${percentile(ms, 95).toFixed(1)} ms, p99 ${percentile(ms, 99).toFixed(1)} ms (goal: p95 ≤ 200 ms)`,
    );
    console.log(
      `  throughput ${(REQUESTS / seconds).toFixed(0)} requests/s (${seconds.toFixed(2)} s for all ${REQUESTS})`,
    );
    // The server's own CPU per request holds steady when other work slows the wall clock.
    if (cpu0 !== null && cpu1 !== null)
      console.log(
        `  server CPU ${(cpu1 - cpu0).toFixed(0)} ms in all, ${((cpu1 - cpu0) / REQUESTS).toFixed(2)} ms per request`,
      );
  }

  await round('viola-canadensis', '2027-06-12T13:00:00-05:00', '2027-06-12T14:00:00-05:00', REQUESTS, 'burst');
  await round('rudbeckia-hirta', '2027-06-12T14:00:00-05:00', '2027-06-12T15:00:00-05:00', 50, 'steady');

  // Confirmations go out after the answers, one at a time: wait for them before stopping the server.
  const mailStart = performance.now();
  let mailed = 0;
  while (performance.now() - mailStart < 120_000) {
    const outbox = await fetch(`${api.baseUrl}/api/outbox?kind=plant-share-reservation`, { headers: auth });
    mailed = ((await outbox.json()) as unknown[]).length;
    if (mailed >= confirmedInAll) break;
    await new Promise((r) => setTimeout(r, 250));
  }
  console.log(
    `confirmation e-mails in the local outbox: ${mailed} of ${confirmedInAll} (${((performance.now() - mailStart) / 1000).toFixed(1)} s after the last answer)`,
  );
} finally {
  await api.stop();
}
