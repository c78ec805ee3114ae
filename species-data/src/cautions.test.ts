/**
 * Cautions and spread habits a grower needs, from a botanist's knowledge (from memory): the plants named
 * here are known for the hazard or habit checked.
 */
import { describe, expect, it } from 'vitest';
import { loadCatalogue } from './catalogue.js';

const { species } = loadCatalogue();
const bySlug = (slug: string) => {
  const s = species.find((x) => x.slug === slug);
  if (!s) throw new Error(`${slug} is not in the catalogue`);
  return s;
};

describe('cautions and spread habits (from memory)', () => {
  it.each([
    ['jeffersonia-diphylla', 'toxic-if-eaten'],
    ['ptelea-trifoliata', 'skin-irritant'],
    ['ribes-americanum', 'regulated'],
    ['amorpha-fruticosa', 'toxic-if-eaten'],
    ['aronia-melanocarpa', 'toxic-if-eaten'],
    ['chamaecrista-fasciculata', 'livestock'],
  ])('%s carries a %s caution', (slug, kind) => {
    expect(bySlug(slug).cautions.map((c) => c.kind)).toContain(kind);
  });

  it.each([
    'matteuccia-struthiopteris',
    'thelypteris-noveboracensis',
    'monarda-fistulosa',
    'helianthus-divaricatus',
    'helianthus-strumosus',
    'helianthus-giganteus',
    'clematis-virginiana',
  ])('%s is recorded as a spreader', (slug) => {
    expect(bySlug(slug).spreadHabit).not.toBe('clumping');
  });

  it('evening primrose is recorded as a heavy self-sower with a caution saying so', () => {
    const primrose = bySlug('oenothera-biennis');
    expect(primrose.selfSows).toBe(true);
    expect(primrose.cautions.some((c) => c.kind === 'aggressive-spreader')).toBe(true);
  });

  it('an aggressive spreader always says so in a caution', () => {
    const silent = species.filter(
      (s) => s.spreadHabit === 'aggressive' && !s.cautions.some((c) => c.kind === 'aggressive-spreader'),
    );
    expect(silent.map((s) => s.slug)).toEqual([]);
  });
});
