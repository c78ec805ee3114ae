import { describe, expect, it } from 'vitest';
import {
  MOISTURE_LEVELS,
  SUN_LEVELS,
  balancePalette,
  plantsPerSpecies,
  randomInt,
  seededRandom,
  siteSchema,
  totalFootprintSqFt,
  type RegionContext,
  type Site,
  type Species,
} from '@homeground/shared';
import { loadCatalogue } from './catalogue.js';

/** Properties of the yard mix on the real catalogue, over seeded random sites (reproducible). */
const catalogue = loadCatalogue();
const bySlug = new Map(catalogue.species.map((s) => [s.slug, s]));
const regionFor = (state: RegionContext['state'], code: string): RegionContext => ({
  state,
  ecoregionCode: code,
  ecoregionPlantCommunities: catalogue.ecoregions.find((e) => e.code === code)?.plantCommunities,
});

function randomSite(random: () => number): Site {
  return siteSchema.parse({
    sun: SUN_LEVELS[randomInt(random, 0, 2)],
    moisture: MOISTURE_LEVELS[randomInt(random, 0, 2)],
    // 20 ft² to 20,000 ft², spread evenly on a log scale
    areaSqFt: Math.round(20 * 1000 ** random()),
    deerPressure: 'medium',
    goals: random() < 0.5 ? ['monarchs'] : [],
    woodyPlants: random() < 0.4,
  });
}

const chosenSpecies = (site: Site, region: RegionContext): Species[] =>
  balancePalette({ species: catalogue.species, site, region }).chosen.map((c) => bySlug.get(c.slug) as Species);

describe('yard mix properties', () => {
  it('plants × spacing² never exceeds the bed, on 40 random sites', () => {
    const random = seededRandom(9);
    const regions = [regionFor('WI', '52'), regionFor('GA', '45'), regionFor('MA', '59'), regionFor('MO', '40')];
    for (let i = 0; i < 40; i++) {
      const site = randomSite(random);
      const mix = chosenSpecies(site, regions[i % regions.length]);
      if (mix.length === 0) continue;
      const footprint = totalFootprintSqFt(plantsPerSpecies(mix, site.areaSqFt));
      // Beyond rounding only when the bed cannot hold one plant of each species.
      const oneEach = totalFootprintSqFt(plantsPerSpecies(mix, 0));
      expect(footprint, JSON.stringify(site)).toBeLessThanOrEqual(Math.max(site.areaSqFt, oneEach) + 1e-6);
    }
  });

  it('two distant ecoregions give different mixes for the same ground', () => {
    // Northern Lakes and Forests (50, MN) against the Southern Coastal Plain (75, GA), and the
    // Driftless Area (52, WI) against the Piedmont (45, NC), on every sun and moisture.
    const pairs = [
      [regionFor('MN', '50'), regionFor('GA', '75')],
      [regionFor('WI', '52'), regionFor('NC', '45')],
    ] as const;
    for (const [a, b] of pairs) {
      for (const sun of SUN_LEVELS) {
        for (const moisture of MOISTURE_LEVELS) {
          const site: Site = { sun, moisture, areaSqFt: 250, deerPressure: 'medium', goals: [] };
          const slugs = (r: RegionContext) =>
            chosenSpecies(site, r)
              .map((s) => s.slug)
              .sort();
          expect(slugs(a), `${a.ecoregionCode} vs ${b.ecoregionCode}, ${moisture} ${sun}`).not.toEqual(slugs(b));
        }
      }
    }
  });
});
