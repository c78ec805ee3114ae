import { describe, expect, it } from 'vitest';
import type { Site } from '../types/site.js';
import { F, LARKFIELD, ALL_FIXTURES } from './__tests__/species-fixtures.js';
import { recommend, scoreSpecies } from './score-species.js';

const sunnyDry: Site = { sun: 'full', moisture: 'dry', areaSqFt: 200, deerPressure: 'high', goals: ['monarchs'] };

const partOf = (r: ReturnType<typeof scoreSpecies>, name: string) => r.parts.find((p) => p.name === name);

describe('scoreSpecies: eligibility (native to the state, right sun and moisture, under the height limit)', () => {
  it.each([
    ['butterfly milkweed on dry full sun', F.butterflyMilkweed, sunnyDry, true, false],
    [
      'native to Illinois only, for Wisconsin: near miss',
      F.eastsideBluestar,
      { ...sunnyDry, moisture: 'medium' },
      false,
      true,
    ],
    ['native to Arkansas–Texas only: not a near miss', F.yellowConeflower, sunnyDry, false, false],
    ['shade plant in part shade… on full sun: one step', F.blueWoodAster, { ...sunnyDry, sun: 'full' }, false, true],
    ['wild lupine (dry) in wet soil: two steps', F.wildLupine, { ...sunnyDry, moisture: 'wet' }, false, false],
    [
      'two one-step misses at once: not suggested',
      F.columbine,
      { ...sunnyDry, sun: 'full', moisture: 'wet' },
      false,
      false,
    ],
  ] as const)('%s', (_what, species, site, eligible, nearMiss) => {
    const r = scoreSpecies(species, site as Site, LARKFIELD);
    expect(r.eligible).toBe(eligible);
    expect(r.nearMiss).toBe(nearMiss);
    if (!eligible) expect(r.ineligibleReason).toMatch(/\w/);
  });

  it('names the neighbouring state in the near-miss reason', () => {
    const r = scoreSpecies(F.eastsideBluestar, { ...sunnyDry, moisture: 'medium' }, LARKFIELD);
    expect(r.ineligibleReason).toBe('Native next door in Illinois, but not recorded as native in Wisconsin.');
  });

  it.each([
    ['golden alexanders 30–75 cm under 75 cm: fits, +1', F.goldenAlexanders, 75, true, false, 1],
    ['wild bergamot 60–120 cm under 75 cm: partly over, −1', F.wildBergamot, 75, true, false, -1],
    ['showy goldenrod 60–150 cm under 50 cm: within 25 %, near miss', F.showyGoldenrod, 50, false, true, undefined],
    ['New England aster 90–180 cm under 50 cm: out', F.newEnglandAster, 50, false, false, undefined],
  ])('height: %s', (_what, species, maxHeightCm, eligible, nearMiss, points) => {
    const r = scoreSpecies(species, { ...sunnyDry, moisture: 'medium', maxHeightCm }, LARKFIELD);
    expect([r.eligible, r.nearMiss, partOf(r, 'height')?.points]).toEqual([eligible, nearMiss, points]);
  });
});

describe('scoreSpecies: room for the plant (footprint = circle as wide as the narrow end of its spread)', () => {
  const oak = {
    ...F.butterflyMilkweed,
    slug: 'big-tree',
    growthForm: 'tree' as const,
    spreadCm: { min: 1000, max: 1500 },
  };
  it.each([
    // π × (10 m ÷ 2)² = 78.5 m² = 845 ft²; woody plants asked for get 25 % of a bed up to 500 ft², 35 % above (layers.ts)
    ['845 ft² tree in 300 ft²: out, not a near miss', 300, true, false, false, undefined],
    ['845 ft² tree in 500 ft²: out, a near miss', 500, true, false, true, undefined],
    [
      '845 ft² tree in 2,000 ft²: over the woody share (700 ft²), a near miss that would shade the bed',
      2000,
      true,
      false,
      true,
      -2,
    ],
    ['845 ft² tree in 5,000 ft²: room enough in the woody share (1,750 ft²)', 5000, true, true, false, undefined],
    ['845 ft² tree in 5,000 ft², woody plants not asked for: out', 5000, false, false, false, undefined],
  ])('%s', (_what, areaSqFt, woodyPlants, eligible, nearMiss, points) => {
    const r = scoreSpecies(oak, { ...sunnyDry, areaSqFt, woodyPlants }, LARKFIELD);
    expect([r.eligible, r.nearMiss, partOf(r, 'room')?.points]).toEqual([eligible, nearMiss, points]);
  });

  it('says so with both units', () => {
    expect(scoreSpecies(oak, { ...sunnyDry, areaSqFt: 300, woodyPlants: true }, LARKFIELD).ineligibleReason).toBe(
      'Too big: it grows about 33 ft (10 m) across, more than your 300 ft² (27.9 m²) bed can hold.',
    );
  });
});

