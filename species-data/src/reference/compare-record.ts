import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import type { ReferenceCheck, ReferenceCheckField, ReferenceComparison, Species } from '@homeground/shared';
import type { FamilyRealignment } from '../catalogue.js';
import { referenceDir, referenceFile } from './reference-dir.js';
import { loadSylvanSeedsPercentages, SYLVANSEEDS_FILE } from './sylvanseeds.js';
import {
  type LepidopteraGenusRow,
  loadLepidopteraByGenus,
  loadUsdaCharacteristics,
  loadUsdaDistribution,
  loadUsdaTaxa,
  type UsdaDistribution,
  type UsdaTaxon,
} from './usda-plants.js';

const TAXA = 'usda_plants_taxa.csv';
const DISTRIBUTION = 'usda_plants_state_distribution.csv';
const CHARACTERISTICS = 'usda_plants_characteristics.csv';
const LEPIDOPTERA = 'tallamy_shropshire_2009_lepidoptera_by_plant_genus.csv';

/** The files a comparison reads, all from the one reference folder. */
export const REFERENCE_COMPARISON_FILES = [TAXA, DISTRIBUTION, CHARACTERISTICS, LEPIDOPTERA, SYLVANSEEDS_FILE];

/** The reference tables, read once, as a comparison needs them. */
export interface ReferenceTables {
  taxaBySymbol: Map<string, UsdaTaxon>;
  distribution: Map<string, UsdaDistribution>;
  characteristics: Map<string, Record<string, string>>;
  lepidoptera: Map<string, LepidopteraGenusRow>;
  germinationTrials: Map<string, number[]>;
}

/** What the catalogue itself says about the reference: documented family realignments and older genus names. */
export interface CatalogueNotes {
  realignments: FamilyRealignment[];
  genusAliases: { genus: string; listedAs: string }[];
}

/** Reference files missing from `dir` (empty when a comparison can run). */
export function missingReferenceFiles(dir: string = referenceDir()): string[] {
  return REFERENCE_COMPARISON_FILES.filter((f) => !existsSync(referenceFile(f, dir)));
}

/** Reads every table a comparison needs from `dir`; call only when `missingReferenceFiles(dir)` is empty. */
export function loadReferenceTables(dir?: string): ReferenceTables {
  return {
    taxaBySymbol: new Map(loadUsdaTaxa(dir).map((t) => [t.symbol, t])),
    distribution: loadUsdaDistribution(dir),
    characteristics: loadUsdaCharacteristics(dir),
    lepidoptera: loadLepidopteraByGenus(dir),
    germinationTrials: loadSylvanSeedsPercentages(dir),
  };
}

/** The older genus names the host-plant table uses (`species-data/genus-aliases.json`). */
export function readGenusAliases(dataDir: string): CatalogueNotes['genusAliases'] {
  return JSON.parse(readFileSync(path.join(dataDir, 'genus-aliases.json'), 'utf8'));
}

/** USDA PLANTS `bloom_period` seasons as months (northern temperate reading; from memory, as the tests use it). */
export const USDA_BLOOM_SEASON_MONTHS: Record<string, number[]> = {
  'Late Winter': [2, 3],
  Winter: [12, 1, 2],
  'Early Spring': [3, 4],
  'Mid Spring': [4, 5],
  'Late Spring': [5, 6],
  Spring: [3, 4, 5, 6],
  'Early Summer': [6, 7],
  'Mid Summer': [7],
  'Late Summer': [8, 9],
  Summer: [6, 7, 8],
  Fall: [9, 10],
};

const list = (v: readonly (string | number)[]) => (v.length ? v.join(', ') : '—');
const blank = (v: string | undefined) => (v ?? '').trim();

/**
 * One record beside the reference data, field by field. The rules are the catalogue's own reference
 * checks (species-data's reference tests run this same function); where a rule allows slack it says
 * how much, and fields USDA words differently (shade, moisture, seeds per pound) are shown, not judged.
 */
