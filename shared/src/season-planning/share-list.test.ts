import { describe, expect, it } from 'vitest';
import type { Species } from '../types/species.js';
import { seasonSpecies as sp } from './season-fixtures.js';
import { proposeShareList, type ShareListInput } from './share-list.js';

const METHODS = ['winter-sowing', 'outdoor-pot-winter', 'indoor-lights'] as const;
const base = (species: Species[], o: Partial<ShareListInput> = {}): ShareListInput => ({
  species,
  ecoregionCode: '52',
  state: 'WI',
  methods: [...METHODS],
  milkweedShare: 0,
  count: 6,
  ...o,
});
const slugs = (input: ShareListInput) => proposeShareList(input).proposals.map((p) => p.slug);

const ok = sp({ slug: 'good-forb', scientificName: 'Zizia aurea' });
const milkweed = (slug: string, moisture: 'dry' | 'wet' | 'medium') =>
  sp({
    slug,
    scientificName: `Asclepias ${slug.split('-')[1]}`,
    moistureOptimum: [moisture],
    moisture: [moisture],
    wildlife: { monarchHost: true, lepidopteraGenusCount: 12 },
  });

describe('proposeShareList: who may be proposed', () => {
  it.each([
    ["outside the group's ecoregion", sp({ slug: 'elsewhere', scientificName: 'Zizia elsewhere', ecoregions: ['47'] })],
    [
      'in the ecoregion but not native to the state (ecoregions cross state lines)',
      sp({ slug: 'next-door', scientificName: 'Zizia proxima', nativeStates: ['MN'] }),
    ],
    ["protected in the group's state", sp({ slug: 'listed-here', scientificName: 'Zizia rara', protectedIn: ['WI'] })],
    [
      'carrying a protected caution (a rarity)',
      sp({
        slug: 'rarity',
        scientificName: 'Zizia rarior',
        cautions: [{ kind: 'protected', text: 'Listed as threatened in several states.', source: 'from-memory' }],
      }),
    ],
    [
      "not raised by any of the group's methods",
      sp({ slug: 'direct-only', scientificName: 'Zizia directa', germination: { methods: ['direct-seed'] } }),
    ],
    ['a fern (spores, not seed)', sp({ slug: 'a-fern', scientificName: 'Adiantum testum', growthForm: 'fern' })],
  ])('never: a species %s', (_why, s) => {
    expect(slugs(base([ok, s]))).toEqual(['good-forb']);
  });

  it('prefers herbaceous perennials: a shrub and an annual come only when the perennials run out', () => {
    const shrub = sp({
      slug: 'a-shrub',
      scientificName: 'Cornus testa',
      growthForm: 'shrub',
      wildlife: { lepidopteraGenusCount: 100 },
    });
    const annual = sp({ slug: 'an-annual', scientificName: 'Chamaecrista testa', lifespan: 'annual' });
    const forbs = ['a', 'b', 'c'].map((x) => sp({ slug: `forb-${x}`, scientificName: `Genus${x} forb` }));
    expect(slugs(base([shrub, annual, ...forbs], { count: 3 })).sort()).toEqual(['forb-a', 'forb-b', 'forb-c']);
    expect(
      slugs(base([shrub, annual, ...forbs], { count: 5 }))
        .slice(3)
        .sort(),
    ).toEqual(['a-shrub', 'an-annual']);
  });
});

