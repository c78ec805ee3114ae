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
import { compareWithReference, loadReferenceTables, REFERENCE_COMPARISON_FILES } from './reference/compare-record.js';
import { referenceAvailable } from './reference/reference-dir.js';
import { loadSylvanSeedsPercentages, SYLVANSEEDS_FILE } from './reference/sylvanseeds.js';
import { loadLepidopteraByGenus, loadUsdaCharacteristics, loadUsdaTaxa } from './reference/usda-plants.js';

const FILES = [
  'usda_plants_taxa.csv',
  'usda_plants_state_distribution.csv',
  'tallamy_shropshire_2009_lepidoptera_by_plant_genus.csv',
  'CHECK-VALUES.md',
];
const available = referenceAvailable([...FILES, ...REFERENCE_COMPARISON_FILES]);
const genusOf = (s: Species) => s.scientificName.split(' ')[0];
const aliases: { genus: string; listedAs: string }[] = JSON.parse(
  readFileSync(path.join(DATA_DIR, 'genus-aliases.json'), 'utf8'),
);

/**
 * Every record beside the reference, by the one comparer the curator's reference page also uses
 * (species-data/src/reference/compare-record.ts), read once.
 */
let comparisonsCache: ReturnType<typeof compareWithReference>[] | undefined;
function comparisons() {
  if (!comparisonsCache) {
    const tables = loadReferenceTables();
    const { species, realignments } = loadCatalogue();
    comparisonsCache = species.map((s) => compareWithReference(s, tables, { realignments, genusAliases: aliases }));
  }
  return comparisonsCache;
}
/** Each record's check of one field, with its slug. */
const checksOf = (field: string) =>
  comparisons().flatMap((c) => c.checks.filter((k) => k.field === field).map((k) => ({ slug: c.slug, ...k })));
/** Differences the record does not explain, worded for the failure message. */
const unexplainedOf = (field: string) =>
  checksOf(field)
    .filter((k) => k.verdict === 'differs' && k.reconciliation === null)
    .map((k) => `${k.slug}: record ${k.record}, reference ${k.reference} (${k.rule})`);

describe.skipIf(!available)('catalogue vs USDA PLANTS (usda_plants_taxa.csv, state distribution)', () => {
  const { species } = loadCatalogue();
  let taxa: ReturnType<typeof loadUsdaTaxa>;
  beforeAll(() => {
    taxa = loadUsdaTaxa();
  });

  it('agrees on symbol, accepted name and family for ≥ 98 % of species; each other one is explained', () => {
    const fields = ['usdaSymbol', 'scientificName', 'family'];
    const agree = comparisons().filter((c) =>
      c.checks.filter((k) => fields.includes(k.field)).every((k) => k.verdict === 'agrees'),
    ).length;
    const share = agree / species.length;
    console.log(
      `USDA PLANTS agreement on symbol/name/family: ${agree}/${species.length} = ${(share * 100).toFixed(1)} %`,
    );
    expect(taxa.length).toBeGreaterThan(30_000);
    expect(fields.flatMap(unexplainedOf)).toEqual([]);
    expect(share).toBeGreaterThanOrEqual(0.98);
  });

  it('claims no native state that USDA lists as introduced only or not at all, unless the record explains', () => {
    expect(checksOf('nativeStates')).toHaveLength(species.length);
    expect(unexplainedOf('nativeStates')).toEqual([]);
  });
});

