import { describe, expect, it } from 'vitest';
import { siteRequestSchema, siteSchema } from './site.js';

const base = { sun: 'full', moisture: 'dry', deerPressure: 'high', goals: ['monarchs'] };

describe('siteRequestSchema (area in ft² or m², stored in ft²)', () => {
  it('keeps an area given in ft²', () => {
    expect(siteRequestSchema.parse({ ...base, areaSqFt: 200 }).areaSqFt).toBe(200);
  });

  it('converts m² to ft² (1 ft = 0.3048 m exactly)', () => {
    expect(siteRequestSchema.parse({ ...base, areaSqM: 10 }).areaSqFt).toBeCloseTo(107.639, 3);
  });

  it.each([
    ['no area', {}],
    ['both areas', { areaSqFt: 100, areaSqM: 10 }],
    ['a goal twice', { areaSqFt: 100, goals: ['birds', 'birds'] }],
    ['an unknown goal', { areaSqFt: 100, goals: ['lawn'] }],
  ])('rejects %s', (_what, change) => {
    expect(siteRequestSchema.safeParse({ ...base, ...change }).success).toBe(false);
  });

  it('the stored shape needs areaSqFt', () => {
    expect(siteSchema.safeParse({ ...base, areaSqM: 10 }).success).toBe(false);
  });
});
