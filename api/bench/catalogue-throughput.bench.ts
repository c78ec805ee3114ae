/**
 * Catalogue list throughput: autocannon on loopback, 20 connections, against the built API and
 * against a bare node:http server returning the same bytes in the same run.
 */
import { measureThroughput, startBareServer, startBuiltApi } from './support.js';

const api = await startBuiltApi();
try {
  const path = '/api/species?state=WI&pageSize=24';
  const res = await fetch(api.baseUrl + path);
  const body = Buffer.from(await res.arrayBuffer());
  const bare = await startBareServer(body, res.headers.get('content-type') ?? 'application/json');
  try {
    const seconds = Number(process.env.BENCH_SECONDS ?? 5);
    const ours = await measureThroughput(api.baseUrl + path, seconds);
    const ceiling = await measureThroughput(bare.url, seconds);
    console.log(JSON.stringify({ label: 'GET /api/species (cached list page)', bytes: body.length, ...ours }));
    console.log(JSON.stringify({ label: 'bare node:http, same bytes', bytes: body.length, ...ceiling }));
    console.log(`\nlist throughput ratio: ${(ours.rps / ceiling.rps).toFixed(2)}× of bare node:http (target ≥ 0.25×)`);
  } finally {
    await bare.stop();
  }
} finally {
  await api.stop();
}
