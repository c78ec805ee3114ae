import { describe, expect, it } from 'vitest';
import { seasonSpecies as sp } from '../season-planning/season-fixtures.js';
import { checkHouseholdLimits } from './limits.js';
import { rankForYard } from './fits-my-yard.js';
import { reservationRequestSchema } from './requests.js';
import { seasonReport, shareReportToCsv } from './season-report.js';
import { germinationReport } from './germination.js';

// Records for the tests: golden alexanders' facts (from memory) with the overrides named. Host counts are
// Tallamy & Shropshire 2009 genus counts as CHECK-VALUES §2 lists them (Solidago 115, Asclepias 12, TAL-H, R).
const goldenrod = sp({
  slug: 'solidago-speciosa',
  scientificName: 'Solidago speciosa',
  bloomMonths: [8, 9, 10],
  sun: ['full'],
  sunOptimum: ['full'],
  moisture: ['dry', 'medium'],
  moistureOptimum: ['dry'],
  wildlife: { lepidopteraGenusCount: 115 },
});
const milkweed = sp({
  slug: 'asclepias-incarnata',
  scientificName: 'Asclepias incarnata',
  bloomMonths: [6, 7, 8],
  moisture: ['medium', 'wet'],
  moistureOptimum: ['wet'],
  wildlife: { lepidopteraGenusCount: 12, monarchHost: true },
});
const species = new Map([goldenrod, milkweed].map((s) => [s.slug, s]));

describe('household limits (the share rules)', () => {
  const limits = { perSpecies: 3, total: 5 };
  it('passes lines inside both limits', () => {
    expect(
      checkHouseholdLimits(
        [
          { speciesSlug: 'a', count: 3 },
          { speciesSlug: 'b', count: 2 },
        ],
        limits,
      ),
    ).toEqual([]);
  });
  it('names the line over the per-species limit and the lines over the total', () => {
    const problems = checkHouseholdLimits(
      [
        { speciesSlug: 'a', count: 4 },
        { speciesSlug: 'b', count: 3 },
      ],
      limits,
    );
    expect(problems.map((p) => p.field)).toEqual(['lines.0.count', 'lines']);
  });
});

describe('reservation request', () => {
  const ok = {
    name: 'Sol Marchetti',
    email: 'Sol.Marchetti@example.org',
    zip: '54665',
    slotId: '0b7b1d1e-4a4f-4c59-9d4a-0d1f4e8b9c21',
    lines: [{ speciesSlug: 'asclepias-incarnata', count: 2 }],
  };
  it.each([
    [{ lines: [{ speciesSlug: 'asclepias-incarnata', count: 0 }] }, 'lines.0.count'],
    [{ lines: [{ speciesSlug: 'asclepias-incarnata', count: 1000 }] }, 'lines.0.count'],
    [{ zip: '5466' }, 'zip'],
    [{ lines: [] }, 'lines'],
    [{ phone: '555' }, ''],
  ])('refuses %j naming %s', (change, field) => {
    const r = reservationRequestSchema.safeParse({ ...ok, ...change });
    expect(r.success).toBe(false);
    if (field) expect(r.error!.issues.map((i) => i.path.join('.'))).toContain(field);
  });
  it('lower-cases the e-mail and keeps five ZIP digits', () => {
    const r = reservationRequestSchema.parse({ ...ok, zip: '54665-1234' });
    expect(r.email).toBe('sol.marchetti@example.org');
    expect(r.zip).toBe('54665');
  });
});

describe('fits my yard', () => {
  it('puts the wet-soil milkweed first for a wet sunny yard and says why in words, never a score', () => {
    const ranked = rankForYard(
      [goldenrod, milkweed],
      { sun: 'full', moisture: 'wet' },
      { state: 'WI', ecoregionCode: '52' },
    );
    expect(ranked.get('asclepias-incarnata')!.rank).toBe(1);
    expect(ranked.get('asclepias-incarnata')!.fit).toBe('thrives');
    expect(ranked.get('solidago-speciosa')!.fit).not.toBe('thrives');
    for (const fit of ranked.values()) for (const w of fit.why) expect(w).not.toMatch(/\d+(\.\d+)? points?/);
  });
});

