import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { schemaSentenceIn, zodIssueWordsFor } from './zod-issue-words.js';

const SHARED_SRC = fileURLToPath(new URL('../../', import.meta.url));

/** Every non-test source file of shared that builds zod schemas (imports zod), this table's own file aside. */
function schemaFiles(): string[] {
  return readdirSync(SHARED_SRC, { recursive: true, encoding: 'utf8' })
    .filter((f) => f.endsWith('.ts') && !f.endsWith('.test.ts') && !f.endsWith('zod-issue-words.ts'))
    .map((f) => path.join(SHARED_SRC, f))
    .filter((f) => /from 'zod'/.test(readFileSync(f, 'utf8')));
}

// A message is the string after `message:` / `error:`, or the last string argument of a zod check
// (`.min(3, '…')`, `.int('…')`, `.refine(fn, '…')`), as zod 4's docs show custom messages given.
const AFTER_KEY = /(?:message|error):\s*(['"`])((?:\\.|(?!\1)[^\\])*)\1/g;
const CHECK_ARG =
  /\.(?:int|min|max|regex|refine|length|nonnegative|positive|nonempty|gte|lte|gt|lt|multipleOf)\((?:[^'"`()\n]|\([^()\n]*\))*?(['"`])((?:\\.|(?!\1)[^\\])*)\1\s*,?\s*\)/g;

/** The schemas' own messages, a `${…}` in a template standing for a number ("must list at most 12 species"). */
function schemaMessages(): Map<string, string> {
  const found = new Map<string, string>();
  for (const file of schemaFiles()) {
    const text = readFileSync(file, 'utf8');
    for (const re of [AFTER_KEY, CHECK_ARG])
      for (const m of text.matchAll(re)) found.set(m[2].replace(/\$\{[^}]*\}/g, '12'), path.relative(SHARED_SRC, file));
  }
  return found;
}

// zod 4's issue kinds (too_small, too_big, invalid_type, invalid_value, invalid_format) as its docs list
// them; the Spanish is Homeground's own, in the schemas' "debe …" form so the field name can lead.
const spanish = (schema: z.ZodType, value: unknown) => {
  const error = zodIssueWordsFor('es');
  const result = schema.safeParse(value, error ? { error } : undefined);
  return result.success ? [] : result.error.issues.map((i) => [i.path.join('.'), i.message]);
};

describe('zod issue words', () => {
  it('says the common kinds in Spanish, keeping each path', () => {
    const schema = z.object({
      name: z.string().min(3),
      plants: z.number().int().max(500),
      method: z.enum(['indoor-lights', 'winter-sowing']),
      kinds: z.array(z.string()).min(1),
      email: z.email(),
      rows: z.array(z.object({ count: z.number() })),
    });
    expect(
      spanish(schema, { name: 'ab', plants: 501, method: 'sun', kinds: [], email: 'no', rows: [{ count: '1' }] }),
    ).toEqual([
      ['name', 'debe tener al menos 3 caracteres'],
      ['plants', 'debe ser 500 o menos'],
      ['method', 'debe ser uno de estos: indoor-lights, winter-sowing'],
      ['kinds', 'debe tener al menos 1 elemento'],
      ['email', 'debe ser una dirección de correo electrónico'],
      ['rows.0.count', 'debe ser un número'],
    ]);
    expect(spanish(z.object({ name: z.string() }), {})).toEqual([['name', 'es obligatorio']]);
  });

  it("leaves a schema's own message to the schema, and English to zod", () => {
    expect(spanish(z.string().min(3, 'must be at least 3 characters'), 'a')).toEqual([
      ['', 'must be at least 3 characters'],
    ]);
    expect(zodIssueWordsFor('en')).toBeUndefined();
  });

  it("says the schemas' common sentences in Spanish and any other as it came", () => {
    expect(schemaSentenceIn('es', 'must be at least 10 characters')).toBe('debe tener al menos 10 caracteres');
    expect(schemaSentenceIn('es', 'must be one of member, grower, organiser')).toBe(
      'debe ser uno de estos: member, grower, organiser',
    );
    expect(schemaSentenceIn('es', 'a sentence no schema says')).toBe('a sentence no schema says');
    expect(schemaSentenceIn('en', 'must not be empty')).toBe('must not be empty');
  });

  it('has a Spanish line for every message the schema files give, found by reading them', () => {
    const messages = schemaMessages();
    // The extraction itself must find the schemas' sentences, or the check below proves nothing.
    expect(messages.size).toBeGreaterThan(60);
    expect(messages.get('must be after the last frost')).toBe(path.join('types', 'season.ts'));
    expect(messages.get('must be a USPS code of the 48 states or DC')).toBe(path.join('types', 'ecoregion.ts'));
    const untranslated = [...messages].filter(([m]) => schemaSentenceIn('es', m) === m);
    expect(untranslated).toEqual([]);
    // English stays exactly as the schema wrote it.
    for (const m of messages.keys()) expect(schemaSentenceIn('en', m)).toBe(m);
  });

  it('says the less common sentences in plain Spanish, keeping numbers and names', () => {
    expect(schemaSentenceIn('es', 'must be after the last frost')).toBe('debe ser después de la última helada');
    expect(schemaSentenceIn('es', 'must be a USPS code of the 48 states or DC')).toBe(
      'debe ser el código USPS de uno de los 48 estados contiguos o de DC',
    );
    expect(schemaSentenceIn('es', '"monarda-fistulosa" is listed twice')).toBe('"monarda-fistulosa" aparece dos veces');
    expect(schemaSentenceIn('es', 'must list at most 60 species')).toBe('debe tener como máximo 60 especies');
    expect(schemaSentenceIn('es', 'must be 1–12')).toBe('debe estar entre 1 y 12');
    // The shared checks the API runs after parsing (season-dates.ts, batch-log.ts) use the same table.
    expect(schemaSentenceIn('es', 'must not be in the past (today is 2027-01-25)')).toBe(
      'no puede estar en el pasado (hoy es 2027-01-25)',
    );
    expect(schemaSentenceIn('es', 'is more than the 14 seedlings alive in this batch')).toBe(
      'es más que las 14 plántulas vivas de este lote',
    );
  });
});
