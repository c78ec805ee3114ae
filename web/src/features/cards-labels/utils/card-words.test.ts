import { describe, expect, it } from 'vitest';
import { bloomWords, moisturePhrase, sunPhrase } from '@homeground/shared';
import { createI18n } from '../../../lib/i18n/index.js';
import { hostWords, sowDateWords, todayIso } from './card-words.js';

const t = createI18n('en').getFixedT('en', 'cards');

// Host counts are per genus from Tallamy & Shropshire 2009 (the records' tallamy-shropshire-2009
// key): Asclepias 12; a fern genus 0; a genus missing from the table is null.
describe('card words', () => {
  it.each([
    ['Asclepias', 12, 'Asclepias hosts the caterpillars of 12 moth and butterfly species (Tallamy & Shropshire 2009).'],
    ['Adiantum', 0, 'No moth or butterfly caterpillars are recorded on Adiantum (Tallamy & Shropshire 2009).'],
    ['Zizia', null, 'Zizia is not in the caterpillar host counts (Tallamy & Shropshire 2009).'],
  ])('%s with %s hosts', (genus, count, expected) => {
    expect(hostWords(genus, count, t)).toBe(expected);
  });

  it('names light and soil in the order a grower reads them', () => {
    expect(sunPhrase(['shade', 'full'])).toBe('Full sun or shade');
    expect(moisturePhrase(['wet', 'medium'])).toBe('Medium-moist or wet soil');
    expect(bloomWords([6, 7, 8])).toBe('Blooms Jun–Aug');
    expect(bloomWords([])).toBe('No bloom months recorded');
  });

  it('prints a sow date in words, or a line to write on when there is none', () => {
    expect(sowDateWords('2026-03-02')).toBe('Mar 2, 2026');
    expect(sowDateWords('')).toBe('____________');
    expect(todayIso(new Date(2026, 2, 2, 23, 30))).toBe('2026-03-02');
  });
});
