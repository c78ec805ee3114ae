import { describe, expect, it } from 'vitest';
import type { RegionContext, Site } from '../types/site.js';
import { MOISTURE_LEVELS, SUN_LEVELS } from '../types/species.js';
import { ALL_FIXTURES, LARKFIELD } from './__tests__/species-fixtures.js';
import { hardCheckOutcome } from './hard-check-outcome.js';
import { scoreSpecies } from './score-species.js';

// A consistency check, not a check of outside values: the quick verdict must always agree with
// the full scoring it stands in for, over every fixture on a grid of sites and states.
describe('hardCheckOutcome agrees with scoreSpecies (eligible / near miss / out)', () => {
  const regions: RegionContext[] = [LARKFIELD, { state: 'IL' }, { state: 'TX' }, { state: 'ME' }];
  const sites: Site[] = [];
  for (const sun of SUN_LEVELS) {
    for (const moisture of MOISTURE_LEVELS) {
      for (const areaSqFt of [3, 20, 300, 5000]) {
        for (const maxHeightCm of [undefined, 40, 60, 100]) {
          sites.push({
            sun,
            moisture,
            areaSqFt,
            deerPressure: 'medium',
            goals: [],
            ...(maxHeightCm ? { maxHeightCm } : {}),
          });
        }
      }
    }
  }

  it(`on ${ALL_FIXTURES.length} species × ${sites.length} sites × ${regions.length} states`, () => {
    const seen = new Set<string>();
    for (const region of regions) {
      for (const site of sites) {
        for (const s of ALL_FIXTURES) {
          const full = scoreSpecies(s, site, region);
          const expected = full.eligible ? 'eligible' : full.nearMiss ? 'near-miss' : 'out';
          expect(hardCheckOutcome(s, site, region), `${s.slug} ${JSON.stringify(site)} ${region.state}`).toBe(expected);
          seen.add(expected);
        }
      }
    }
    expect([...seen].sort()).toEqual(['eligible', 'near-miss', 'out']);
  });
});