describe('scoreSpecies: why it fits, in words', () => {
  const r = scoreSpecies(F.butterflyMilkweed, sunnyDry, LARKFIELD);

  it.each([
    ['native', 0, 'Native to Wisconsin.'],
    ['sun', 1, 'Grows in full sun or part shade; your ground has full sun.'],
    ['moisture', 1, 'Takes dry or medium-moist soil; your soil is dry.'],
    // Graded fit: full sun and dry soil are in its range (no optimum recorded: the whole range),
    // and its range stops short of wet soil and of shade: 2 + 2 + 1.5 + 1.5
    ['thrives', 7, 'Thrives in dry soil and full sun, as on your ground.'],
    ['habitat', 2, 'Belongs to the prairie and savanna plant communities of your ecoregion.'],
    // Asclepias: 12 Lepidoptera species (TAL-H, CHECK-VALUES §2, R), about a tenth of the
    // herbaceous list's top genus (Solidago 115): "some" host value, in words, no count
    ['host-plant', 0.75, 'Hosts the caterpillars of a few moths and butterflies.'],
    ['monarch-host', 4, 'Feeds monarch caterpillars, which eat only milkweeds and a few close relatives.'],
    ['deer', 2, 'Deer usually leave it alone.'],
  ])('%s: %d points, "%s"', (name, points, reason) => {
    expect(partOf(r, name)).toEqual({ name, points, reason });
  });

  it('score is the sum of the parts', () => {
    expect(r.score).toBeCloseTo(
      r.parts.reduce((s, p) => s + p.points, 0),
      5,
    );
  });

  it('goldenrod: among the best herbaceous host plants (Solidago 115, the top of TAL-H, R), said without a count', () => {
    const g = scoreSpecies(F.showyGoldenrod, sunnyDry, LARKFIELD);
    expect(partOf(g, 'host-plant')).toEqual({
      name: 'host-plant',
      points: 3,
      reason: 'Among the best caterpillar host plants of the wildflowers, grasses and ferns.',
    });
  });

  it('bloom gap: a late bloomer scores when the mix has no late flowers', () => {
    const mix = [F.butterflyMilkweed, F.wildLupine, F.goldenAlexanders];
    const g = scoreSpecies(F.showyGoldenrod, sunnyDry, LARKFIELD, { currentMix: mix });
    expect(partOf(g, 'bloom-gap')).toEqual({
      name: 'bloom-gap',
      points: 2,
      reason: 'Blooms Aug–Oct, when your mix has least.',
    });
  });

  it('goal parts: low spreaders, rain garden, shade garden', () => {
    const site: Site = {
      sun: 'part',
      moisture: 'medium',
      areaSqFt: 100,
      deerPressure: 'low',
      goals: ['low-spreaders', 'shade-garden', 'rain-garden'],
    };
    const sedge = scoreSpecies(F.pennSedge, site, LARKFIELD);
    expect(partOf(sedge, 'spread')?.points).toBe(-1);
    expect(partOf(sedge, 'shade-garden')?.points).toBe(2);
    expect(partOf(scoreSpecies(F.swampMilkweed, site, LARKFIELD), 'rain-garden')?.points).toBe(2);
    expect(partOf(sedge, 'deer')).toBeUndefined(); // low deer pressure: no deer line
  });
});

describe('recommend', () => {
  const site: Site = { sun: 'full', moisture: 'medium', areaSqFt: 300, deerPressure: 'medium', goals: ['pollinators'] };

  it('ranks by score, then how well it thrives and its wildlife value, then slug, and puts near misses apart', () => {
    const { ranked, alsoConsider } = recommend(ALL_FIXTURES, site, LARKFIELD);
    for (let i = 1; i < ranked.length; i++) {
      const [a, b] = [ranked[i - 1], ranked[i]];
      const [ta, tb] = [a.tieBreak ?? 0, b.tieBreak ?? 0];
      expect(a.score > b.score || (a.score === b.score && (ta > tb || (ta === tb && a.slug < b.slug)))).toBe(true);
    }
    expect(ranked.every((r) => r.eligible)).toBe(true);
    expect(alsoConsider.map((r) => r.slug)).toContain('amsonia-tabernaemontana');
    expect([...ranked, ...alsoConsider].map((r) => r.slug)).not.toContain('echinacea-paradoxa');
  });

  it('is deterministic whatever the input order', () => {
    const a = recommend(ALL_FIXTURES, site, LARKFIELD);
    const b = recommend([...ALL_FIXTURES].reverse(), site, LARKFIELD);
    expect(b).toEqual(a);
  });
});
