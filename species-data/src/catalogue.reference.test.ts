/**
 * The catalogue checked against open data nobody on the project wrote (read in place from
 * ../shared/reference; see its SOURCES.md). Each check names its source.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Species } from '@homeground/shared';
import { beforeAll, describe, expect, it } from 'vitest';
import { DATA_DIR, loadCatalogue } from './catalogue.js';
import { checkValueRows, findCheckValueRow } from './reference/check-values.js';
import { referenceAvailable } from './reference/reference-dir.js';
import { loadLepidopteraByGenus, loadUsdaCharacteristics, loadUsdaDistribution, loadUsdaTaxa } from './reference/usda-plants.js';

const FILES = ['usda_plants_taxa.csv', 'usda_plants_state_distribution.csv', 'tallamy_shropshire_2009_lepidoptera_by_plant_genus.csv', 'CHECK-VALUES.md'];
const available = referenceAvailable(FILES);
const genusOf = (s: Species) => s.scientificName.split(' ')[0];
const aliases: { genus: string; listedAs: string }[] = JSON.parse(readFileSync(path.join(DATA_DIR, 'genus-aliases.json'), 'utf8'));

describe.skipIf(!available)('catalogue vs USDA PLANTS (usda_plants_taxa.csv, state distribution)', () => {
  const { species, realignments } = loadCatalogue();
  let taxa: ReturnType<typeof loadUsdaTaxa>;
  beforeAll(() => {
    taxa = loadUsdaTaxa();
  });

  it('agrees on symbol, accepted name and family for ≥ 98 % of species; each other one is explained', () => {
    const bySymbol = new Map(taxa.map((t) => [t.symbol, t]));
    const disagreements: string[] = [];
    let agree = 0;
    for (const s of species) {
      const t = bySymbol.get(s.usdaSymbol);
      const problems: { field: string; text: string }[] = [];
      if (!t) problems.push({ field: 'usdaSymbol', text: `symbol ${s.usdaSymbol} is not an accepted USDA taxon` });
      else {
        if (t.name !== s.scientificName) problems.push({ field: 'scientificName', text: `USDA names ${s.usdaSymbol} "${t.name}"` });
        // USDA keeps older family concepts; only documented APG IV / PPG I realignments are accepted.
        const realigned = realignments.some((r) => r.usdaFamily === t.family && r.family === s.family && r.genera.includes(genusOf(s)));
        if (t.family !== s.family && !realigned) problems.push({ field: 'family', text: `USDA family ${t.family}, record ${s.family}` });
      }
      if (problems.length === 0) agree++;
      const unexplained = problems.filter((p) => !s.reconciliations.some((r) => r.field === p.field));
      disagreements.push(...unexplained.map((p) => `${s.slug}: ${p.text} (no reconciliation note)`));
    }
    const share = agree / species.length;
    console.log(`USDA PLANTS agreement on symbol/name/family: ${agree}/${species.length} = ${(share * 100).toFixed(1)} %`);
    expect(disagreements).toEqual([]);
    expect(share).toBeGreaterThanOrEqual(0.98);
  });

  it('claims no native state that USDA lists as introduced only or not at all, unless the record explains', () => {
    const distribution = loadUsdaDistribution();
    const bad: string[] = [];
    for (const s of species) {
      if (s.reconciliations.some((r) => r.field === 'nativeStates')) continue;
      const d = distribution.get(s.usdaSymbol);
      const native = new Set(d?.nativeIn ?? []);
      const wrong = s.nativeStates.filter((st) => !native.has(st));
      if (wrong.length) bad.push(`${s.slug}: ${wrong.join(', ')} not native per USDA`);
    }
    expect(bad).toEqual([]);
  });
});

describe.skipIf(!available || !referenceAvailable(['usda_plants_characteristics.csv']))('catalogue vs USDA PLANTS characteristics (usda_plants_characteristics.csv)', () => {
  it('records commercial availability exactly as USDA gives it, and null where USDA has no value', () => {
    const words: Record<string, string> = {
      'Routinely Available': 'routine', 'Contracting Only': 'contract-only',
      'Field Collections Only': 'field-collection-only', 'No Known Source': 'none-known',
    };
    const characteristics = loadUsdaCharacteristics();
    const bad: string[] = [];
    let withValue = 0;
    for (const s of loadCatalogue().species) {
      const usda = characteristics.get(s.usdaSymbol)?.commercial_availability?.trim() ?? '';
      const expected = usda ? words[usda] : null;
      if (expected) withValue++;
      if ((s.commercialAvailability ?? null) !== expected) bad.push(`${s.slug}: ${s.commercialAvailability}, USDA "${usda}"`);
    }
    expect(withValue).toBeGreaterThan(100);
    expect(bad).toEqual([]);
  });
});

describe.skipIf(!available)('catalogue vs Tallamy & Shropshire 2009 (Lepidoptera species per plant genus)', () => {
  it('gives each species its genus count, or a documented older genus concept, or null when unlisted', () => {
    const table = loadLepidopteraByGenus();
    const listed = (g: string) => {
      const row = table.get(g);
      return row && Number.isFinite(row.totalLepidoptera) ? row.totalLepidoptera : undefined;
    };
    const bad: string[] = [];
    for (const s of loadCatalogue().species) {
      const genus = genusOf(s);
      const alias = aliases.find((a) => a.genus === genus);
      const expected = new Set<number | null>();
      if (listed(genus) !== undefined) expected.add(listed(genus)!);
      if (alias && listed(alias.listedAs) !== undefined) expected.add(listed(alias.listedAs)!);
      if (expected.size === 0) expected.add(null);
      if (!expected.has(s.wildlife.lepidopteraGenusCount)) {
        bad.push(`${s.slug}: ${s.wildlife.lepidopteraGenusCount}, table says ${[...expected].join(' or ')}`);
      }
    }
    expect(bad).toEqual([]);
  });

  it('matches the published figures for the best-known genera (Solidago 115, Asclepias 12, Quercus 532)', () => {
    const table = loadLepidopteraByGenus();
    expect(table.get('Solidago')?.totalLepidoptera).toBe(115);
    expect(table.get('Asclepias')?.totalLepidoptera).toBe(12);
    expect(table.get('Quercus')?.totalLepidoptera).toBe(532);
    const goldenrod = loadCatalogue().species.find((s) => genusOf(s) === 'Solidago');
    expect(goldenrod?.wildlife.lepidopteraGenusCount).toBe(115);
  });
});

/** Hard checks from CHECK-VALUES.md §1 rows marked R (retrieved): the row must exist, then the rule holds. */
const RETRIEVED_RULES: { plant: string; mentions: string[]; slug: string; rule: string; holds: (s: Species) => boolean }[] = [
  { plant: 'Asclepias incarnata', mentions: ['NPN-ASIN', '| R'], slug: 'asclepias-incarnata', rule: 'cold-moist ≥ 7 d',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'cold-moist' && (t.days ?? 0) >= 7) },
  { plant: 'Asclepias tuberosa', mentions: ['HS23', '| R'], slug: 'asclepias-tuberosa', rule: 'chilled moist (cold-moist), never dry',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'cold-moist') },
  { plant: 'Asclepias syriaca', mentions: ['KAYE18', '| R'], slug: 'asclepias-syriaca', rule: 'cold-moist ≥ 14 d',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'cold-moist' && (t.days ?? 0) >= 14) },
  { plant: 'Echinacea purpurea', mentions: ['ROM05', '| R'], slug: 'echinacea-purpurea', rule: 'cold-moist ≥ 28 d',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'cold-moist' && (t.days ?? 0) >= 28) },
  { plant: 'Echinacea pallida', mentions: ['NPN-ECPA', '60–90', '| R'], slug: 'echinacea-pallida', rule: 'cold-moist 60–90 d',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'cold-moist' && (t.days ?? 0) >= 60 && (t.days ?? 0) <= 90) },
  { plant: 'Echinacea pallida', mentions: ['surface sow', '| R'], slug: 'echinacea-pallida', rule: 'surface sown, needs light',
    holds: (s) => s.germination.needsLight && s.germination.sowingDepthMm === 0 },
  { plant: 'Baptisia australis', mentions: ['mechanical scarification', '| R'], slug: 'baptisia-australis', rule: 'scarification or hot water',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'scarification' || t.kind === 'hot-water') },
  { plant: 'Lupinus perennis', mentions: ['nicked', '| R'], slug: 'lupinus-perennis', rule: 'scarification',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'scarification') },
  { plant: 'Penstemon digitalis', mentions: ['HS04P', '| R'], slug: 'penstemon-digitalis', rule: 'cold-moist (0 % emerged unstratified)',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'cold-moist') },
  { plant: 'Liatris punctata', mentions: ['NPN-LIPU', '| R'], slug: 'liatris-punctata', rule: 'no pretreatment',
    holds: (s) => s.germination.treatments.every((t) => t.kind === 'none') },
];

