import { describe, expect, it } from 'vitest';
import { F } from '../scoring/__tests__/species-fixtures.js';
import {
  emptySpeciesFormValues,
  formFieldForApiPath,
  monthsFromText,
  speciesFormSchema,
  speciesToFormValues,
  sourceFieldOf,
} from './species-form.js';

describe('species editor form', () => {
  const base = F.butterflyMilkweed;

  it('gives back the same record it was filled from', () => {
    const parsed = speciesFormSchema.safeParse(speciesToFormValues(base));
    expect(parsed.success).toBe(true);
    expect(parsed.data).toEqual(base);
  });

  it('names the form field of each problem, sources per fact', () => {
    const values = {
      ...speciesToFormValues(base),
      heightMinCm: '90',
      heightMaxCm: '30',
      [sourceFieldOf('heightCm')]: '',
    };
    const parsed = speciesFormSchema.safeParse(values);
    expect(parsed.success).toBe(false);
    const fields = parsed.error!.issues.map((i) => i.path[0]);
    expect(fields).toContain('heightMaxCm');
    expect(fields).toContain('source:heightCm');
  });

  it('refuses a blank form field by field, with nothing parsed', () => {
    const parsed = speciesFormSchema.safeParse(emptySpeciesFormValues());
    expect(parsed.success).toBe(false);
    const fields = new Set(parsed.error!.issues.map((i) => i.path[0]));
    for (const f of ['slug', 'scientificName', 'usdaSymbol', 'source:family']) expect(fields.has(f)).toBe(true);
  });

  it('refuses keys the form does not have', () => {
    expect(speciesFormSchema.safeParse({ ...speciesToFormValues(base), extra: 'x' }).success).toBe(false);
  });

  it.each([
    ['6;7;8', [6, 7, 8]],
    ['6; 13; x; 9', [6, 9]],
    ['', []],
  ])('reads bloom months "%s" for the preview', (text, months) => {
    expect(monthsFromText(text)).toEqual(months);
  });

  it.each([
    ['heightCm.min', 'heightMinCm'],
    ['sources.heightCm', 'source:heightCm'],
    ['germination.seedsPerPound', 'seedsPerPound'],
    ['commonNames.3', 'commonNames'],
    ['sources.nothing', null],
    ['colour', null],
  ])('puts an API refusal of "%s" beside the form field %s', (path, field) => {
    expect(formFieldForApiPath(path)).toBe(field);
  });
});
