import { type Season, type TargetsRequest, targetsRequestSchema } from '@homeground/shared';
import { asSentence } from '../../../lib/forms/field-errors.js';

/** One row of the targets table as the organiser types it: numbers stay text until saved. */
export interface TargetRow {
  slug: string;
  commonName: string;
  scientificName: string;
  targetPlants: string;
  /** Empty: the species record's germination rate is used. */
  germinationRatePct: string;
}

export type TargetField = 'slug' | 'targetPlants' | 'germinationRatePct';
/** Messages per row index, per field, worded to sit beside that input. */
export type RowErrors = Record<number, Partial<Record<TargetField, string>>>;

const TARGET_FIELDS: readonly string[] = ['slug', 'targetPlants', 'germinationRatePct'];

export function rowsFromSeason(targets: Season['targets']): TargetRow[] {
  return targets.map((t) => ({
    slug: t.slug,
    commonName: t.commonName,
    scientificName: t.scientificName,
    targetPlants: String(t.targetPlants),
    germinationRatePct: t.germinationRatePct === undefined ? '' : String(t.germinationRatePct),
  }));
}

/** Text to a number for the schema; anything not a plain number stays NaN so the schema rejects it. */
function numberOf(text: string): number {
  const trimmed = text.trim();
  return /^\d+(\.\d+)?$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}

/** A zod or API field path ("targets.3.targetPlants" or ['targets', 3, 'targetPlants']) to row and field. */
function rowField(path: readonly (string | number)[]): { row: number; field: TargetField } | null {
  const [list, index, field] = path;
  if (list !== 'targets' || !TARGET_FIELDS.includes(String(field))) return null;
  const row = Number(index);
  return Number.isInteger(row) ? { row, field: field as TargetField } : null;
}

/** Adds one message beside a row's field, keeping the first per field. */
function addError(errors: RowErrors, row: number, field: TargetField, message: string) {
  const at = (errors[row] ??= {});
  at[field] ??= asSentence(message === 'Invalid input: expected number, received NaN' ? 'must be a number' : message);
}

/**
 * Checks the rows with the shared targets schema (the API checks the same body), giving either the
 * request body or the messages per row.
 */
export function targetsBody(rows: readonly TargetRow[]): { body: TargetsRequest } | { errors: RowErrors } {
  const candidate = {
    targets: rows.map((r) => ({
      slug: r.slug,
      targetPlants: numberOf(r.targetPlants),
      ...(r.germinationRatePct.trim() === '' ? {} : { germinationRatePct: numberOf(r.germinationRatePct) }),
    })),
  };
  const parsed = targetsRequestSchema.safeParse(candidate);
  if (parsed.success) return { body: parsed.data };
  const errors: RowErrors = {};
  for (const issue of parsed.error.issues) {
    const at = rowField(issue.path as (string | number)[]);
    if (at) addError(errors, at.row, at.field, issue.message);
  }
  return { errors };
}

/**
 * A 400's `fields` ("targets.2.targetPlants") beside their rows; fields that name no row are said
 * above the table instead.
 */
export function rowErrorsFromApi(fields: readonly { field: string; message: string }[]): {
  errors: RowErrors;
  loose: string[];
} {
  const errors: RowErrors = {};
  const loose: string[] = [];
  for (const f of fields) {
    const at = rowField(f.field.split('.'));
    if (at) addError(errors, at.row, at.field, f.message);
    else loose.push(`${f.field}: ${f.message}`);
  }
  return { errors, loose };
}
