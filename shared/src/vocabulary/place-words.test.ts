import { describe, expect, it } from 'vitest';
import { ecoregionFoundWords } from './place-words.js';

// Lycoming County, Pennsylvania: the county crosswalk puts 55.6% of it in EPA Level III 62 North
// Central Appalachians; the point of Williamsport lies inside EPA's outline of 67 Ridge and Valley.
const brief = { description: '', level1: '', level2: '' };

describe('ecoregionFoundWords', () => {
  it.each([
    [
      { code: '62', name: 'North Central Appalachians', share: 0.556, method: 'county-crosswalk' as const },
      null,
      'By county: your county is mostly in North Central Appalachians (about 56%). Near an edge your ground may be in another one; choose it below if you know.',
    ],
    [
      { code: '52', name: 'Driftless Area', share: 1, method: 'county-crosswalk' as const },
      null,
      'By county: all of your county is in Driftless Area.',
    ],
    [
      { code: '67', name: 'Ridge and Valley', share: 0.444, method: 'boundary' as const },
      null,
      "By boundary: your point lies inside the EPA's outline of Ridge and Valley.",
    ],
    [
      { code: '67', name: 'Ridge and Valley', share: 0.444, method: 'boundary' as const },
      { code: '17702', city: 'Williamsport', state: 'PA' },
      "By boundary: the centre of your ZIP code lies inside the EPA's outline of Ridge and Valley.",
    ],
  ])('says how %o was found', (ecoregion, zip, words) => {
    expect(ecoregionFoundWords({ ecoregion: { ...brief, ...ecoregion }, zip })).toBe(words);
  });
});