export function compareWithReference(s: Species, ref: ReferenceTables, notes: CatalogueNotes): ReferenceComparison {
  const checks: ReferenceCheck[] = [];
  const noteOn = (field: ReferenceCheckField) => s.reconciliations.find((r) => r.field === field)?.note ?? null;
  const add = (c: Omit<ReferenceCheck, 'reconciliation'>) =>
    checks.push({ ...c, reconciliation: c.verdict === 'shown' ? null : noteOn(c.field) });
  const genus = s.scientificName.split(' ')[0];
  const taxon = ref.taxaBySymbol.get(s.usdaSymbol);
  const usda = { file: TAXA, source: 'usda-plants' };

  add({
    ...usda,
    field: 'usdaSymbol',
    record: s.usdaSymbol,
    reference: taxon ? `${taxon.symbol}: ${taxon.scientificNameWithAuthor}` : 'not an accepted taxon',
    verdict: taxon ? 'agrees' : 'differs',
    rule: 'the symbol is an accepted USDA PLANTS taxon',
  });
  add({
    ...usda,
    field: 'scientificName',
    record: s.scientificName,
    reference: taxon?.name ?? '—',
    verdict: !taxon ? 'no-reference' : taxon.name === s.scientificName ? 'agrees' : 'differs',
    rule: 'the accepted name under that symbol, without its authority',
  });
  const realigned =
    !!taxon &&
    notes.realignments.some((r) => r.usdaFamily === taxon.family && r.family === s.family && r.genera.includes(genus));
  add({
    ...usda,
    field: 'family',
    record: s.family,
    reference: taxon?.family ?? '—',
    verdict: !taxon ? 'no-reference' : taxon.family === s.family || realigned ? 'agrees' : 'differs',
    rule: realigned
      ? 'USDA keeps an older family; this genus is moved by a documented APG IV / PPG I realignment'
      : 'the same family as USDA PLANTS, or a documented APG IV / PPG I realignment',
  });

  const native = ref.distribution.get(s.usdaSymbol)?.nativeIn ?? [];
  const extra = s.nativeStates.filter((st) => !native.includes(st));
  add({
    file: DISTRIBUTION,
    source: 'usda-plants',
    field: 'nativeStates',
    record: list(s.nativeStates),
    reference: list(native),
    verdict: extra.length === 0 ? 'agrees' : 'differs',
    rule:
      extra.length === 0
        ? 'every state the record names is one USDA lists the species as native in'
        : `USDA does not list it as native in ${extra.join(', ')}`,
  });

  const c = ref.characteristics.get(s.usdaSymbol);
  const chars = { file: CHARACTERISTICS, source: 'usda-plants-characteristics' };
  const feet = Number(blank(c?.height_mature_feet) || NaN);
  const cm = feet * 30.48;
  add({
    ...chars,
    field: 'heightCm',
    record: `${s.heightCm.min}–${s.heightCm.max} cm`,
    reference: Number.isFinite(feet) ? `${feet} ft (${Math.round(cm)} cm) at maturity` : '—',
    verdict: !Number.isFinite(feet)
      ? 'no-reference'
      : cm >= s.heightCm.min * 0.8 && cm <= s.heightCm.max * 1.2
        ? 'agrees'
        : 'differs',
    rule: "USDA's mature height within the record's range widened by a fifth each way",
  });
  const season = blank(c?.bloom_period);
  const seasonMonths = USDA_BLOOM_SEASON_MONTHS[season];
  add({
    ...chars,
    field: 'bloomMonths',
    record: list(s.bloomMonths),
    reference: season ? `${season}${seasonMonths ? ` (months ${seasonMonths.join(', ')})` : ''}` : '—',
    verdict:
      !seasonMonths || s.bloomMonths.length === 0
        ? 'no-reference'
        : s.bloomMonths.some((m) => seasonMonths.includes(m))
          ? 'agrees'
          : 'differs',
    rule: "at least one of the record's months falls in USDA's bloom season (seasons read as months from memory)",
  });
  add({
    ...chars,
    field: 'sun',
    record: list(s.sun),
    reference: blank(c?.shade_tolerance) ? `shade tolerance: ${blank(c?.shade_tolerance)}` : '—',
    verdict: blank(c?.shade_tolerance) ? 'shown' : 'no-reference',
    rule: 'USDA rates shade tolerance, not sun; set beside the record for reading',
  });
  const moisture = [
    blank(c?.moisture_use) && `moisture use: ${blank(c?.moisture_use)}`,
    blank(c?.drought_tolerance) && `drought tolerance: ${blank(c?.drought_tolerance)}`,
  ].filter(Boolean);
  add({
    ...chars,
    field: 'moisture',
    record: list(s.moisture),
    reference: moisture.length ? moisture.join('; ') : '—',
    verdict: moisture.length ? 'shown' : 'no-reference',
    rule: 'USDA rates water use and drought tolerance, not soil moisture; set beside the record for reading',
  });
  const seeds = blank(c?.seed_per_pound);
  add({
    ...chars,
    field: 'germination.seedsPerPound',
    record: s.germination.seedsPerPound === null ? '—' : String(s.germination.seedsPerPound),
    reference: seeds || '—',
    verdict: seeds ? 'shown' : 'no-reference',
    rule: 'seed lots differ widely in size; set beside the record for reading',
  });

  const listed = (g: string) => {
    const row = ref.lepidoptera.get(g);
    return row && Number.isFinite(row.totalLepidoptera) ? row.totalLepidoptera : undefined;
  };
  const alias = notes.genusAliases.find((a) => a.genus === genus);
  const own = listed(genus);
  const older = alias ? listed(alias.listedAs) : undefined;
  const expected = own ?? older ?? null;
  const count = s.wildlife.lepidopteraGenusCount;
  add({
    file: LEPIDOPTERA,
    source: 'tallamy-shropshire-2009',
    field: 'wildlife.lepidopteraGenusCount',
    record: count === null ? 'genus not listed' : String(count),
    reference:
      own !== undefined
        ? `${genus}: ${own}`
        : older !== undefined
          ? `${genus} as ${alias!.listedAs}: ${older}`
          : 'genus not listed',
    verdict: count === expected ? 'agrees' : 'differs',
    rule: "the genus's own row, else the row of the older genus name it was listed under, else not listed",
  });

  const trials = ref.germinationTrials.get(s.scientificName);
  if (trials?.length) {
    const lo = Math.min(...trials);
    const hi = Math.max(...trials);
    const rate = s.germination.germinationRatePct;
    add({
      file: SYLVANSEEDS_FILE,
      source: 'sylvanseeds-2021',
      field: 'germination.germinationRatePct',
      record: `${rate} %`,
      reference: `${Math.round(lo)}–${Math.round(hi)} % in ${trials.length} laboratory trials`,
      verdict: rate >= lo * 0.8 && rate <= hi * 1.2 ? 'agrees' : 'differs',
      rule: "the record's rate within the trials' range widened by a fifth each way",
    });
  }

  return { slug: s.slug, scientificName: s.scientificName, commonName: s.commonNames[0] ?? s.slug, checks };
}