describe('proposeShareList: balance', () => {
  it.each([
    // [milkweed share, count, total plants, milkweed plants expected]
    [0.5, 6, 120, 60],
    [0.25, 8, 400, 100],
    [0, 6, 120, 0],
  ])('milkweed share %d of %d species and %d plants → %d milkweed plants', (share, count, total, expected) => {
    const pool = [
      milkweed('asclepias-tuberosa', 'dry'),
      milkweed('asclepias-incarnata', 'wet'),
      milkweed('asclepias-syriaca', 'medium'),
      ...['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h'].map((x) =>
        sp({ slug: `forb-${x}`, scientificName: `Genus${x} forb` }),
      ),
    ];
    const list = proposeShareList(base(pool, { milkweedShare: share, count, totalPlants: total }));
    expect(list.proposals).toHaveLength(count);
    expect(list.proposals.reduce((a, p) => a + p.suggestedPlants, 0)).toBe(total);
    expect(list.proposals.filter((p) => p.isMilkweed).reduce((a, p) => a + p.suggestedPlants, 0)).toBe(expected);
  });

  it('gives the shade, wet and early slots to the species that fill them, over more of the same', () => {
    const sunnyLate = ['a', 'b', 'c', 'd'].map((x) =>
      sp({
        slug: `sunny-${x}`,
        scientificName: `Sunny${x} late`,
        sunOptimum: ['full'],
        moistureOptimum: ['dry'],
        bloomMonths: [8, 9],
        germination: { germinationRatePct: 80 },
      }),
    );
    const shadeEarly = sp({
      slug: 'shade-early',
      scientificName: 'Umbra vernalis',
      sun: ['part', 'shade'],
      sunOptimum: ['shade'],
      moistureOptimum: ['medium'],
      bloomMonths: [4, 5],
    });
    const wet = sp({
      slug: 'wet-one',
      scientificName: 'Palus mid',
      moisture: ['wet'],
      moistureOptimum: ['wet'],
      bloomMonths: [7],
    });
    const list = proposeShareList(base([...sunnyLate, shadeEarly, wet], { count: 3 }));
    expect(list.proposals.map((p) => p.slug).sort()).toEqual(['shade-early', 'sunny-a', 'wet-one']);
    expect(list.notes).toEqual([]);
  });

  it('says in words what it could not balance', () => {
    const list = proposeShareList(base([ok], { count: 3 }));
    expect(list.notes).toEqual(
      expect.arrayContaining([
        expect.stringMatching(/^Only 1 species native here/),
        'Nothing on the list flowers in the late period.',
        'Nothing on the list is at its best in shade: takers with shady yards will find little.',
      ]),
    );
  });

  it('is the same every time for the same input (no randomness)', () => {
    const pool = ['a', 'b', 'c', 'd', 'e'].map((x) => sp({ slug: `forb-${x}`, scientificName: `Genus${x} forb` }));
    expect(slugs(base(pool, { count: 3 }))).toEqual(slugs(base([...pool].reverse(), { count: 3 })));
  });
});

describe('proposeShareList: why, in words', () => {
  it('says why in plain sentences, never a score', () => {
    const goldenrod = sp({
      slug: 'solidago-speciosa',
      scientificName: 'Solidago speciosa',
      bloomMonths: [8, 9, 10],
      commercialAvailability: 'none-known',
      germination: { treatments: [{ kind: 'cold-moist', days: 60 }], germinationRatePct: 40 },
      wildlife: { lepidopteraGenusCount: 115 },
    });
    const others = ['a', 'b', 'c'].map((x) =>
      sp({ slug: `forb-${x}`, scientificName: `Genus${x} forb`, wildlife: { lepidopteraGenusCount: 4 } }),
    );
    const p = proposeShareList(base([goldenrod, ...others], { count: 4 })).proposals.find(
      (x) => x.slug === 'solidago-speciosa',
    )!;
    expect(p.why).toEqual(
      expect.arrayContaining([
        'Easy from seed: needs 60 days of cold-moist stratification, which a winter outdoors gives it (winter sowing in covered containers or outdoor pots over winter), and about 40 % of good seed comes up, so sow extra.',
        'One of the best caterpillar plants among wildflowers and grasses here: its genus hosts 115 moth and butterfly species.',
        'Blooms Aug–Oct (late).',
        "Seed is seldom sold: plan to collect it locally, with the landowner's permission.",
      ]),
    );
    expect(p.why.join(' ')).not.toMatch(/score|points|rank/i);
  });

  it('names the extra step for seed that must be scarified', () => {
    const lupine = sp({
      slug: 'lupinus-perennis',
      scientificName: 'Lupinus perennis',
      germination: { treatments: [{ kind: 'scarification' }, { kind: 'inoculant' }], germinationRatePct: 70 },
    });
    expect(proposeShareList(base([lupine], { count: 1 })).proposals[0].why[0]).toBe(
      'Takes one extra step: nick or soak the seed coat before sowing, and most good seed comes up (about 70 %).',
    );
  });
});