describe.skipIf(!available || !referenceAvailable(['usda_plants_characteristics.csv']))(
  'catalogue vs USDA PLANTS characteristics (usda_plants_characteristics.csv)',
  () => {
    it('records commercial availability exactly as USDA gives it, and null where USDA has no value', () => {
      const words: Record<string, string> = {
        'Routinely Available': 'routine',
        'Contracting Only': 'contract-only',
        'Field Collections Only': 'field-collection-only',
        'No Known Source': 'none-known',
      };
      const characteristics = loadUsdaCharacteristics();
      const bad: string[] = [];
      let withValue = 0;
      for (const s of loadCatalogue().species) {
        const usda = characteristics.get(s.usdaSymbol)?.commercial_availability?.trim() ?? '';
        const expected = usda ? words[usda] : null;
        if (expected) withValue++;
        if ((s.commercialAvailability ?? null) !== expected)
          bad.push(`${s.slug}: ${s.commercialAvailability}, USDA "${usda}"`);
      }
      expect(withValue).toBeGreaterThan(100);
      expect(bad).toEqual([]);
    });

    it('gives a poison caution to every species USDA rates toxic (toxicity Slight, Moderate or Severe)', () => {
      const characteristics = loadUsdaCharacteristics();
      const missing: string[] = [];
      let rated = 0;
      for (const s of loadCatalogue().species) {
        const toxicity = characteristics.get(s.usdaSymbol)?.toxicity ?? '';
        if (!['Slight', 'Moderate', 'Severe'].includes(toxicity)) continue;
        rated++;
        if (!s.cautions.some((c) => c.kind === 'toxic-if-eaten' || c.kind === 'livestock' || c.kind === 'pets'))
          missing.push(`${s.slug} (${toxicity})`);
      }
      expect(rated).toBeGreaterThan(5);
      expect(missing).toEqual([]);
    });

    /** A record differs when USDA's mature height lies outside its range widened by a fifth each way. */
    it('agrees with USDA mature height (height_mature_feet), or the record explains why USDA is wrong', () => {
      const compared = checksOf('heightCm').filter((k) => k.verdict !== 'no-reference');
      const differ = compared.filter((k) => k.verdict === 'differs').length;
      console.log(`heights compared with USDA: ${compared.length}; ${differ} differ, each with a reconciliation note`);
      expect(compared.length).toBeGreaterThan(100);
      expect(unexplainedOf('heightCm')).toEqual([]);
    });

    /** USDA gives a season; the record differs when none of its months falls in that season. */
    it('agrees with USDA bloom period (bloom_period), or the record explains why USDA is wrong', () => {
      const compared = checksOf('bloomMonths').filter((k) => k.verdict !== 'no-reference');
      const differ = compared.filter((k) => k.verdict === 'differs').length;
      console.log(
        `bloom months compared with USDA: ${compared.length}; ${differ} differ, each with a reconciliation note`,
      );
      expect(compared.length).toBeGreaterThan(100);
      expect(unexplainedOf('bloomMonths')).toEqual([]);
    });
  },
);

describe.skipIf(!referenceAvailable([SYLVANSEEDS_FILE]))(
  'germination rates vs SylvanSeeds (Fernández-Pascual 2021) laboratory trials',
  () => {
    /** A record differs when its rate lies outside the trials' range widened by a fifth each way. */
    it('keeps each stored rate near the published trials, or the record explains the difference', () => {
      const compared = checksOf('germination.germinationRatePct');
      console.log(`germination rates compared with SylvanSeeds: ${compared.length} species`);
      expect(compared.length).toBeGreaterThan(20);
      expect(unexplainedOf('germination.germinationRatePct')).toEqual([]);
    });

    it('Pennsylvania sedge: the trials show 64–89 %, and the record is in that range', () => {
      const pct = loadSylvanSeedsPercentages().get('Carex pensylvanica') ?? [];
      expect(Math.round(Math.min(...pct))).toBe(64);
      expect(Math.round(Math.max(...pct))).toBe(89);
      const sedge = loadCatalogue().species.find((s) => s.slug === 'carex-pensylvanica');
      expect(sedge?.germination.germinationRatePct).toBeGreaterThanOrEqual(64);
    });
  },
);

