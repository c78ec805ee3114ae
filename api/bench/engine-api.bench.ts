/**
 * Region lookup (ZIP → county by point-in-polygon → ecoregion) in process, and the throughput of
 * POST /api/mixes/balance against a bare node:http server returning the same precomputed JSON.
 */
import { seededRandom } from '@homeground/shared';
import { performance } from 'node:perf_hooks';
import zipcodes from 'zipcodes';
import { PolygonIndex } from '../dist/geometry/polygon-index.js';
import { loadCountyOutlines } from '../dist/geometry/us-counties.js';
import { measureThroughput, percentile, startBareServer, startBuiltApi } from './support.js';

// Region lookup: the county index is the work per request (the crosswalk is a map lookup after it).
const t0 = performance.now();
const counties = new PolygonIndex(loadCountyOutlines());
const buildMs = performance.now() - t0;
const rnd = seededRandom(11);
const states = ['WI', 'MN', 'IA', 'IL', 'MO', 'OH', 'PA', 'NY', 'GA', 'TX', 'KS', 'VA'];
const zips = states
  .flatMap((s) => zipcodes.lookupByState(s))
  .filter(() => rnd() < 0.2)
  .slice(0, 2000);
const times: number[] = [];
let found = 0;
for (const z of zips) {
  const a = performance.now();
  const c = counties.containing(z.longitude, z.latitude) ?? counties.nearest(z.longitude, z.latitude, 8);
  times.push(performance.now() - a);
  if (c) found++;
}
times.sort((a, b) => a - b);
console.log(
  JSON.stringify({
    label: 'region lookup (ZIP → county, Flatbush + point-in-polygon)',
    lookups: zips.length,
    found,
    indexBuildMs: +buildMs.toFixed(1),
    p50Ms: +percentile(times, 50).toFixed(3),
    p95Ms: +percentile(times, 95).toFixed(3),
  }),
);

const api = await startBuiltApi();
try {
  const body = JSON.stringify({
    site: {
      sun: 'full',
      moisture: 'medium',
      areaSqFt: 500,
      deerPressure: 'medium',
      goals: ['monarchs', 'pollinators'],
    },
    region: { state: 'WI', ecoregionCode: '52' },
  });
  const first = performance.now();
  const res = await fetch(`${api.baseUrl}/api/mixes/balance`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body,
  });
  const coldMs = performance.now() - first;
  const answer = Buffer.from(await res.arrayBuffer());
  const bare = await startBareServer(answer, 'application/json; charset=utf-8');
  try {
    const seconds = Number(process.env.BENCH_SECONDS ?? 5);
    const post = { method: 'POST' as const, headers: { 'content-type': 'application/json' }, body };
    const ours = await measureThroughput(`${api.baseUrl}/api/mixes/balance`, seconds, 20, post);
    const ceiling = await measureThroughput(bare.url, seconds, 20, post);
    console.log(
      JSON.stringify({
        label: 'POST /api/mixes/balance (first answer computed, then cached)',
        coldMs: +coldMs.toFixed(1),
        bytes: answer.length,
        ...ours,
      }),
    );
    console.log(JSON.stringify({ label: 'bare node:http, same JSON', bytes: answer.length, ...ceiling }));
    console.log(`\nmix endpoint throughput ratio: ${(ours.rps / ceiling.rps).toFixed(2)}× of bare node:http`);
  } finally {
    await bare.stop();
  }
} finally {
  await api.stop();
}
