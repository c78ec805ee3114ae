import type { WordLocale } from '../vocabulary/locale/vocabulary.js';

/**
 * CSV cells that are safe to open in a spreadsheet.
 *
 * Spreadsheet programs run a cell as a formula when its text starts with `=`, `+`, `-` or `@` (and some
 * when it starts with a tab or carriage return). The OWASP "CSV Injection" guidance is to neutralise such
 * cells on export by putting a single quote in front, and to refuse them on import. A plain number such as
 * `-3.5` is left alone: it is a value, not a formula, in every program.
 */
const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^[+-]?\d+(\.\d+)?$/;

/** True when a spreadsheet would run this text as a formula. */
export function startsLikeFormula(text: string): boolean {
  return FORMULA_START.test(text) && !PLAIN_NUMBER.test(text);
}

/**
 * One RFC 4180 field: a formula-like text gets a leading `'`, then the field is quoted when it holds a
 * comma, quote or line break, with quotes doubled.
 */
export function csvField(value: string | number | null | undefined): string {
  const raw = value === null || value === undefined ? '' : String(value);
  const text = startsLikeFormula(raw) ? `'${raw}` : raw;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Why an imported cell is refused (in `locale`), or null when it is fine. */
export function formulaCellProblem(cell: string, locale: WordLocale = 'en'): string | null {
  const text = cell.replace(/^ +/, '');
  if (!startsLikeFormula(text)) return null;
  const first = text[0];
  if (locale === 'es') {
    const shown = first === '\t' ? 'un tabulador' : first === '\r' ? 'un salto de línea' : `"${first}"`;
    return `empieza con ${shown}, y las hojas de cálculo lo ejecutan como fórmula; quítalo`;
  }
  const shown = first === '\t' ? 'a tab' : first === '\r' ? 'a line break' : `"${first}"`;
  return `starts with ${shown}, which spreadsheet programs run as a formula; remove it`;
}