describe.skipIf(!available)('catalogue vs Tallamy & Shropshire 2009 (Lepidoptera species per plant genus)', () => {
  it('gives each species its genus count, or a documented older genus concept, or null when unlisted', () => {
    expect(checksOf('wildlife.lepidopteraGenusCount')).toHaveLength(loadCatalogue().species.length);
    expect(unexplainedOf('wildlife.lepidopteraGenusCount')).toEqual([]);
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
const RETRIEVED_RULES: {
  plant: string;
  mentions: string[];
  slug: string;
  rule: string;
  holds: (s: Species) => boolean;
}[] = [
  {
    plant: 'Asclepias incarnata',
    mentions: ['NPN-ASIN', '| R'],
    slug: 'asclepias-incarnata',
    rule: 'cold-moist ≥ 7 d',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'cold-moist' && (t.days ?? 0) >= 7),
  },
  {
    plant: 'Asclepias tuberosa',
    mentions: ['HS23', '| R'],
    slug: 'asclepias-tuberosa',
    rule: 'chilled moist (cold-moist), never dry',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'cold-moist'),
  },
  {
    plant: 'Asclepias syriaca',
    mentions: ['KAYE18', '| R'],
    slug: 'asclepias-syriaca',
    rule: 'cold-moist ≥ 14 d',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'cold-moist' && (t.days ?? 0) >= 14),
  },
  {
    plant: 'Echinacea purpurea',
    mentions: ['ROM05', '| R'],
    slug: 'echinacea-purpurea',
    rule: 'cold-moist ≥ 28 d',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'cold-moist' && (t.days ?? 0) >= 28),
  },
  {
    plant: 'Echinacea pallida',
    mentions: ['NPN-ECPA', '60–90', '| R'],
    slug: 'echinacea-pallida',
    rule: 'cold-moist 60–90 d',
    holds: (s) =>
      s.germination.treatments.some((t) => t.kind === 'cold-moist' && (t.days ?? 0) >= 60 && (t.days ?? 0) <= 90),
  },
  {
    plant: 'Echinacea pallida',
    mentions: ['surface sow', '| R'],
    slug: 'echinacea-pallida',
    rule: 'surface sown, needs light',
    holds: (s) => s.germination.needsLight && s.germination.sowingDepthMm === 0,
  },
  {
    plant: 'Baptisia australis',
    mentions: ['mechanical scarification', '| R'],
    slug: 'baptisia-australis',
    rule: 'scarification or hot water',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'scarification' || t.kind === 'hot-water'),
  },
  {
    plant: 'Lupinus perennis',
    mentions: ['nicked', '| R'],
    slug: 'lupinus-perennis',
    rule: 'scarification',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'scarification'),
  },
  {
    plant: 'Penstemon digitalis',
    mentions: ['HS04P', '| R'],
    slug: 'penstemon-digitalis',
    rule: 'cold-moist (0 % emerged unstratified)',
    holds: (s) => s.germination.treatments.some((t) => t.kind === 'cold-moist'),
  },
  {
    plant: 'Liatris punctata',
    mentions: ['NPN-LIPU', '| R'],
    slug: 'liatris-punctata',
    rule: 'no pretreatment',
    holds: (s) => s.germination.treatments.every((t) => t.kind === 'none'),
  },
];

/** Soft checks from rows marked M (from memory): reported, never failed. */
const MEMORY_RANGES: [string, number, number][] = [
  ['asclepias-verticillata', 30, 30],
  ['asclepias-sullivantii', 30, 30],
  ['asclepias-purpurascens', 30, 60],
  ['rudbeckia-fulgida', 30, 60],
  ['liatris-spicata', 30, 60],
  ['liatris-aspera', 60, 60],
  ['liatris-pycnostachya', 60, 60],
  ['symphyotrichum-novae-angliae', 30, 60],
  ['solidago-speciosa', 60, 60],
  ['zizia-aurea', 60, 90],
  ['eryngium-yuccifolium', 60, 60],
  ['silphium-laciniatum', 60, 60],
  ['aquilegia-canadensis', 30, 30],
  ['lobelia-cardinalis', 60, 60],
  ['lobelia-siphilitica', 60, 60],
  ['packera-aurea', 60, 60],
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
    const tooLong = sedges.filter((s) =>
      s.germination.treatments.some((t) => t.kind === 'cold-moist' && (t.days ?? 0) > 180),
    );
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
    console.log(
      `CHECK-VALUES M rows: ${MEMORY_RANGES.length - outside.length}/${MEMORY_RANGES.length} within range${outside.length ? `; soft differences:\n  ${outside.join('\n  ')}` : ''}`,
    );
    expect(MEMORY_RANGES.length).toBeGreaterThan(0);
  });
});
