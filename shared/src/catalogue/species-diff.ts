import type { Species } from '../types/species.js';

/** One fact that changed in a species record, as the history shows it. */
export interface FieldChange {
  /** The field's path, e.g. `heightCm`, `wildlife.monarchHost`, `germination.seedsPerPound`. */
  field: string;
  /** The value before, as JSON text; null when the field was absent (or the record new). */
  before: string | null;
  /** The value after, as JSON text; null when the field was removed. */
  after: string | null;
  /** The source the record gives for this field after the change, when it names one. */
  source: string | null;
}

/** Objects whose parts are compared one by one, so a history line says which part changed. */
const NESTED = new Set(['wildlife', 'germination']);

const text = (v: unknown): string | null => (v === undefined ? null : JSON.stringify(v));

/**
 * The field-by-field difference between two versions of a species record (before is null for a new
 * record). `sources` itself is not listed as a change: each changed field carries the source the new
 * record gives for it instead. Ordered by field name so the same edit always reads the same way.
 */
export function diffSpecies(before: Species | null, after: Species): FieldChange[] {
  const out: FieldChange[] = [];
  const sources = after.sources as Partial<Record<string, string>>;
  const sourceFor = (field: string) => sources[field.split('.')[0]] ?? null;
  const compare = (field: string, a: unknown, b: unknown) => {
    const x = text(a);
    const y = text(b);
    if (x !== y) out.push({ field, before: x, after: y, source: sourceFor(field) });
  };
  const keys = new Set([...Object.keys(before ?? {}), ...Object.keys(after)]);
  for (const key of [...keys].sort()) {
    if (key === 'sources') continue;
    const a = (before as Record<string, unknown> | null)?.[key];
    const b = (after as Record<string, unknown>)[key];
    if (NESTED.has(key) && a && b && typeof a === 'object' && typeof b === 'object') {
      const parts = new Set([...Object.keys(a), ...Object.keys(b)]);
      for (const part of [...parts].sort())
        compare(`${key}.${part}`, (a as Record<string, unknown>)[part], (b as Record<string, unknown>)[part]);
    } else compare(key, a, b);
  }
  return out;
}