/** Soft checks from rows marked M (from memory): reported, never failed. */
const MEMORY_RANGES: [string, number, number][] = [
  ['asclepias-verticillata', 30, 30], ['asclepias-sullivantii', 30, 30], ['asclepias-purpurascens', 30, 60],
  ['rudbeckia-fulgida', 30, 60], ['liatris-spicata', 30, 60], ['liatris-aspera', 60, 60], ['liatris-pycnostachya', 60, 60],
  ['symphyotrichum-novae-angliae', 30, 60], ['solidago-speciosa', 60, 60], ['zizia-aurea', 60, 90],
  ['eryngium-yuccifolium', 60, 60], ['silphium-laciniatum', 60, 60], ['aquilegia-canadensis', 30, 30],
  ['lobelia-cardinalis', 60, 60], ['lobelia-siphilitica', 60, 60], ['packera-aurea', 60, 60],
];

describe.skipIf(!available)('germination treatments vs CHECK-VALUES.md §1', () => {
  const bySlug = new Map(loadCatalogue().species.map((s) => [s.slug, s]));

  it.each(RETRIEVED_RULES)('$plant: $rule (row marked R)', ({ plant, mentions, slug, holds }) => {
    expect(findCheckValueRow(checkValueRows(), plant, mentions)).toBeDefined();
    const s = bySlug.get(slug);
    expect(s, `${slug} is in the catalogue`).toBeDefined();
    expect(holds(s!)).toBe(true);
  });

  it('Carex: cold-moist of at most 6 months, usually ≤ 1 month (KG07, R)', () => {
    expect(findCheckValueRow(checkValueRows(), 'Carex (12', ['KG07', '| R'])).toBeDefined();
    const sedges = [...bySlug.values()].filter((s) => s.scientificName.startsWith('Carex '));
    const tooLong = sedges.filter((s) => s.germination.treatments.some((t) => t.kind === 'cold-moist' && (t.days ?? 0) > 180));
    expect(sedges.length).toBeGreaterThan(0);
    expect(tooLong.map((s) => s.slug)).toEqual([]);
  });

  it('reports (never fails on) rows marked M, from memory', () => {
    const outside = MEMORY_RANGES.flatMap(([slug, lo, hi]) => {
      const s = bySlug.get(slug);
      if (!s) return [`${slug}: not in the catalogue`];
      const days = s.germination.treatments.find((t) => t.kind === 'cold-moist')?.days ?? 0;
      return days >= lo && days <= hi ? [] : [`${slug}: ${days} d cold-moist, M row says ${lo}–${hi}`];
    });
    console.log(`CHECK-VALUES M rows: ${MEMORY_RANGES.length - outside.length}/${MEMORY_RANGES.length} within range${outside.length ? `; soft differences:\n  ${outside.join('\n  ')}` : ''}`);
    expect(MEMORY_RANGES.length).toBeGreaterThan(0);
  });
});
