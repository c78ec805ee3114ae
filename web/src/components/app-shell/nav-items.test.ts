import { describe, expect, it } from 'vitest';
import { common } from '../../locales/en/common.js';
import { juniperGrower, maraOrganiser, priyaMember } from '../../testing/fixtures.js';
import { visibleNavItems } from './nav-items.js';

// Expected entries and audiences: the product design guide (shared/DESIGN.md beside the project) "Layout" (Season for organisers,
// My batches for growers, the rest for everyone).
const labels = (user: Parameters<typeof visibleNavItems>[0]) =>
  visibleNavItems(user).map((i) => common.nav[i.labelKey]);

describe('visibleNavItems', () => {
  it('shows the everyone entries when signed out', () => {
    expect(labels(null)).toEqual(['Find plants', 'Species', 'Cards & labels', 'Plant share']);
  });

  it('adds Season for an organiser and My batches for a grower', () => {
    expect(labels(maraOrganiser)).toContain('Season');
    expect(labels(maraOrganiser)).not.toContain('My batches');
    expect(labels(juniperGrower)).toContain('My batches');
    expect(labels(juniperGrower)).not.toContain('Season');
  });

  it('gives a member without a group the everyone entries only', () => {
    expect(labels(priyaMember)).toEqual(labels(null));
  });
});
