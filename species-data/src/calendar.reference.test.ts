/**
 * The sowing calendar's durations and readiness rules checked against CHECK-VALUES.md (read in place
 * from ../shared/reference) and run over the real catalogue. Each check names the row it relies on.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { DURATIONS, WINDOWS, buildSowingCalendar, daysBetween, readinessOf } from '@homeground/shared';
import { describe, expect, it } from 'vitest';
import { DATA_DIR, loadCatalogue } from './catalogue.js';
import { checkValueRows, findCheckValueRow } from './reference/check-values.js';
import { referenceAvailable } from './reference/reference-dir.js';

const available = referenceAvailable(['CHECK-VALUES.md']);
const species = loadCatalogue().species;
const bySlug = new Map(species.map((s) => [s.slug, s]));

describe.skipIf(!available)('calendar durations vs CHECK-VALUES.md §4', () => {
  const row = (plant: string, mentions: string[]) => {
    const r = findCheckValueRow(checkValueRows(), plant, mentions);
    expect(r, `CHECK-VALUES row "${plant}"`).toBeDefined();
    return r!;
  };

  it('dormant seeding in late November, frost-seeding to the end of January (IPN, R)', () => {
    row('Outdoor dormant seeding window (Iowa)', ['Nov–Jan', 'IPN', '| R']);
    expect(WINDOWS.dormantSeeding.month).toBe(11);
    expect(WINDOWS.frostSeedingCloses).toEqual({ month: 1, day: 31 });
  });

  it('indoor sowing 8–12 weeks before the last frost (M): we use the low end', () => {
    row('Start native perennials indoors', ['8–12', 'weeks']);
    expect(DURATIONS.indoorWeeksBeforeFrost).toBeGreaterThanOrEqual(8);
    expect(DURATIONS.indoorWeeksBeforeFrost).toBeLessThanOrEqual(12);
  });

  it('hardening off 7–14 days (M); checking for sprouts from day 28–35 (IPN, R)', () => {
    row('Hardening off total duration', ['7–14']);
    row('Start checking for sprouts', ['28–35', 'IPN', '| R']);
    expect(DURATIONS.hardenOffDays).toBeGreaterThanOrEqual(7);
    expect(DURATIONS.hardenOffDays).toBeLessThanOrEqual(14);
    expect(DURATIONS.checkSproutsAfterDays).toBeGreaterThanOrEqual(28);
    expect(DURATIONS.checkSproutsAfterDays).toBeLessThanOrEqual(35);
  });

  it('warm-season grass waits for soil ≥ 10–13 °C (M): little bluestem in outdoor pots sprouts after the frost', () => {
    row('Transplant/warm-season grass sowing soil-temperature threshold', ['10–13']);
    const c = buildSowingCalendar({
      lastFrost: '2027-05-10',
      today: '2026-10-01',
      plans: [{ species: bySlug.get('schizachyrium-scoparium')!, method: 'outdoor-pot-winter' }],
    });
    expect(c.events.find((e) => e.kind === 'sprouts-expected')!.date > '2027-05-10').toBe(true);
  });
});

describe.skipIf(!available)('readiness rules vs CHECK-VALUES.md §1', () => {
  it('pale purple coneflower: 2 years to a finished 160 ml plug (NPN-ECPA, R) → a second season', () => {
    expect(
      findCheckValueRow(checkValueRows(), 'Echinacea pallida', ['160 ml plug', 'years', 'NPN-ECPA', '| R']),
    ).toBeDefined();
    expect(readinessOf(bySlug.get('echinacea-pallida')!)).toMatchObject({
      secondSeason: true,
      source: 'npn-echinacea-pallida',
    });
  });

  it('lupine germinates fastest at 24–29 °C (JEH96, R) → waits for warm soil outdoors', () => {
    expect(findCheckValueRow(checkValueRows(), 'Lupinus perennis', ['24–29', 'JEH96', '| R'])).toBeDefined();
    expect(readinessOf(bySlug.get('lupinus-perennis')!).needsWarmSoil).toBe(true);
  });

  it('Echinacea: CMS under light beat darkness (ROM05, R) → stratify in light, for every catalogue coneflower', () => {
    expect(findCheckValueRow(checkValueRows(), 'Echinacea purpurea', ['light', 'ROM05', '| R'])).toBeDefined();
    const coneflowers = species.filter((s) => s.scientificName.startsWith('Echinacea '));
    expect(coneflowers.length).toBeGreaterThan(0);
    for (const s of coneflowers) expect(readinessOf(s).stratifyInLight).toBe(true);
  });
});

describe('readiness over the whole catalogue', () => {
  const sourceKeys = new Set(
    (JSON.parse(readFileSync(path.join(DATA_DIR, 'sources.json'), 'utf8')) as { key: string }[]).map((s) => s.key),
  );

  it('every rule applied names a source key in sources.json', () => {
    for (const s of species) expect(sourceKeys, `${s.slug}: ${readinessOf(s).source}`).toContain(readinessOf(s).source);
  });

  it('warm-moist days are never counted as cold outdoors: each warm-then-cold record gets its warm days before its cold', () => {
    const warmCold = species.filter((s) => s.germination.treatments.some((t) => t.kind === 'warm-moist'));
    expect(warmCold.length).toBeGreaterThan(40);
    for (const s of warmCold) {
      const warm = s.germination.treatments
        .filter((t) => t.kind === 'warm-moist')
        .reduce((n, t) => n + (t.days ?? 0), 0);
      const cold = s.germination.treatments
        .filter((t) => t.kind === 'cold-moist')
        .reduce((n, t) => n + (t.days ?? 0), 0);
      const c = buildSowingCalendar({
        lastFrost: '2027-05-10',
        today: '2026-07-01',
        plans: [{ species: s, method: 'outdoor-pot-winter' }],
      });
      const on = (k: string) => c.events.find((e) => e.kind === k && e.speciesSlug)!.date;
      expect(daysBetween(on('sow'), on('cms-start')), s.slug).toBeGreaterThanOrEqual(warm);
      expect(daysBetween(on('cms-start'), on('sprouts-expected')), s.slug).toBeGreaterThanOrEqual(cold);
    }
  });
});
