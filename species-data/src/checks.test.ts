import { describe, expect, it } from 'vitest';
import type { Species } from '@homeground/shared';
import { loadCatalogue } from './catalogue.js';
import { checkComposition, slugFromName } from './checks.js';

const base = loadCatalogue().species[0];
const make = (n: number, form: Species['growthForm'], genus = 'Zizia'): Species[] =>
  Array.from({ length: n }, (_, i) => ({
    ...base,
    growthForm: form,
    slug: `${genus.toLowerCase()}-x${i}-${form}`,
    scientificName: `${genus} x${i}`,
  }));

describe('catalogue composition rules', () => {
  it('accepts 300 species with most forbs, 15 % graminoids, 10 milkweeds and some woody plants', () => {
    const list = [
      ...make(190, 'forb'),
      ...make(10, 'forb', 'Asclepias'),
      ...make(60, 'graminoid'),
      ...make(40, 'shrub'),
    ];
    expect(checkComposition(list)).toEqual([]);
  });

  it('names each rule a catalogue breaks', () => {
    const list = [...make(120, 'forb'), ...make(10, 'graminoid'), ...make(130, 'shrub')];
    const problems = checkComposition(list).join('\n');
    expect(problems).toMatch(/at least 300/);
    expect(problems).toMatch(/forbs are 120 of 260/);
    expect(problems).toMatch(/grasses and sedges are 10/);
    expect(problems).toMatch(/0 Asclepias/);
  });

  it('derives slugs from scientific names, varieties included', () => {
    expect(slugFromName('Asclepias tuberosa')).toBe('asclepias-tuberosa');
    expect(slugFromName('Hepatica nobilis var. obtusa')).toBe('hepatica-nobilis-var-obtusa');
  });
});
