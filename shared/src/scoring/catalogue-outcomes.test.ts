import { describe, expect, it } from 'vitest';
import type { RegionContext, Site } from '../types/site.js';
import { MOISTURE_LEVELS, SUN_LEVELS, type Species } from '../types/species.js';
import { ALL_FIXTURES, LARKFIELD } from './__tests__/species-fixtures.js';
import { ELIGIBLE, NEAR_MISS, OUT, catalogueOutcomes } from './catalogue-outcomes.js';
import { hardCheckOutcome } from './hard-check-outcome.js';
import { compareScored, recommend, scorePoints, scoreSpecies } from './score-species.js';
import { RANK_SPAN, scoreKey } from './scored-order.js';

// Consistency checks, not checks of outside values: the quick paths a big catalogue takes (all
// verdicts in one pass, points without words, ranking by packed sort keys, reasons only for the
// species returned) must give exactly what the per-species functions give.

const VERDICT = { [OUT]: 'out', [NEAR_MISS]: 'near-miss', [ELIGIBLE]: 'eligible' } as const;

/** The fixtures, plus variants that stress the checks: other ecoregions, woody, short-lived, odd codes. */
const CATALOGUE: Species[] = [
  ...ALL_FIXTURES,
  ...ALL_FIXTURES.map((s, k) => ({
    ...s,
    slug: `${s.slug}-v${k}`,
    ecoregions: k % 3 === 0 ? ['51', '053', '52a'] : k % 3 === 1 ? ['47', '52'] : [],
    growthForm: k % 4 === 0 ? ('shrub' as const) : s.growthForm,
    lifespan: k % 5 === 0 ? ('biennial' as const) : s.lifespan,
    spreadHabit: k % 6 === 0 ? ('aggressive' as const) : s.spreadHabit,
    sun: k % 7 === 0 ? [] : s.sun,
  })),
];

const regions: RegionContext[] = [
  LARKFIELD,
  { state: 'IL' },
  { state: 'TX', ecoregionCode: '33' },
  { state: 'ME' },
  { state: 'WI', ecoregionCode: '053' },
];
const sites: Site[] = [];
for (const sun of SUN_LEVELS) {
  for (const moisture of MOISTURE_LEVELS) {
    for (const areaSqFt of [3, 20, 300, 5000]) {
      for (const extra of [{}, { maxHeightCm: 60 }, { woodyPlants: true }, { spreaders: true, woodyPlants: true }]) {
        sites.push({ sun, moisture, areaSqFt, deerPressure: 'high', goals: ['pollinators', 'monarchs'], ...extra });
      }
    }
  }
}

describe('catalogueOutcomes agrees with hardCheckOutcome', () => {
  it(`on ${CATALOGUE.length} species × ${sites.length} sites × ${regions.length} regions`, () => {
    const seen = new Set<string>();
    for (const region of regions) {
      for (const site of sites) {
        const all = catalogueOutcomes(CATALOGUE, site, region);
        CATALOGUE.forEach((s, i) => {
          const one = hardCheckOutcome(s, site, region);
          expect(VERDICT[all[i] as 0 | 1 | 2], `${s.slug} ${JSON.stringify(site)} ${region.state}`).toBe(one);
          seen.add(one);
        });
      }
    }
    expect([...seen].sort()).toEqual(['eligible', 'near-miss', 'out']);
  });
});

describe('points without words, and the ranking', () => {
  it('scorePoints gives scoreSpecies’ score and tie-break, and its host points', () => {
    for (const site of sites.slice(0, 40)) {
      for (const s of CATALOGUE) {
        const full = scoreSpecies(s, site, LARKFIELD);
        const p = scorePoints(s, site, LARKFIELD);
        let host = 0;
        for (const part of full.parts)
          if (part.name === 'host-plant' || part.name === 'monarch-host') host += part.points;
        expect([p.score, p.tieBreak, p.hostPoints]).toEqual([full.score, full.tieBreak, host]);
      }
    }
  });

  it('ranks as scoring every species and sorting by compareScored, with or without limits', () => {
    // The same records twice in reverse order: equal slugs must keep catalogue order, as a stable sort does.
    const catalogue = [...CATALOGUE, ...[...CATALOGUE].reverse()];
    for (const site of sites.filter((_, k) => k % 5 === 0)) {
      const ranked: ReturnType<typeof scoreSpecies>[] = [];
      const also: ReturnType<typeof scoreSpecies>[] = [];
      for (const s of catalogue) {
        const r = scoreSpecies(s, site, LARKFIELD);
        if (r.eligible) ranked.push(r);
        else if (r.nearMiss) also.push(r);
      }
      ranked.sort(compareScored);
      also.sort(compareScored);
      const all = recommend(catalogue, site, LARKFIELD);
      expect(all.ranked).toEqual(ranked);
      expect(all.alsoConsider).toEqual(also);
      const few = recommend(catalogue, site, LARKFIELD, {}, { ranked: 5, alsoConsider: 2 });
      expect(few.ranked).toEqual(ranked.slice(0, 5));
      expect(few.alsoConsider).toEqual(also.slice(0, 2));
    }
  });

  it('packs score, tie-break and slug rank into keys that sort as compareScored, NaN out of range', () => {
    const entries = [
      { slug: 'b', score: 12.5, tieBreak: 3 },
      { slug: 'a', score: 12.5, tieBreak: 3 },
      { slug: 'c', score: 12.5, tieBreak: 40.25 },
      { slug: 'd', score: -3.75, tieBreak: -20 },
      { slug: 'e', score: 99.99, tieBreak: 0 },
    ];
    const rank = (slug: string) => 'abcde'.indexOf(slug);
    const byKey = [...entries].sort(
      (x, y) => scoreKey(x.score, x.tieBreak, rank(x.slug)) - scoreKey(y.score, y.tieBreak, rank(y.slug)),
    );
    expect(byKey.map((e) => e.slug)).toEqual([...entries].sort(compareScored).map((e) => e.slug));
    expect(scoreKey(200, 0, 1)).toBeNaN();
    expect(scoreKey(1, -200, 1)).toBeNaN();
    expect(scoreKey(1, 0, RANK_SPAN)).toBeNaN();
  });
});
