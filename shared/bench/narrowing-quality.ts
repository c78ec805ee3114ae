import { balancePalette, resolveSize } from '../src/palette-balancing/balance-palette.js';
import { narrowCandidates } from '../src/palette-balancing/candidate-pool.js';
import { makeObjective } from '../src/palette-balancing/objective.js';
import { optimiseSelection } from '../src/palette-balancing/optimiser.js';
import { buildCandidates } from '../src/palette-balancing/palette-candidates.js';
import type { RegionContext, Site } from '../src/types/site.js';
import type { Species } from '../src/types/species.js';
import { timeOnce } from './timing.js';

/**
 * What narrowing the search (candidate-pool.ts) costs in quality: the mix objective with the
 * narrowed search, over the objective when greedy and swaps try every candidate.
 */
export function narrowingQuality(
  cat: { name: string; species: Species[] },
  sites: { name: string; site: Site }[],
  region: RegionContext,
) {
  return sites.map(({ name, site }) => {
    const input = { species: cat.species, site, region };
    const c = buildCandidates(input);
    const { size } = resolveSize(input, c);
    const settings = { size, monarchsGoal: site.goals.includes('monarchs') };
    const objective = makeObjective(settings);
    const narrowed = timeOnce(() =>
      optimiseSelection(c.items, size, objective, {
        locked: c.locked,
        searchPool: (p) => narrowCandidates(p, settings),
      }),
    );
    const full = timeOnce(() => optimiseSelection(c.items, size, objective, { locked: c.locked }));
    if (balancePalette(input).objective !== round4(narrowed.result.value))
      throw new Error('bench: balancePalette disagrees with its optimiser call');
    return {
      catalogue: cat.name,
      site: name,
      candidates: c.items.length,
      searched: narrowCandidates(c.items, settings).length,
      narrowedValue: round4(narrowed.result.value),
      fullValue: round4(full.result.value),
      ratio: round4(narrowed.result.value / full.result.value),
      narrowedMs: round4(narrowed.ms),
      fullMs: round4(full.ms),
      swapsNarrowed: narrowed.result.swaps,
    };
  });
}

const round4 = (x: number) => Math.round(x * 1e4) / 1e4;
