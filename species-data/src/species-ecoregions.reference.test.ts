/**
 * Each species' EPA Level III ecoregions checked against two open sources nobody on the project wrote:
 * USDA PLANTS native states (usda_plants_state_distribution.csv, read in place from ../shared/reference)
 * and the EPA Level III regions as cut by the county crosswalk (ecoregions/county-ecoregions.json, built
 * from the EPA polygons and Census county outlines; see ecoregions/SOURCE.md).
 */
import { describe, expect, it } from 'vitest';
import { loadCatalogue } from './catalogue.js';
import { referenceAvailable } from './reference/reference-dir.js';
import { loadUsdaDistribution } from './reference/usda-plants.js';

const available = referenceAvailable(['usda_plants_state_distribution.csv']);

describe.skipIf(!available)('species ecoregions vs USDA native states and the EPA Level III county crosswalk', () => {
  it('puts every species only in regions that share a county with a state where USDA lists it as native', () => {
    const { species, counties } = loadCatalogue();
    const statesOfRegion = new Map<string, Set<string>>();
    for (const c of counties) {
      for (const e of c.ecoregions) {
        if (!statesOfRegion.has(e.code)) statesOfRegion.set(e.code, new Set());
        statesOfRegion.get(e.code)!.add(c.state);
      }
    }
    const distribution = loadUsdaDistribution();
    const bad: string[] = [];
    let checked = 0;
    for (const s of species) {
      if (s.reconciliations.some((r) => r.field === 'ecoregions')) continue;
      const native = new Set<string>(distribution.get(s.usdaSymbol)?.nativeIn ?? []);
      for (const code of s.ecoregions ?? []) {
        checked++;
        const states = statesOfRegion.get(code) ?? new Set();
        if (![...states].some((st) => native.has(st)))
          bad.push(
            `${s.slug}: region ${code} lies in ${[...states].join(', ') || 'no county'}, none a USDA native state`,
          );
      }
    }
    console.log(`species × ecoregion pairs checked against USDA native states: ${checked}`);
    expect(checked).toBeGreaterThan(0);
    expect(bad).toEqual([]);
  });
});
