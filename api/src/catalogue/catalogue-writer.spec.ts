import { describe, expect, it } from '@jest/globals';
import { speciesSchema } from '@homeground/shared';
import { loadCatalogue } from '@homeground/species-data';
import { withAddedFacts } from './catalogue-writer.js';

// A curator edit saved before the site-fit facts existed is completed from the catalogue file, and
// the curator's own edits stay. The record is the catalogue's golden alexanders.
describe('withAddedFacts', () => {
  const file = loadCatalogue().species.find((s) => s.slug === 'zizia-aurea')!;
  const {
    ecoregions,
    sunOptimum,
    moistureOptimum,
    wetlandIndicator,
    needsAcidSoil,
    selfSows,
    commercialAvailability,
    protectedIn,
    ...older
  } = file;
  const olderSources = Object.fromEntries(
    Object.entries(file.sources).filter(
      ([k]) =>
        ![
          'ecoregions',
          'sunOptimum',
          'moistureOptimum',
          'wetlandIndicator',
          'commercialAvailability',
          'protectedIn',
        ].includes(k),
    ),
  );

  it('fills the missing facts and their sources from the file, keeping the curator’s edits', () => {
    const edited = { ...older, heightCm: { min: 40, max: 80 }, sources: olderSources };
    const completed = withAddedFacts(edited, file);
    expect(completed).not.toBeNull();
    expect(completed!.heightCm).toEqual({ min: 40, max: 80 });
    expect(completed!.ecoregions).toEqual(ecoregions);
    expect(completed!.sunOptimum).toEqual(sunOptimum);
    expect(completed!.moistureOptimum).toEqual(moistureOptimum);
    expect(completed!.wetlandIndicator).toBe(wetlandIndicator);
    expect(completed!.needsAcidSoil).toBe(needsAcidSoil);
    expect(completed!.selfSows).toBe(selfSows);
    expect(completed!.commercialAvailability).toBe(commercialAvailability);
    expect(completed!.protectedIn).toEqual(protectedIn);
    expect(speciesSchema.safeParse(completed).success).toBe(true);
  });

  it('leaves a record that already has every fact alone', () => {
    expect(withAddedFacts({ ...file }, file)).toBeNull();
  });
});
