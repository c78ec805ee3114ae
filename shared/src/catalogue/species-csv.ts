import type { z } from 'zod';
import { formulaCellProblem } from '../csv/csv-cell.js';
import type { CsvRowError } from '../types/species-query.js';
import { type Species, speciesSchema, type TreatmentStep } from '../types/species.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import { schemaSentenceIn, zodIssueWordsFor } from '../vocabulary/locale/zod-issue-words.js';

/**
 * The catalogue as CSV: one row per species, lists joined with ";", nested facts in their own
 * columns, and the few deeply nested parts (cautions, sources, reconciliations) as JSON cells.
 * Export and import use the same columns, so an exported file imports unchanged.
 */
export const SPECIES_CSV_COLUMNS = [
  'slug',
  'scientificName',
  'usdaSymbol',
  'family',
  'commonNames',
  'synonyms',
  'growthForm',
  'lifespan',
  'heightMinCm',
  'heightMaxCm',
  'spreadMinCm',
  'spreadMaxCm',
  'bloomMonths',
  'flowerColours',
  'sun',
  'moisture',
  'sunOptimum',
  'moistureOptimum',
  'wetlandIndicator',
  'needsAcidSoil',
  'soilTextures',
  'nativeStates',
  'ecoregions',
  'habitats',
  'lepidopteraGenusCount',
  'monarchHost',
  'pollinators',
  'birds',
  'specialistBees',
  'spreadHabit',
  'selfSows',
  'commercialAvailability',
  'protectedIn',
  'deerResistance',
  'treatments',
  'needsLight',
  'sowingDepthMm',
  'seedsPerPound',
  'germinationRatePct',
  'methods',
  'tags',
  'cautions',
  'sources',
  'reconciliations',
] as const;
export type SpeciesCsvColumn = (typeof SPECIES_CSV_COLUMNS)[number];
export type SpeciesCsvRow = Record<SpeciesCsvColumn, string>;

const list = (v: readonly (string | number)[]) => v.join(';');
const treatmentText = (t: TreatmentStep) => (t.days ? `${t.kind}:${t.days}` : t.kind) + (t.note ? `:${t.note}` : '');

/**
 * Treatments as `kind:days:note;…` a person can edit in a spreadsheet — unless that text would not read
 * back the same (a note with ";", a note that is only digits, spaces at an end); then the steps are written
 * as JSON, like the cautions column, so an export imported again changes nothing.
 */
function treatmentsCell(steps: readonly TreatmentStep[]): string {
  const text = steps.map(treatmentText).join(';');
  const readBack = parseTreatmentsCell(text);
  return JSON.stringify(readBack) === JSON.stringify(steps.map(plainStep)) ? text : JSON.stringify(steps);
}
const plainStep = (t: TreatmentStep) => ({
  kind: t.kind,
  ...(t.days ? { days: t.days } : {}),
  ...(t.note ? { note: t.note } : {}),
});

export function speciesToCsvRow(s: Species): SpeciesCsvRow {
  return {
    slug: s.slug,
    scientificName: s.scientificName,
    usdaSymbol: s.usdaSymbol,
    family: s.family,
    commonNames: list(s.commonNames),
    synonyms: list(s.synonyms),
    growthForm: s.growthForm,
    lifespan: s.lifespan,
    heightMinCm: String(s.heightCm.min),
    heightMaxCm: String(s.heightCm.max),
    spreadMinCm: String(s.spreadCm.min),
    spreadMaxCm: String(s.spreadCm.max),
    bloomMonths: list(s.bloomMonths),
    flowerColours: list(s.flowerColours),
    sun: list(s.sun),
    moisture: list(s.moisture),
    sunOptimum: list(s.sunOptimum),
    moistureOptimum: list(s.moistureOptimum),
    wetlandIndicator: s.wetlandIndicator ?? '',
    needsAcidSoil: String(s.needsAcidSoil),
    soilTextures: list(s.soilTextures),
    nativeStates: list(s.nativeStates),
    ecoregions: list(s.ecoregions),
    habitats: list(s.habitats),
    lepidopteraGenusCount: s.wildlife.lepidopteraGenusCount === null ? '' : String(s.wildlife.lepidopteraGenusCount),
    monarchHost: String(s.wildlife.monarchHost),
    pollinators: s.wildlife.pollinators,
    birds: s.wildlife.birds ?? '',
    specialistBees: list(s.wildlife.specialistBees),
    spreadHabit: s.spreadHabit,
    selfSows: String(s.selfSows),
    commercialAvailability: s.commercialAvailability ?? '',
    protectedIn: list(s.protectedIn),
    deerResistance: s.deerResistance,
    treatments: treatmentsCell(s.germination.treatments),
    needsLight: String(s.germination.needsLight),
    sowingDepthMm: String(s.germination.sowingDepthMm),
    seedsPerPound: s.germination.seedsPerPound === null ? '' : String(s.germination.seedsPerPound),
    germinationRatePct: String(s.germination.germinationRatePct),
    methods: list(s.germination.methods),
    tags: list(s.tags),
    cautions: JSON.stringify(s.cautions),
    sources: JSON.stringify(s.sources),
    reconciliations: JSON.stringify(s.reconciliations),
  };
}

