import { describe, expect, it } from 'vitest';
import type { PaletteResult } from '../types/recommendation.js';
import type { Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { F, LARKFIELD, makeSpecies } from '../scoring/__tests__/species-fixtures.js';
import { balancePalette } from './balance-palette.js';

const constraint = (r: PaletteResult, id: string) => r.constraints.find((c) => c.id === id)!;
const slugs = (r: PaletteResult) => r.chosen.map((c) => c.slug).sort();

/** A hand-built candidate set: `early`, `mid`, `late` forbs (by their months), plus `grasses`. */
function candidateSet(early: number, mid: number, late: number, grasses = 0, extra: Partial<Species> = {}): Species[] {
  const make = (prefix: string, months: number[], n: number, growthForm: Species['growthForm'] = 'forb') =>
    Array.from({ length: n }, (_, i) =>
      makeSpecies({
        slug: `${prefix}-${i}`,
        scientificName: `${prefix[0].toUpperCase()}${prefix.slice(1)} sp${i}`,
        bloomMonths: months,
        growthForm,
        ...extra,
      }),
    );
  return [
    // Each flowers through its whole part of the season, so the month-by-month rule can be met.
    ...make('early', [4, 5, 6], early),
    ...make('mid', [6, 7], mid),
    ...make('late', [8, 9, 10], late),
    ...make('grass', [8], grasses, 'graminoid'),
  ];
}

const sunny: Site = { sun: 'full', moisture: 'medium', areaSqFt: 300, deerPressure: 'low', goals: [] };

// CP42: ≥ 3 flowering species per bloom period and ≥ 9 in all (CP42-IN, CHECK-VALUES §3, R).
describe('constraint report: CP42 bloom periods and flowering count', () => {
  it.each([
    ['4 + 4 + 4 forbs, mix of 12', [4, 4, 4], 12, { early: true, mid: true, late: true, flowering: true }],
    ['3 + 3 + 3 forbs, mix of 9', [3, 3, 3], 9, { early: true, mid: true, late: true, flowering: true }],
    [
      '5 + 5 + 1 forbs, mix of 9: only 1 late bloomer exists',
      [5, 5, 1],
      9,
      { early: true, mid: true, late: false, flowering: true },
    ],
    ['2 + 2 + 2 forbs, mix of 6', [2, 2, 2], 6, { early: false, mid: false, late: false, flowering: false }],
  ] as const)('%s', (_what, [e, m, l], size, expected) => {
    const r = balancePalette({ species: candidateSet(e, m, l), site: sunny, region: LARKFIELD, options: { size } });
    const met = {
      early: constraint(r, 'cp42-early').met,
      mid: constraint(r, 'cp42-mid').met,
      late: constraint(r, 'cp42-late').met,
      flowering: constraint(r, 'cp42-flowering').met,
    };
    expect(met).toEqual(expected);
  });

  it('says why in words when a period has too few species: "Only 1 late bloomer … suits dry shade"', () => {
    const shade = candidateSet(4, 4, 1, 0, { sun: ['shade'], moisture: ['dry'] });
    const r = balancePalette({
      species: shade,
      site: { ...sunny, sun: 'shade', moisture: 'dry' },
      region: LARKFIELD,
      options: { size: 9 },
    });
    expect(constraint(r, 'cp42-late').detail).toContain('Only 1 late bloomer native to your region suits dry shade');
    expect(constraint(r, 'cp42-late').detail).toContain('a species from another part of the season may take its place');
  });

  it('explains an unmet 9-species rule in a small mix', () => {
    const r = balancePalette({ species: candidateSet(4, 4, 4), site: sunny, region: LARKFIELD, options: { size: 6 } });
    expect(constraint(r, 'cp42-flowering').detail).toContain(
      'A mix of 6 species cannot hold the 9 kinds of flowers of a full mix',
    );
  });

  it('agrees with the bloom chart: a late part of the season with one species in September is not met', () => {
    // 3 late bloomers in all, but only one of them flowers in September.
    const species = [
      ...candidateSet(3, 3, 0),
      ...['a', 'b'].map((x) => makeSpecies({ slug: `aug-${x}`, scientificName: `Aug sp${x}`, bloomMonths: [8, 10] })),
      makeSpecies({ slug: 'sep-a', scientificName: 'Sep spa', bloomMonths: [8, 9, 10] }),
    ];
    const r = balancePalette({ species, site: sunny, region: LARKFIELD, options: { size: 9 } });
    expect(constraint(r, 'cp42-late').met).toBe(false);
    expect(constraint(r, 'cp42-late').detail).toContain('Sep has 1 in flower');
    expect(constraint(r, 'cp42-late').rule).not.toMatch(/CP42/);
  });

  it('every rule is reported, met or with a reason', () => {
    const r = balancePalette({ species: candidateSet(1, 1, 0), site: sunny, region: LARKFIELD, options: { size: 2 } });
    expect(r.constraints.map((c) => c.id)).toEqual([
      'cp42-early',
      'cp42-mid',
      'cp42-late',
      'cp42-flowering',
      'monarch-milkweed',
      'grass-share',
      'height-spread',
    ]);
    for (const c of r.constraints) expect(c.detail.length).toBeGreaterThan(10);
  });
});

// NRCS E327136Z2: at least one native Asclepias species when monarchs are a goal (E327, R).
describe('constraint report: native milkweed for monarchs', () => {
  const monarchs: Site = { ...sunny, moisture: 'dry', goals: ['monarchs'] };
  const pool = [
    F.butterflyMilkweed,
    F.showyGoldenrod,
    F.wildBergamot,
    F.wildLupine,
    F.littleBluestem,
    F.prairieDropseed,
    ...candidateSet(3, 3, 3, 0, { moisture: ['dry'] }),
  ];

  it('includes an eligible native milkweed', () => {
    const r = balancePalette({ species: pool, site: monarchs, region: LARKFIELD, options: { size: 5 } });
    expect(slugs(r)).toContain('asclepias-tuberosa');
    expect(constraint(r, 'monarch-milkweed')).toMatchObject({ applies: true, met: true });
    expect(r.chosen.find((c) => c.slug === 'asclepias-tuberosa')!.roles).toContain('a native milkweed, for monarchs');
  });

  it('reports the rule unmet, with the reason and the closest near miss, when none is eligible', () => {
    const noMilkweed = [F.swampMilkweed, ...pool.filter((s) => s.slug !== 'asclepias-tuberosa')];
    const r = balancePalette({ species: noMilkweed, site: monarchs, region: LARKFIELD, options: { size: 5 } });
    const c = constraint(r, 'monarch-milkweed');
    expect(c.met).toBe(false);
    expect(c.detail).toBe(
      'No milkweed native to your region suits dry full sun in Wisconsin. The closest is swamp milkweed: Needs medium-moist or wet soil; your soil is dry.',
    );
  });

  it('says the unmet rule and its near miss in Spanish when asked (words from the shared Spanish tables)', () => {
    const noMilkweed = [F.swampMilkweed, ...pool.filter((s) => s.slug !== 'asclepias-tuberosa')];
    const r = balancePalette({
      species: noMilkweed,
      site: monarchs,
      region: LARKFIELD,
      options: { size: 5 },
      locale: 'es',
    });
    expect(constraint(r, 'monarch-milkweed').detail).toBe(
      'Ningún algodoncillo nativo de tu región va bien con pleno sol y suelo seco en Wisconsin. La más cercana es swamp milkweed: Necesita suelo fresco o húmedo; tu suelo es seco.',
    );
    for (const c of r.constraints) expect(c.detail).not.toMatch(/\bThe mix\b|\bsuits?\b/);
  });

  it('does not apply when monarchs are not a goal', () => {
    const r = balancePalette({
      species: pool,
      site: { ...monarchs, goals: [] },
      region: LARKFIELD,
      options: { size: 5 },
    });
    expect(constraint(r, 'monarch-milkweed')).toMatchObject({ applies: false, met: true });
  });
});

describe('balancePalette: determinism, locks, exclusions, size', () => {
  const pool = [...Object.values(F), ...candidateSet(4, 4, 4, 2)];
  const site: Site = {
    sun: 'full',
    moisture: 'medium',
    areaSqFt: 300,
    deerPressure: 'high',
    goals: ['monarchs', 'pollinators'],
  };

  it('same input → identical output, in any input order', () => {
    const a = balancePalette({ species: pool, site, region: LARKFIELD });
    expect(balancePalette({ species: [...pool].reverse(), site, region: LARKFIELD })).toEqual(a);
    expect(a.size).toBe(11); // 300 ft² → 11 species (mix-size.ts)
  });

  it('keeps locked species and never uses excluded ones', () => {
    const free = balancePalette({ species: pool, site, region: LARKFIELD });
    const out = free.chosen.slice(0, 2).map((c) => c.slug);
    const r = balancePalette({
      species: pool,
      site,
      region: LARKFIELD,
      options: { locked: ['grass-0', 'early-3'], excluded: out },
    });
    expect(slugs(r)).toEqual(expect.arrayContaining(['grass-0', 'early-3']));
    for (const x of out) expect(slugs(r)).not.toContain(x);
    expect(
      r.chosen
        .filter((c) => c.locked)
        .map((c) => c.slug)
        .sort(),
    ).toEqual(['early-3', 'grass-0']);
  });

  it('refuses a lock on a species not native to the state, and says so', () => {
    const r = balancePalette({ species: pool, site, region: LARKFIELD, options: { locked: ['echinacea-paradoxa'] } });
    expect(slugs(r)).not.toContain('echinacea-paradoxa');
    expect(r.notices).toContain('yellow coneflower is not native to your state, so it cannot be in the mix.');
  });

  it('shrinks the mix to the species that suit the ground, with a notice', () => {
    const r = balancePalette({
      species: [F.butterflyMilkweed, F.wildBergamot],
      site,
      region: LARKFIELD,
      options: { size: 5 },
    });
    expect(r.size).toBe(2);
    expect(r.notices).toContain('Only 2 species suit your ground, so the mix has 2 instead of 5.');
  });
});
