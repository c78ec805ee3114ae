import { describe, expect, it } from 'vitest';
import { siteShortWords } from './site-words.js';

describe('siteShortWords', () => {
  it.each([
    [['part', 'full'], ['medium', 'dry'], 'full sun/part shade · dry/medium-moist'],
    [['shade'], ['wet'], 'shade · wet'],
    [['full', 'part', 'shade'], ['dry', 'medium', 'wet'], 'full sun/part shade/shade · dry/medium-moist/wet'],
    [[], ['dry'], 'dry'],
  ] as const)('%j %j → %s', (sun, moisture, words) => {
    expect(siteShortWords(sun, moisture)).toBe(words);
  });
});
