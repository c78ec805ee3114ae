import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { loginRequestSchema, registerRequestSchema, setMemberRequestSchema, setRoleRequestSchema } from './auth.js';
import { ecoregionListQuerySchema } from './ecoregion.js';
import { calendarRequestSchema, quantitiesRequestSchema, saveMixRequestSchema } from './mix-api.js';
import { placeQuerySchema } from './place.js';
import { paletteRequestSchema } from './recommendation.js';
import { slugParamSchema, uuidParamSchema } from './request-params.js';
import { photoQuerySchema } from './species-query.js';

const site = { sun: 'full', moisture: 'dry', areaSqFt: 500, deerPressure: 'medium', goals: [] };
const region = { state: 'WI' };

/** Where the first issue points, as the API's 400 names it (dotted path; unknown keys by name). */
function fieldOf(schema: z.ZodType, input: unknown): string | null {
  const r = schema.safeParse(input);
  if (r.success) return null;
  const i = r.error.issues[0];
  return i.code === 'unrecognized_keys' ? [...i.path, i.keys[0]].join('.') : i.path.join('.');
}

describe('request schemas: one set of rules the API and the forms share', () => {
  it.each([
    [
      'a register request',
      registerRequestSchema,
      { email: 'a@example.org', password: 'correct-horse', displayName: 'A' },
      null,
    ],
    [
      'register with an unknown field',
      registerRequestSchema,
      { email: 'a@example.org', password: 'correct-horse', displayName: 'A', role: 'admin' },
      'role',
    ],
    [
      'sign-in with a 201-character password',
      loginRequestSchema,
      { email: 'a@example.org', password: 'p'.repeat(201) },
      'password',
    ],
    ['a role', setRoleRequestSchema, { role: 'curator' }, null],
    ['a role that does not exist', setRoleRequestSchema, { role: 'owner' }, 'role'],
    ['a member with a group role', setMemberRequestSchema, { email: 'a@example.org', role: 'grower' }, null],
    [
      '61 locked species',
      paletteRequestSchema,
      { site, region, options: { locked: Array.from({ length: 61 }, (_, i) => `s-${i}`) } },
      'options.locked',
    ],
    [
      'an unknown key inside the site',
      paletteRequestSchema,
      { site: { ...site, colour: 'red' }, region },
      'site.colour',
    ],
    [
      'a saved mix name of 81 characters',
      saveMixRequestSchema,
      { name: 'n'.repeat(81), request: { site, region }, chosen: ['zizia-aurea'] },
      'name',
    ],
    // 10 acres = 40,468.564224 m² (NIST Handbook 44: 1 acre = 4,046.8564224 m²)
    [
      'quantities for exactly 10 acres in m²',
      quantitiesRequestSchema,
      { areaSqM: 40_468.564224, species: [{ slug: 'zizia-aurea' }] },
      null,
    ],
    [
      'quantities for more than 10 acres in m²',
      quantitiesRequestSchema,
      { areaSqM: 40_469, species: [{ slug: 'zizia-aurea' }] },
      'areaSqM',
    ],
    [
      'a calendar in 2200',
      calendarRequestSchema,
      { lastFrost: '2200-05-10', plans: [{ slug: 'zizia-aurea', method: 'winter-sowing' }] },
      null,
    ],
    [
      'a calendar in 9999',
      calendarRequestSchema,
      { lastFrost: '9999-05-10', plans: [{ slug: 'zizia-aurea', method: 'winter-sowing' }] },
      'lastFrost',
    ],
    ['a photo width offered', photoQuerySchema, { w: '400' }, null],
    ['a photo width not offered', photoQuerySchema, { w: '401' }, 'w'],
    ['a state query', ecoregionListQuerySchema, { state: 'WI' }, null],
    ['an unknown ecoregion query key', ecoregionListQuerySchema, { state: 'WI', level: '3' }, 'level'],
    ['a ZIP with letters', placeQuerySchema, { zip: '5466a' }, 'zip'],
    ['a slug', slugParamSchema, 'zizia-aurea', null],
    ['a slug with a path in it', slugParamSchema, '../etc', ''],
    ['a version 4 UUID', uuidParamSchema, '0b7b1d1e-4a4f-4c59-9d4a-0d1f4e8b9c21', null],
    ['a version 1 UUID', uuidParamSchema, '0b7b1d1e-4a4f-1c59-9d4a-0d1f4e8b9c21', ''],
  ])('%s', (_what, schema, input, field) => {
    expect(fieldOf(schema as z.ZodType, input)).toBe(field);
  });

  it('refuses __proto__ and constructor keys parsed from JSON, naming them', () => {
    const body = JSON.parse('{"role":"curator","__proto__":{"role":"admin"},"constructor":1}');
    const r = setRoleRequestSchema.safeParse(body);
    expect(r.success).toBe(false);
    expect(r.error!.issues.flatMap((i) => (i.code === 'unrecognized_keys' ? i.keys : []))).toEqual([
      '__proto__',
      'constructor',
    ]);
  });
});
