import { describe, expect, it } from 'vitest';
import type { Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { F, LARKFIELD, makeSpecies } from '../scoring/__tests__/species-fixtures.js';
import { alternativesFor } from './alternatives.js';
import { balancePalette } from './balance-palette.js';

// Mead's milkweed as in its catalogue record (species-data/species/asclepias-meadii.json): federally
// listed as threatened (the record's `protected` caution, from-memory); dry to medium soil, full sun.
const meadsMilkweed = (protectedCaution: boolean): Species =>
  makeSpecies({
    slug: 'asclepias-meadii',
    scientificName: 'Asclepias meadii',
    family: 'Apocynaceae',
    commonNames: ["Mead's milkweed"],
    nativeStates: ['IL', 'IN', 'IA', 'KS', 'MO', 'WI'],
    sun: ['full'],
    moisture: ['medium', 'dry'],
    heightCm: { min: 20, max: 40 },
    spreadCm: { min: 15, max: 30 },
    bloomMonths: [5, 6],
    flowerColours: ['green', 'cream'],
    habitats: ['prairie', 'glade'],
    wildlife: { lepidopteraGenusCount: 12, monarchHost: true },
    cautions: protectedCaution
      ? [
          {
            kind: 'protected',
            text: 'Federally listed as threatened. Buy from a nursery that propagates it; never dig from the wild.',
            source: 'from-memory',
          },
        ]
      : [],
  });

const site: Site = { sun: 'full', moisture: 'medium', areaSqFt: 120, deerPressure: 'low', goals: ['monarchs'] };
const others = [
  F.wildBergamot,
  F.goldenAlexanders,
  F.showyGoldenrod,
  F.littleBluestem,
  F.prairieDropseed,
  F.newEnglandAster,
];
const mix = (species: Species[], options = {}) =>
  balancePalette({ species, site, region: LARKFIELD, options: { size: 5, ...options } });

describe('protected species (caution kind "protected") are never chosen for a mix automatically', () => {
  it('the same plant without the caution is chosen (the only milkweed, on a monarch site)', () => {
    expect(mix([meadsMilkweed(false), ...others]).chosen.map((c) => c.slug)).toContain('asclepias-meadii');
  });

  it('with the caution it is left out, and a notice says why and how to grow it', () => {
    const r = mix([meadsMilkweed(true), ...others]);
    expect(r.chosen.map((c) => c.slug)).not.toContain('asclepias-meadii');
    expect(r.chosen).toHaveLength(5);
    expect(r.constraints.find((c) => c.id === 'monarch-milkweed')).toMatchObject({
      met: false,
      detail:
        "Mead's milkweed suits your ground but is protected in the wild, so not chosen for you; keep one in the mix to meet this rule, bought from a nursery that propagates it.",
    });
    expect(r.notices).toContain(
      "Mead's milkweed suits your ground but is protected in the wild, so Homeground does not choose it for you. " +
        'To grow it, keep it in the mix and buy from a nursery that propagates it; never dig from the wild.',
    );
  });

  it('a user may keep it: then it is in the mix, with the buy-from-a-nursery notice', () => {
    const r = mix([meadsMilkweed(true), ...others], { locked: ['asclepias-meadii'] });
    expect(r.chosen.find((c) => c.slug === 'asclepias-meadii')).toMatchObject({ locked: true });
    expect(r.notices).toContain(
      "You kept Mead's milkweed, which is protected in the wild: buy it from a nursery that propagates it, and never dig it from the wild.",
    );
    expect(r.notices.some((n) => n.includes('does not choose'))).toBe(false);
    expect(r.constraints.find((c) => c.id === 'monarch-milkweed')?.met).toBe(true);
  });

  it('is never offered as a replacement either', () => {
    const input = { species: [meadsMilkweed(true), ...others], site, region: LARKFIELD, options: { size: 5 } };
    const chosen = balancePalette(input).chosen.map((c) => c.slug);
    for (const slot of chosen)
      expect(alternativesFor(input, chosen, slot, 10).map((a) => a.slug)).not.toContain('asclepias-meadii');
  });
});

describe('protected-species notices in the reader language', () => {
  it('says the withheld notice and the rule detail in Spanish when asked', () => {
    const r = balancePalette({
      species: [meadsMilkweed(true), ...others],
      site,
      region: LARKFIELD,
      options: { size: 5 },
      locale: 'es',
    });
    expect(r.constraints.find((c) => c.id === 'monarch-milkweed')?.detail).toBe(
      "Mead's milkweed va bien con tu terreno, pero está protegida en la naturaleza, así que no la elegimos por ti; guárdala en la mezcla para cumplir esta regla, comprada en un vivero que la propague.",
    );
    expect(r.notices).toContain(
      "Mead's milkweed va bien con tu terreno, pero está protegida en la naturaleza, así que Homeground no la elige por ti. Para cultivarla, guárdala en la mezcla y cómprala en un vivero que la propague; nunca la saques del campo.",
    );
  });
});
