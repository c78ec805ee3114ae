/**
 * Species search: p50/p95 latency and recall (the intended species in the top 10) for typo'd
 * queries, at the real catalogue's size and at 30,000 species, against fuse.js alone.
 */
import { seededRandom } from '@homeground/shared';
import { performance } from 'node:perf_hooks';
import { loadCatalogue } from '@homeground/species-data';
import Fuse from 'fuse.js';
import { type NameEntry, SpeciesSearchIndex } from '../dist/species/search/species-search-index.js';
import { percentile } from './support.js';
import { syntheticNames, withTypos } from './synthetic-species.js';

const species = loadCatalogue().species;
const real: NameEntry[] = species.flatMap((s) => [
  { slug: s.slug, name: s.scientificName, kind: 'scientific' as const },
  ...s.commonNames.map((name) => ({ slug: s.slug, name, kind: 'common' as const })),
  ...s.synonyms.map((name) => ({ slug: s.slug, name, kind: 'synonym' as const })),
]);

const rnd = seededRandom(7);
const queries = Array.from({ length: 300 }, () => {
  const s = species[Math.floor(rnd() * species.length)];
  const name = rnd() < 0.5 ? s.commonNames[0] : s.scientificName;
  return { q: withTypos(name.toLowerCase(), rnd), slug: s.slug };
});
queries.push(
  { q: 'buterfly weed', slug: 'asclepias-tuberosa' },
  { q: 'aesclepias tuberosa', slug: 'asclepias-tuberosa' },
);

function run(label: string, search: (q: string) => string[], qs = queries) {
  for (const { q } of qs.slice(0, 20)) search(q); // warm up
  const times: number[] = [];
  let found = 0;
  for (const { q, slug } of qs) {
    const t0 = performance.now();
    const top = search(q);
    times.push(performance.now() - t0);
    if (top.slice(0, 10).includes(slug)) found++;
  }
  times.sort((a, b) => a - b);
  const row = {
    label,
    queries: qs.length,
    p50Ms: +percentile(times, 50).toFixed(2),
    p95Ms: +percentile(times, 95).toFixed(2),
    recallTop10: +(found / qs.length).toFixed(3),
  };
  console.log(JSON.stringify(row));
  return row;
}

const small = new SpeciesSearchIndex(real);
const r300 = run(`index, ${species.length} species`, (q) => small.search(q, 10).map((h) => h.slug));

const big = [...real, ...syntheticNames(real, 30_000 - species.length)];
const large = new SpeciesSearchIndex(big);
const r30k = run(`index, 30,000 species (${big.length} names)`, (q) => large.search(q, 10).map((h) => h.slug));

const fuseAlone = new Fuse(big, { keys: ['name'], includeScore: true, ignoreLocation: true, threshold: 0.45 });
const rFuse = run(
  'fuse.js alone, 30,000 species (60 queries)',
  (q) => [...new Set(fuseAlone.search(q, { limit: 40 }).map((r) => r.item.slug))],
  queries.slice(0, 60),
);

console.log(
  `\nsearch targets: p95 ≤ 5 ms at ${species.length} (${r300.p95Ms} ms), ≤ 20 ms at 30,000 (${r30k.p95Ms} ms); recall ≥ 0.90 (${r300.recallTop10}, ${r30k.recallTop10})`,
);
console.log(
  `index vs fuse.js alone at 30,000: ${(rFuse.p95Ms / r30k.p95Ms).toFixed(1)}× faster at p95, recall ${r30k.recallTop10} vs ${rFuse.recallTop10}`,
);
