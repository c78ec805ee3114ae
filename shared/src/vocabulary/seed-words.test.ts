import { describe, expect, it } from 'vitest';
import {
  sowingMethodsPhrase,
  treatmentBrief,
  treatmentHow,
  treatmentShortWords,
  treatmentTitle,
  weeksWords,
} from './seed-words.js';

// Butterfly milkweed: cold-moist 30 days (species-data/species/asclepias-tuberosa.json). CMS and
// WMS are the trade's short forms for cold-moist and warm-moist stratification (from-memory).
describe('seed treatment words', () => {
  it.each([
    [{ kind: 'cold-moist' as const, days: 30 }, 'Cold-moist stratification, 30 days', 'CMS 30 d'],
    [{ kind: 'warm-moist' as const, days: 90 }, 'Warm-moist stratification, 90 days', 'WMS 90 d'],
    [{ kind: 'cold-moist' as const }, 'Cold-moist stratification, 60 days', 'CMS 60 d'],
    [{ kind: 'scarification' as const }, 'Scarification', 'scarify'],
    [{ kind: 'none' as const }, 'No pre-treatment needed', 'no treatment'],
  ])('%j is titled "%s" and labelled "%s"', (step, title, short) => {
    expect(treatmentTitle(step)).toBe(title);
    expect(treatmentShortWords(step)).toBe(short);
  });

  it('gives a card one sentence and a page the household way, both with the days', () => {
    expect(treatmentBrief({ kind: 'cold-moist', days: 30 })).toBe(
      'Cold-moist stratification, 30 days: mix the seed with damp sand in a sealed bag in the refrigerator.',
    );
    expect(treatmentHow({ kind: 'cold-moist', days: 30 })).toMatch(
      /refrigerator, not the freezer, for 30 days \(about 4 weeks\)/,
    );
    expect(treatmentHow({ kind: 'warm-moist', days: 90 })).toMatch(
      /room temperature for 90 days \(about 13 weeks\) before the next step\.$/,
    );
    expect(treatmentBrief({ kind: 'hot-water' })).toMatch(/soak overnight/);
  });

  it.each([
    [5, 'about a week'],
    [7, 'about a week'],
    [30, 'about 4 weeks'],
    [60, 'about 9 weeks'],
  ])('%i days is %s', (days, words) => expect(weeksWords(days)).toBe(words));

  it('names sowing methods inside a sentence', () => {
    expect(sowingMethodsPhrase(['winter-sowing', 'indoor-lights', 'direct-seed'])).toBe(
      'winter sowing in covered containers, sowing indoors under lights or direct seeding',
    );
  });
});
