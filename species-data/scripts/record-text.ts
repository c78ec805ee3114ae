/**
 * Curator scripts change one key of a species file without reformatting the rest: the files are laid out
 * by hand (short arrays on one line, one caution per line), so a JSON.stringify round trip would churn
 * every file. These helpers find a key by its indentation and replace or insert its value text.
 */
import { readFileSync, readdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { DATA_DIR } from '../src/catalogue.js';

export const SPECIES_DIR = path.join(DATA_DIR, 'species');

export function speciesFiles(): string[] {
  return readdirSync(SPECIES_DIR)
    .filter((f) => f.endsWith('.json'))
    .sort()
    .map((f) => path.join(SPECIES_DIR, f));
}

/** Index just past the JSON value that starts at `start` (skipping leading spaces). */
function valueEnd(text: string, start: number): number {
  let i = start;
  while (text[i] === ' ') i++;
  const open = text[i];
  if (open === '[' || open === '{') {
    let depth = 0;
    let inString = false;
    for (; i < text.length; i++) {
      const c = text[i];
      if (inString) {
        if (c === '\\') i++;
        else if (c === '"') inString = false;
      } else if (c === '"') inString = true;
      else if (c === '[' || c === '{') depth++;
      else if (c === ']' || c === '}') {
        depth--;
        if (depth === 0) return i + 1;
      }
    }
    throw new Error('unbalanced JSON value');
  }
  if (open === '"') {
    for (i++; i < text.length; i++) {
      if (text[i] === '\\') i++;
      else if (text[i] === '"') return i + 1;
    }
    throw new Error('unterminated string');
  }
  const m = /^[^,\n}\]]+/.exec(text.slice(i));
  if (!m) throw new Error('no value');
  return i + m[0].trimEnd().length;
}

/** Where the key's value starts and ends, for a key at the given indentation (2 = top level, 4 = in sources). */
function findKey(text: string, key: string, indent: number, within?: [number, number]): [number, number] | undefined {
  const needle = `\n${' '.repeat(indent)}"${key}":`;
  const from = within?.[0] ?? 0;
  const at = text.indexOf(needle, from);
  if (at < 0 || (within && at > within[1])) return undefined;
  const start = at + needle.length;
  return [start, valueEnd(text, start)];
}

/**
 * Sets `key` to `valueText` (already JSON). An existing key keeps its place; a new one goes right after
 * `afterKey`. `inSources` works on the record's `sources` object instead of the top level.
 */
export function setKey(text: string, key: string, valueText: string, afterKey: string, inSources = false): string {
  const indent = inSources ? 4 : 2;
  const within = inSources ? findKey(text, 'sources', 2) : undefined;
  if (inSources && !within) throw new Error('no sources object');
  const existing = findKey(text, key, indent, within);
  if (existing) return text.slice(0, existing[0]) + ' ' + valueText + text.slice(existing[1]);
  const after = findKey(text, afterKey, indent, within);
  if (!after) throw new Error(`no key "${afterKey}" to insert "${key}" after`);
  // `"afterKey": value,⏎` becomes `"afterKey": value,⏎  "key": newValue,⏎`: the insert goes before
  // any comma that followed the value, so that comma now ends the new line.
  const end = after[1];
  return `${text.slice(0, end)},\n${' '.repeat(indent)}"${key}": ${valueText}${text.slice(end)}`;
}

/** Sets a source key for a field in the record's `sources`, after `afterField`. */
export function setSource(text: string, field: string, source: string, afterField: string): string {
  return setKey(text, field, JSON.stringify(source), afterField, true);
}

export function readRecordText(file: string): string {
  return readFileSync(file, 'utf8');
}

export function writeRecordText(file: string, text: string): void {
  JSON.parse(text); // never write a file that is not JSON
  writeFileSync(file, text);
}

/** One-line JSON for a short array or scalar, matching the files' hand layout (`["a", "b"]`). */
export function inline(value: unknown): string {
  return JSON.stringify(value)
    .replace(/","/g, '", "')
    .replace(/,(?=[0-9"[{])/g, ', ');
}
