import { z } from 'zod';
import { SOURCED_FIELDS, type SourcedField, type Species } from '../types/species.js';
import {
  columnFor,
  csvRowToSpecies,
  SPECIES_CSV_COLUMNS,
  type SpeciesCsvColumn,
  speciesToCsvRow,
} from './species-csv.js';

/**
 * The curator's species editor as text fields. The form reuses the CSV columns (so a value typed on
 * screen reads exactly as the same cell in an imported file) except the sources cell: each sourced
 * fact gets its own field holding one key of the sources registry. The record is checked by
 * `speciesSchema` through `csvRowToSpecies`, so the editor, the import and the API say the same thing.
 */
export type SpeciesFormTextColumn = Exclude<SpeciesCsvColumn, 'sources'>;
export type SpeciesFormSourceField = `source:${SourcedField}`;
export type SpeciesFormField = SpeciesFormTextColumn | SpeciesFormSourceField;
export type SpeciesFormValues = Record<SpeciesFormField, string>;

export const SPECIES_FORM_TEXT_COLUMNS = SPECIES_CSV_COLUMNS.filter((c): c is SpeciesFormTextColumn => c !== 'sources');
/** The form field that holds the source of one sourced fact. */
export const sourceFieldOf = (field: SourcedField): SpeciesFormSourceField => `source:${field}`;

const MAX_CELL = 20_000;
const textShape = Object.fromEntries([
  ...SPECIES_FORM_TEXT_COLUMNS.map((c) => [c, z.string().max(MAX_CELL)]),
  ...SOURCED_FIELDS.map((f) => [sourceFieldOf(f), z.string().max(120)]),
]) as Record<SpeciesFormField, z.ZodString>;

/** The form's values → the record, or one issue per form field the person must fix. */
export function speciesFromFormValues(
  values: SpeciesFormValues,
): { species: Species; errors: [] } | { species?: undefined; errors: { field: SpeciesFormField; message: string }[] } {
  const errors: { field: SpeciesFormField; message: string }[] = [];
  const sources: Partial<Record<SourcedField, string>> = {};
  for (const f of SOURCED_FIELDS) {
    const key = values[sourceFieldOf(f)].trim();
    if (key) sources[f] = key;
    else errors.push({ field: sourceFieldOf(f), message: 'choose where this fact comes from, or "from memory"' });
  }
  const row: Partial<Record<string, string>> = { ...values, sources: JSON.stringify(sources) };
  const parsed = csvRowToSpecies(row, 1);
  for (const e of parsed.errors) {
    // The sources cell was built here, so its problems are already listed per fact above.
    if (e.field === 'sources') continue;
    const field = (SPECIES_FORM_TEXT_COLUMNS as readonly string[]).includes(e.field)
      ? (e.field as SpeciesFormTextColumn)
      : 'slug';
    if (!errors.some((x) => x.field === field)) errors.push({ field, message: e.message });
  }
  if (errors.length > 0 || !parsed.species) return { errors };
  return { species: parsed.species, errors: [] };
}

/**
 * The editor's schema: text fields in, a checked species record out. Issues carry the form field's
 * name as their path, so `use-schema-form` shows each one beside its input.
 */
export const speciesFormSchema = z
  .object(textShape)
  .strict()
  .transform((values, ctx) => {
    const result = speciesFromFormValues(values);
    if (!result.species) {
      for (const e of result.errors) ctx.addIssue({ code: 'custom', path: [e.field], message: e.message });
      return z.NEVER;
    }
    return result.species;
  });

/** A record as the editor's text fields (the same text its CSV row holds). */
export function speciesToFormValues(s: Species): SpeciesFormValues {
  const { sources: _sources, ...row } = speciesToCsvRow(s);
  const sources = s.sources as Partial<Record<SourcedField, string>>;
  return {
    ...row,
    ...(Object.fromEntries(SOURCED_FIELDS.map((f) => [sourceFieldOf(f), sources[f] ?? ''])) as Record<
      SpeciesFormSourceField,
      string
    >),
  };
}

/** A blank form for a new species: empty lists, "false" for yes/no facts, no sources chosen yet. */
export function emptySpeciesFormValues(): SpeciesFormValues {
  const blank = Object.fromEntries(
    [...SPECIES_FORM_TEXT_COLUMNS, ...SOURCED_FIELDS.map(sourceFieldOf)].map((k) => [k, '']),
  ) as SpeciesFormValues;
  return {
    ...blank,
    needsAcidSoil: 'false',
    monarchHost: 'false',
    selfSows: 'false',
    needsLight: 'false',
    cautions: '[]',
    reconciliations: '[]',
  };
}

/** Whole numbers from a text list such as "6;7;8" (what the bloom strip preview draws), ignoring junk. */
export function monthsFromText(text: string): number[] {
  return text
    .split(';')
    .map((x) => Number(x.trim()))
    .filter((m) => Number.isInteger(m) && m >= 1 && m <= 12);
}

/**
 * The form field for a field the API's 400 names by its record path ("heightCm.min",
 * "sources.heightCm"), so a refusal from the server lands beside the same input; null when the form
 * has no such field.
 */
export function formFieldForApiPath(path: string): SpeciesFormField | null {
  const parts = path.split('.');
  if (parts[0] === 'sources') {
    const fact = parts.slice(1).join('.');
    return (SOURCED_FIELDS as readonly string[]).includes(fact) ? sourceFieldOf(fact as SourcedField) : null;
  }
  const column = columnFor(parts);
  return (SPECIES_FORM_TEXT_COLUMNS as readonly string[]).includes(column) ? (column as SpeciesFormTextColumn) : null;
}
