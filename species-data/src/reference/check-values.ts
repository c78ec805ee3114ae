import { readFileSync } from 'node:fs';
import { referenceFile } from './reference-dir.js';

/** The rows of CHECK-VALUES.md's tables, as cells, so a test can show the row it relies on exists. */
export function checkValueRows(): string[][] {
  return readFileSync(referenceFile('CHECK-VALUES.md'), 'utf8')
    .split('\n')
    .filter((l) => l.startsWith('| ') && !l.startsWith('|---'))
    .map((l) =>
      l
        .slice(1, -1)
        .split('|')
        .map((c) => c.trim()),
    );
}

/** Finds the one row whose first cell starts with `plant` and that mentions every word in `mentions`. */
export function findCheckValueRow(rows: string[][], plant: string, mentions: string[]): string[] | undefined {
  return rows.find((r) => r[0].startsWith(plant) && mentions.every((m) => r.join(' | ').includes(m)));
}
