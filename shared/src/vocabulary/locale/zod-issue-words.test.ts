import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { schemaSentenceIn, zodIssueWordsFor } from './zod-issue-words.js';

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
    expect(schemaSentenceIn('es', 'must be after the last frost')).toBe('must be after the last frost');
    expect(schemaSentenceIn('en', 'must not be empty')).toBe('must not be empty');
  });
});
