import { describe, expect, it } from 'vitest';
import { US_STATE_CODES } from '../types/species.js';
import { byStateListName, stateListName } from './plain-words.js';

// The District of Columbia's own name (US Census, state FIPS 11) starts with "District": in a list
// it sorts under D, between Delaware and Florida.
describe('state names in a list', () => {
  it('shows DC as "District of Columbia" and other states by their names', () => {
    expect(stateListName('DC')).toBe('District of Columbia');
    expect(stateListName('WI')).toBe('Wisconsin');
  });

  it('sorts DC under D, between Delaware and Florida', () => {
    const names = byStateListName(US_STATE_CODES).map(stateListName);
    expect(names.slice(names.indexOf('Delaware'), names.indexOf('Delaware') + 3)).toEqual([
      'Delaware',
      'District of Columbia',
      'Florida',
    ]);
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b, 'en-US')));
    expect(names).toHaveLength(49);
  });
});
