import { describe, expect, it } from '@jest/globals';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

const SRC = import.meta.dirname;

/** Run-time (non-type) imports between top-level folders of src/, e.g. places → ecoregions. */
function folderImports(): Map<string, Set<string>> {
  const edges = new Map<string, Set<string>>();
  const files = readdirSync(SRC, { recursive: true, encoding: 'utf8' }).filter(
    (f) => f.endsWith('.ts') && !f.endsWith('.spec.ts'),
  );
  for (const file of files) {
    const from = file.split(path.sep)[0];
    const text = readFileSync(path.join(SRC, file), 'utf8');
    // `import type {…}` vanishes at run time; `import { type X }` mixed with values does not.
    for (const m of text.matchAll(/^import (?!type )[^;]*?from '(\.{1,2}\/[^']+)';/gms)) {
      const target = path.relative(SRC, path.resolve(path.dirname(path.join(SRC, file)), m[1])).split(path.sep)[0];
      if (target !== from && !target.endsWith('.js')) {
        if (!edges.has(from)) edges.set(from, new Set());
        edges.get(from)!.add(target);
      }
    }
  }
  return edges;
}

describe('module boundaries (run-time imports between src/ folders)', () => {
  const edges = folderImports();
  const imports = (a: string, b: string) => edges.get(a)?.has(b) ?? false;

  it('has no two folders importing each other', () => {
    const pairs = [...edges].flatMap(([a, targets]) =>
      [...targets].filter((b) => a < b && imports(b, a)).map((b) => `${a} <-> ${b}`),
    );
    expect(pairs).toEqual([]);
  });

  it('keeps ecoregions and places apart, and users and groups entities apart', () => {
    expect(imports('ecoregions', 'places')).toBe(false);
    expect(imports('places', 'geometry')).toBe(true);
    expect(imports('ecoregions', 'geometry')).toBe(true);
    expect(imports('users', 'groups')).toBe(false);
  });
});
