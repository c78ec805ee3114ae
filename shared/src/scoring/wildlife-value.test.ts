import { describe, expect, it } from 'vitest';
import { F, makeSpecies } from './__tests__/species-fixtures.js';
import { layerOf } from './layers.js';
import {
  caterpillarWords,
  compareWildlifeValue,
  hostLevelOf,
  hostValueOnHerbaceousScale,
  wildlifeSummary,
} from './wildlife-value.js';

// Genus counts: Tallamy's herbaceous (h) and woody (w) lists, CHECK-VALUES §2 (R).
const cherry = makeSpecies({
  slug: 'prunus-virginiana',
  scientificName: 'Prunus virginiana',
  growthForm: 'shrub',
  wildlife: { lepidopteraGenusCount: 456 },
});
const oak = makeSpecies({
  slug: 'quercus-alba',
  scientificName: 'Quercus alba',
  growthForm: 'tree',
  wildlife: { lepidopteraGenusCount: 534 },
});
const morningGlory = makeSpecies({
  slug: 'ipomoea-pandurata',
  scientificName: 'Ipomoea pandurata',
  growthForm: 'vine',
  wildlife: { lepidopteraGenusCount: 39 },
});

describe('caterpillar host value within its layer (input → level, words)', () => {
  it.each([
    ['Solidago 115 (h, top of the herbaceous list)', F.showyGoldenrod, 'herbaceous', 'top'],
    ['Prunus 456 (w)', cherry, 'woody', 'top'],
    ['Quercus 534 (w, top of the woody list)', oak, 'woody', 'top'],
    ['Ipomoea 39: a vine, but on the herbaceous list (h)', morningGlory, 'herbaceous', 'good'],
    ['Asclepias 12 (h)', F.butterflyMilkweed, 'herbaceous', 'some'],
  ] as const)('%s', (_what, species, layer, level) => {
    expect(layerOf(species)).toBe(layer);
    expect(hostLevelOf(species)).toBe(level);
  });

  it('a cherry weighs like a goldenrod in the mix, not four goldenrods (456 × 115 ÷ 534 = 98.2)', () => {
    expect(hostValueOnHerbaceousScale(cherry)).toBeCloseTo(98.2, 1);
    expect(hostValueOnHerbaceousScale(F.showyGoldenrod)).toBe(115);
  });

  it('words, never a count', () => {
    expect(caterpillarWords(F.showyGoldenrod)).toBe(
      'Among the best caterpillar host plants of the wildflowers, grasses and ferns.',
    );
    expect(caterpillarWords(cherry)).toBe('Among the best caterpillar host plants of the shrubs and trees.');
    const summary = wildlifeSummary(F.butterflyMilkweed);
    expect(summary.monarchs).toBe('Monarch caterpillars feed on it.');
    expect(JSON.stringify(summary)).not.toMatch(/\d/);
  });
});

describe('wildlife value order for lists: part by part, never one number', () => {
  // Host levels from the genus counts above (CHECK-VALUES §2, R); specialist-bee genera from memory.
  const byValue = (list: Parameters<typeof compareWildlifeValue>[0][]) =>
    [...list].sort((a, b) => compareWildlifeValue(b, a) || a.slug.localeCompare(b.slug)).map((s) => s.slug);

  it('compares caterpillar value within each layer: an oak and a goldenrod are both at the top', () => {
    expect(hostLevelOf(oak)).toBe(hostLevelOf(F.showyGoldenrod));
    // Then bees decide: goldenrods host specialist bees (from memory), oaks are wind-pollinated.
    expect(byValue([oak, F.showyGoldenrod])).toEqual([F.showyGoldenrod.slug, oak.slug]);
  });

  it('a cherry (Prunus 456, woody) does not outrank a goldenrod (Solidago 115, herbaceous)', () => {
    expect(compareWildlifeValue(cherry, F.showyGoldenrod)).toBeLessThanOrEqual(0);
  });

  it('monarch host breaks a tie the caterpillar and bee parts leave', () => {
    const plain = {
      ...F.butterflyMilkweed,
      slug: 'a-plain',
      wildlife: { ...F.butterflyMilkweed.wildlife, monarchHost: false },
    };
    expect(byValue([plain, F.butterflyMilkweed])).toEqual([F.butterflyMilkweed.slug, plain.slug]);
  });
});