describe('season report arithmetic', () => {
  const report = seasonReport({
    groupSlug: 'larkfield-commons-growers',
    groupName: 'Larkfield Commons Growers',
    seasonYear: 2027,
    shareDate: '2027-06-12',
    given: [
      { speciesSlug: 'asclepias-incarnata', count: 3 },
      { speciesSlug: 'solidago-speciosa', count: 2 },
      { speciesSlug: 'asclepias-incarnata', count: 1 },
    ],
    reservedHouseholds: 2,
    walkUps: 1,
    zips: ['54665', '54601', '54666'],
    targets: [
      { speciesSlug: 'asclepias-incarnata', targetPlants: 10 },
      { speciesSlug: 'solidago-speciosa', targetPlants: 10 },
    ],
    species,
  });
  it('adds the plants by species, households, milkweeds and targets (hand-counted)', () => {
    expect(report.totals).toEqual({
      plantsGiven: 6,
      households: 3,
      walkUps: 1,
      milkweedPlants: 4,
      species: 2,
      targetPlants: 20,
      shareOfTargets: 0.3,
    });
    expect(report.bySpecies.map((s) => [s.speciesSlug, s.plantsGiven])).toEqual([
      ['asclepias-incarnata', 4],
      ['solidago-speciosa', 2],
    ]);
  });
  it('spreads flowering over the months each species blooms', () => {
    const plants = report.floweringByMonth.map((m) => m.plants);
    expect(plants).toEqual([0, 0, 0, 0, 0, 4, 4, 6, 2, 2, 0, 0]);
  });
  it('says caterpillar host value in words for the layer (goldenrod among the best, CHECK-VALUES §2)', () => {
    expect(report.caterpillarHosts).toHaveLength(1);
    expect(report.caterpillarHosts[0].words[0]).toMatch(/^2 plants among the best caterpillar host plants/);
  });
  it('counts ZIP areas by their first three digits only', () => {
    expect(report.zipAreas).toEqual([{ area: '546', households: 3 }]);
    expect(JSON.stringify(report)).not.toContain('54665');
    expect(shareReportToCsv(report)).not.toContain('54665');
  });
});

// Germination from batch logs: each entry counts what is new since the last (batch-planning/batch-log.ts),
// so the figures are sums. The counts are invented (demo scenario, DESIGN.md); the checks are arithmetic.
describe('germination by method and grower', () => {
  const batches = [
    {
      method: 'winter-sowing' as const,
      grower: 'Juniper',
      entries: [
        { kind: 'sown' as const, count: 100 },
        { kind: 'germinated' as const, count: 60 },
        { kind: 'germinated' as const, count: 10 },
        { kind: 'lost' as const, count: 5 },
        { kind: 'ready' as const, count: 50 },
      ],
    },
    {
      method: 'soil-blocks' as const,
      grower: 'Theo',
      entries: [
        { kind: 'sown' as const, count: 40 },
        { kind: 'germinated' as const, count: 30 },
      ],
    },
    {
      method: 'winter-sowing' as const,
      grower: 'Amara',
      entries: [{ kind: 'sown' as const, count: 20 }],
    },
    // Planned but not sown yet: not counted, so no row of zeros.
    { method: 'indoor-lights' as const, grower: 'Theo', entries: [] },
  ];

  it.each([
    ['no batches', [], null],
    ['batches with nothing logged', [{ method: 'indoor-lights' as const, grower: 'Theo', entries: [] }], null],
  ])('is null with %s', (_what, input, expected) => {
    expect(germinationReport(input)).toBe(expected);
  });

  it('sums sown, up and ready by method (catalogue order) and by grower (by name)', () => {
    const g = germinationReport(batches)!;
    expect(g.byMethod).toEqual([
      { method: 'winter-sowing', sown: 120, germinated: 70, ready: 50 },
      { method: 'soil-blocks', sown: 40, germinated: 30, ready: 0 },
    ]);
    expect(g.byGrower).toEqual([
      { grower: 'Amara', sown: 20, germinated: 0, ready: 0 },
      { grower: 'Juniper', sown: 100, germinated: 70, ready: 50 },
      { grower: 'Theo', sown: 40, germinated: 30, ready: 0 },
    ]);
  });

  it('writes both tables into the CSV as counts', () => {
    const csv = shareReportToCsv(
      seasonReport({
        groupSlug: 'larkfield-commons-growers',
        groupName: 'Larkfield Commons Growers',
        seasonYear: 2027,
        shareDate: '2027-06-12',
        given: [],
        reservedHouseholds: 0,
        walkUps: 0,
        zips: [],
        targets: [],
        species: new Map(),
        germination: germinationReport(batches),
      }),
    );
    expect(csv).toContain(
      'germination by method,winter sowing in covered containers,50,,,sown 120; up 70; ready 50\r\n',
    );
    expect(csv).toContain('germination by grower,Theo,0,,,sown 40; up 30; ready 0\r\n');
  });
});
