import { describe, expect, it } from 'vitest';
import { firstName } from './people-words.js';

// Names from the invented demo scenario (shared/DESIGN.md beside the project).
describe('firstName', () => {
  it.each([
    ['Priya Vantongeren', 'Priya'],
    ['  Sol   Marchetti ', 'Sol'],
    ['Juniper', 'Juniper'],
  ])('%s → %s', (name, first) => {
    expect(firstName(name)).toBe(first);
  });
});