const split = (v: string | undefined) =>
  (v ?? '')
    .split(';')
    .map((x) => x.trim())
    .filter(Boolean);
/** A number cell; blank and junk stay visible to the schema as NaN/undefined so it names the field. */
const num = (v: string | undefined) => (v === undefined || v.trim() === '' ? undefined : Number(v));
const bool = (v: string | undefined) => (v === 'true' ? true : v === 'false' ? false : v);

function parseTreatment(text: string): unknown {
  const [kind, second, ...rest] = text.split(':');
  const days = second !== undefined && /^\d+$/.test(second) ? Number(second) : undefined;
  const note = days === undefined ? [second, ...rest].filter(Boolean).join(':') : rest.join(':');
  return { kind, ...(days !== undefined ? { days } : {}), ...(note ? { note } : {}) };
}

/** A treatments cell: JSON when it starts with "[" (see treatmentsCell), otherwise `kind:days:note;…`. */
function parseTreatmentsCell(cell: string | undefined): unknown {
  const trimmed = (cell ?? '').trim();
  if (trimmed.startsWith('[')) {
    try {
      return JSON.parse(trimmed);
    } catch {
      return trimmed; // the schema names the treatments column
    }
  }
  return split(trimmed).map(parseTreatment);
}

/**
 * A schema issue in words a curator acts on: string lengths as "Must be at least 10 characters" (the
 * wording the web's forms translate), and for an entry of a JSON list (cautions, notes) which entry and
 * part: "entry 4, text: Must be at least 10 characters".
 */
function issueMessage(issue: z.core.$ZodIssue, locale: WordLocale): string {
  let message = schemaSentenceIn(locale, issue.message);
  if (locale === 'en' && issue.code === 'too_small' && issue.origin === 'string')
    message = `Must be at least ${issue.minimum} characters`;
  if (locale === 'en' && issue.code === 'too_big' && issue.origin === 'string')
    message = `Must be at most ${issue.maximum} characters`;
  const at = issue.path.findIndex((p) => typeof p === 'number');
  const listed = at > 0 && ['cautions', 'reconciliations'].includes(String(issue.path[0]));
  if (!listed) return message;
  const part = issue.path.slice(at + 1).join('.');
  const entry = locale === 'es' ? 'entrada' : 'entry';
  return `${entry} ${Number(issue.path[at]) + 1}${part ? `, ${part}` : ''}: ${message}`;
}

/** Maps a schema path back to the CSV column a person would fix. */
const PATH_TO_COLUMN: Record<string, SpeciesCsvColumn> = {
  'heightCm.min': 'heightMinCm',
  'heightCm.max': 'heightMaxCm',
  heightCm: 'heightMaxCm',
  'spreadCm.min': 'spreadMinCm',
  'spreadCm.max': 'spreadMaxCm',
  spreadCm: 'spreadMaxCm',
  'wildlife.lepidopteraGenusCount': 'lepidopteraGenusCount',
  'wildlife.monarchHost': 'monarchHost',
  'wildlife.pollinators': 'pollinators',
  'wildlife.birds': 'birds',
  'wildlife.specialistBees': 'specialistBees',
  'germination.treatments': 'treatments',
  'germination.needsLight': 'needsLight',
  'germination.sowingDepthMm': 'sowingDepthMm',
  'germination.seedsPerPound': 'seedsPerPound',
  'germination.germinationRatePct': 'germinationRatePct',
  'germination.methods': 'methods',
};

