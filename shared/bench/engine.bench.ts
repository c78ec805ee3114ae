/**
 * Engine benchmark: prints one JSON line per figure, then a summary with the targets beside the
 * figures. Run with `npm run bench -w shared` (tsx). Timings are wall clock on this machine and
 * depend on its load; the tests never assert them.
 */
import { loadCatalogue } from '@homeground/species-data';
import { balancePalette } from '../src/palette-balancing/balance-palette.js';
import { recommend } from '../src/scoring/score-species.js';
import { RECOMMENDATION_LIST_LIMITS } from '../src/types/recommendation.js';
import { narrowingQuality } from './narrowing-quality.js';
import { optimiserVsExhaustive } from './optimiser-vs-exhaustive.js';
import { CATALOGUES, SITES, driftlessWisconsin } from './scenarios.js';
import { timeRuns } from './timing.js';

const RUNS = 50;
const TARGET_P95_MS: Record<string, number> = { 'real-300': 10, 'synthetic-30000': 250 };
const TARGET_QUALITY = 0.99;
const TARGET_SPEEDUP = 100;

const emit = (line: Record<string, unknown>) => console.log(JSON.stringify(line));
const verdict = (met: boolean) => (met ? 'MET' : 'MISSED');
const summary: string[] = [];
const region = driftlessWisconsin();

for (const cat of CATALOGUES) {
  const species = cat.make();
  const target = TARGET_P95_MS[cat.name];
  for (const { name, site } of SITES) {
    const input = { species, site, region };
    // A site's full answer: the ranked recommendation, then the balanced mix (which scores the
    // catalogue again for itself), as the API's two endpoints do: the recommendation ranks every
    // species and lists the first RECOMMENDATION_LIST_LIMITS with reasons. Each is also timed
    // alone, and the ranking with reasons for every species (what the shared function gives
    // without limits), for comparison.
    const ranking = () => recommend(species, site, region, {}, RECOMMENDATION_LIST_LIMITS);
    const both = timeRuns(() => [ranking(), balancePalette(input)], RUNS);
    const rec = timeRuns(ranking, RUNS);
    const recAll = timeRuns(() => recommend(species, site, region), RUNS);
    const palette = timeRuns(() => balancePalette(input), RUNS);
    const mix = balancePalette(input);
    const met = both.p95Ms <= target;
    emit({
      bench: 'recommendation+palette',
      catalogue: cat.name,
      site: name,
      mixSize: mix.size,
      objective: mix.objective,
      ...both,
      targetP95Ms: target,
      met,
    });
    emit({ bench: 'recommend-only', catalogue: cat.name, site: name, ...rec });
    emit({ bench: 'recommend-every-species-with-reasons', catalogue: cat.name, site: name, ...recAll });
    emit({ bench: 'palette-only', catalogue: cat.name, site: name, ...palette });
    summary.push(
      `recommendation+palette  ${cat.name} ${name}: p50 ${both.p50Ms} ms, p95 ${both.p95Ms} ms (target p95 ≤ ${target} ms) ${verdict(met)}; ` +
        `CPU p50 ${both.cpuP50Ms} ms, p95 ${both.cpuP95Ms} ms; palette alone p95 ${palette.p95Ms} ms; ` +
        `ranking with reasons for every species p95 ${recAll.p95Ms} ms`,
    );
  }
  for (const q of narrowingQuality({ name: cat.name, species }, SITES, region)) {
    emit({ bench: 'narrowed-vs-full-search', ...q });
    summary.push(
      `narrowed vs full search ${q.catalogue} ${q.site}: objective ratio ${q.ratio}, ${q.searched} of ${q.candidates} candidates searched`,
    );
  }
}
for (const q of narrowingQuality({ name: 'real-503', species: loadCatalogue().species }, SITES, region)) {
  emit({ bench: 'narrowed-vs-full-search', ...q });
  summary.push(
    `narrowed vs full search ${q.catalogue} ${q.site}: objective ratio ${q.ratio}, ${q.searched} of ${q.candidates} candidates searched`,
  );
}

const ox = optimiserVsExhaustive(50, 16, 18, 6);
emit({ bench: 'optimiser-vs-exhaustive', ...ox, targetMinRatio: TARGET_QUALITY, targetSpeedup: TARGET_SPEEDUP });
summary.push(
  `optimiser vs exhaustive (${ox.instances} instances, ${ox.candidates} candidates, N = ${ox.size}): quality min ${ox.minRatio}, mean ${ox.meanRatio} ` +
    `(target ≥ ${TARGET_QUALITY}) ${verdict(ox.minRatio >= TARGET_QUALITY)}; speed ${ox.speedup}× (target ≥ ${TARGET_SPEEDUP}×) ${verdict(ox.speedup >= TARGET_SPEEDUP)}`,
);

console.log('\nSummary');
for (const line of summary) console.log(`  ${line}`);
