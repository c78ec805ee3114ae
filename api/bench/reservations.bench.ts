import { cpus, loadavg } from 'node:os';
import { DEMO_PEOPLE } from '../src/demo/demo-people.js';
import { percentile, startBareServer, startBuiltApi } from './support.js';

/**
 * Reservations under load: 500 households reserve one plant each for 100 plants on offer, over
 * loopback, first all at the same moment (500 in flight), then as 50 households at a time (the
 * latency each one sees under steady load). Prints how many were confirmed (must be exactly 100),
 * the latency percentiles and the throughput; the goal (p95 ≤ 200 ms) is read off the figures,
 * never asserted.
 *
 * The same client, in the same run and with the same number in flight, also asks two ceilings: a bare
 * node:http server answering fixed bytes, and the API's cheapest route (`GET /api/health`). With 500
 * requests arriving at once the last answers wait for every earlier one, so p95 is about 475 times the
 * CPU one request costs; the ratios say how much of that is the reservation and how much the machine.
 * Connections are opened before each measured round (a taker's browser has just loaded the share page
 * over them); the first, cold round is printed too, as connection set-up is then part of the wait.
 */
const REQUESTS = 500;
const PLANTS = 100;
const GROUP = 'larkfield-commons-growers';

const api = await startBuiltApi({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100' });
const bare = await startBareServer(Buffer.from('{"id":"r","status":"confirmed"}'), 'application/json');

/** `REQUESTS` requests with `inFlight` at a time; answers sorted latencies and the wall time. */
async function burst(
  url: string,
  inFlight: number,
  init: (i: number) => RequestInit = () => ({}),
): Promise<{ ms: number[]; seconds: number; statuses: Map<number, number> }> {
  const ms: number[] = [];
  const statuses = new Map<number, number>();
  let next = 0;
  const t0 = performance.now();
  await Promise.all(
    Array.from({ length: inFlight }, async () => {
      while (next < REQUESTS) {
        const i = next++;
        const began = performance.now();
        const res = await fetch(url, init(i));
        await res.arrayBuffer();
        ms.push(performance.now() - began);
        statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
      }
    }),
  );
  return { ms: ms.sort((a, b) => a - b), seconds: (performance.now() - t0) / 1000, statuses };
}
const figures = (ms: number[]) =>
  `p50 ${percentile(ms, 50).toFixed(1)} ms, p95 ${percentile(ms, 95).toFixed(1)} ms, p99 ${percentile(ms, 99).toFixed(1)} ms`;

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
  let confirmedInRound = 0;

  /** One round: 100 plants of `slug` on offer, a slot for everyone, 500 requests with `inFlight` at a time. */
  async function round(
    slug: string,
    start: string,
    end: string,
    inFlight: number,
    tag: string,
    cold = false,
  ): Promise<void> {
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

    const body = (i: number): RequestInit => ({
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
    // The two ceilings first, with the same client and the same number in flight, each after an unmeasured
    // pass that opens its connections (the API's are then the ones the round uses, unless it is the cold one).
    await burst(bare.url, inFlight, body);
    const bareRun = await burst(bare.url, inFlight, body);
    await burst(`${api.baseUrl}/api/health`, inFlight);
    const healthRun = await burst(`${api.baseUrl}/api/health`, inFlight);
    if (cold) await new Promise((r) => setTimeout(r, 6000)); // past the server's keep-alive: fresh connections
    const cpu0 = api.cpuMs();
    const { ms, seconds, statuses: byStatus } = await burst(url, inFlight, body);
    const cpu1 = api.cpuMs();
    confirmedInRound = byStatus.get(201) ?? 0;
    const after = await fetch(share, { headers: auth });
    const left = ((await after.json()) as { stock: { speciesSlug: string; remaining: number }[] }).stock.find(
      (s) => s.speciesSlug === slug,
    )!.remaining;
    console.log(
      `${REQUESTS} reservations for ${PLANTS} plants, ${inFlight} in flight at a time (one plant each, loopback, SQLite, ${cold ? 'new connections' : 'connections already open'}):`,
    );
    // Latency on a shared machine depends on what else runs: print the load beside the figures.
    console.log(`  machine: ${cpus().length} cores, load average ${loadavg()[0].toFixed(1)} (1 min)`);
    console.log(`  confirmed (201): ${byStatus.get(201) ?? 0}  (exactly ${PLANTS} expected)`);
    console.log(`  all taken (409): ${byStatus.get(409) ?? 0}`);
    const other = [...byStatus].filter(([s]) => s !== 201 && s !== 409);
    if (other.length) console.log(`  other answers: ${other.map(([s, n]) => `${s}×${n}`).join(', ')}`);
    console.log(`  plants left: ${left}`);
    console.log(`  latency ${figures(ms)} (goal: p95 ≤ 200 ms)`);
    const p95 = percentile(ms, 95);
    console.log(
      `  same client, same ${inFlight} in flight: bare node:http ${figures(bareRun.ms)}; GET /api/health ${figures(healthRun.ms)}`,
    );
    console.log(
      `  p95 ratio: ${(p95 / percentile(bareRun.ms, 95)).toFixed(1)}× bare node:http, ${(p95 / percentile(healthRun.ms, 95)).toFixed(1)}× the API's cheapest route`,
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

  /**
   * Confirmations go out after the answers, one at a time: wait until all so far are in the local outbox,
   * so the next round is not measured against this one's e-mails (and before stopping the server).
   */
  async function mailSent(tag: string): Promise<void> {
    const mailStart = performance.now();
    let mailed = 0;
    while (performance.now() - mailStart < 120_000) {
      // The outbox answers its newest 200 messages: this round's 100 are among them once sent.
      const outbox = await fetch(`${api.baseUrl}/api/outbox?kind=plant-share-reservation`, { headers: auth });
      const messages = (await outbox.json()) as { to: string[] }[];
      mailed = messages.filter((m) => m.to.some((t) => t.startsWith(`${tag}-`))).length;
      if (mailed >= confirmedInRound) break;
      await new Promise((r) => setTimeout(r, 100));
    }
    console.log(
      `  confirmation e-mails in the local outbox: ${mailed} of ${confirmedInRound} (${((performance.now() - mailStart) / 1000).toFixed(1)} s after the last answer)`,
    );
  }

  await round('viola-canadensis', '2027-06-12T13:00:00-05:00', '2027-06-12T14:00:00-05:00', REQUESTS, 'cold', true);
  await mailSent('cold');
  await round('rudbeckia-hirta', '2027-06-12T14:00:00-05:00', '2027-06-12T15:00:00-05:00', REQUESTS, 'burst');
  await mailSent('burst');
  await round('solidago-speciosa', '2027-06-12T15:00:00-05:00', '2027-06-12T16:00:00-05:00', 50, 'steady');
  await mailSent('steady');
} finally {
  await api.stop();
  await bare.stop();
}