/** The CSV column (and editor field) a person fixes for a problem at this schema path. */
export function columnFor(path: readonly PropertyKey[]): string {
  const named = path.filter((p) => typeof p === 'string').join('.');
  for (let n = path.length; n > 0; n--) {
    const key = path
      .slice(0, n)
      .filter((p) => typeof p === 'string')
      .join('.');
    if (PATH_TO_COLUMN[key]) return PATH_TO_COLUMN[key];
  }
  return named.split('.')[0] || 'row';
}

/**
 * One CSV row → a checked species record, or the row's errors (line number, column, reason in
 * `locale`). `line` is the row's line in the file, the header being line 1.
 */
export function csvRowToSpecies(
  row: Partial<Record<string, string>>,
  line: number,
  locale: WordLocale = 'en',
): { species?: Species; errors: CsvRowError[] } {
  const errors: CsvRowError[] = [];
  // Refused before anything else: a formula-like cell is never stored, whatever the column.
  for (const column of SPECIES_CSV_COLUMNS) {
    const problem = formulaCellProblem(row[column] ?? '', locale);
    if (problem) errors.push({ row: line, field: column, message: problem });
  }
  const json = (column: SpeciesCsvColumn, fallback: unknown) => {
    const cell = row[column];
    if (cell === undefined || cell.trim() === '') return fallback;
    try {
      return JSON.parse(cell);
    } catch {
      errors.push({ row: line, field: column, message: locale === 'es' ? 'no es JSON válido' : 'is not valid JSON' });
      return fallback;
    }
  };
  const candidate = {
    slug: row.slug,
    scientificName: row.scientificName,
    usdaSymbol: row.usdaSymbol,
    family: row.family,
    commonNames: split(row.commonNames),
    synonyms: split(row.synonyms),
    growthForm: row.growthForm,
    lifespan: row.lifespan,
    heightCm: { min: num(row.heightMinCm), max: num(row.heightMaxCm) },
    spreadCm: { min: num(row.spreadMinCm), max: num(row.spreadMaxCm) },
    bloomMonths: split(row.bloomMonths).map(Number),
    flowerColours: split(row.flowerColours),
    sun: split(row.sun),
    moisture: split(row.moisture),
    soilTextures: split(row.soilTextures),
    nativeStates: split(row.nativeStates),
    habitats: split(row.habitats),
    sunOptimum: split(row.sunOptimum),
    moistureOptimum: split(row.moistureOptimum),
    ecoregions: split(row.ecoregions),
    // A blank cell is "not known" for the two nullable facts.
    wetlandIndicator: row.wetlandIndicator?.trim() || null,
    needsAcidSoil: bool(row.needsAcidSoil),
    selfSows: bool(row.selfSows),
    commercialAvailability: row.commercialAvailability?.trim() || null,
    protectedIn: split(row.protectedIn),
    wildlife: {
      lepidopteraGenusCount: row.lepidopteraGenusCount?.trim() ? Number(row.lepidopteraGenusCount) : null,
      monarchHost: bool(row.monarchHost),
      pollinators: row.pollinators,
      ...(row.birds?.trim() ? { birds: row.birds } : {}),
      specialistBees: split(row.specialistBees),
    },
    spreadHabit: row.spreadHabit,
    deerResistance: row.deerResistance,
    germination: {
      treatments: parseTreatmentsCell(row.treatments),
      needsLight: bool(row.needsLight),
      sowingDepthMm: num(row.sowingDepthMm),
      seedsPerPound: row.seedsPerPound?.trim() ? Number(row.seedsPerPound) : null,
      germinationRatePct: num(row.germinationRatePct),
      methods: split(row.methods),
    },
    tags: split(row.tags),
    cautions: json('cautions', []),
    sources: json('sources', {}),
    reconciliations: json('reconciliations', []),
  };
  const words = zodIssueWordsFor(locale);
  const parsed = speciesSchema.safeParse(candidate, words ? { error: words } : undefined);
  if (!parsed.success) {
    for (const issue of parsed.error.issues)
      errors.push({ row: line, field: columnFor(issue.path), message: issueMessage(issue, locale) });
  }
  return errors.length > 0 || !parsed.success ? { errors } : { species: parsed.data, errors };
}
