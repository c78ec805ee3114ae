import { describe, expect, it } from 'vitest';
import { pastSeasonDateFields } from '../season-planning/season-dates.js';
import { seasonRequestSchema, shareListRequestSchema, targetsRequestSchema } from './season.js';

const ok = { year: 2027, lastFrost: '2027-05-10', plantShareDate: '2027-06-12' };
const fieldsOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) =>
  r.success ? [] : r.error!.issues.map((i) => i.path.join('.'));

describe('seasonRequestSchema', () => {
  it.each([
    [ok, []],
    [{ ...ok, lastFrost: '2027-02-29' }, ['lastFrost']], // 2027 is not a leap year
    [{ ...ok, plantShareDate: '2027-05-01' }, ['plantShareDate']], // before the last frost
    [{ ...ok, plantShareDate: '2028-06-10' }, ['plantShareDate']], // another year
    [{ ...ok, lastFrost: '2026-05-10' }, ['lastFrost']],
    [{ ...ok, seedsPerPacket: -1 }, ['seedsPerPacket']],
    [{ ...ok, lossFactor: 0.95 }, ['lossFactor']],
    [{ ...ok, milkweedShare: 1.2 }, ['milkweedShare']],
    [{ ...ok, methods: [] }, ['methods']],
    [{ ...ok, extra: 1 }, ['']],
  ])('%j → bad fields %j', (body, fields) => {
    expect(fieldsOf(seasonRequestSchema.safeParse(body))).toEqual(fields);
  });
});

describe('targetsRequestSchema', () => {
  it.each([
    [{ targets: [] }, []],
    [{ targets: [{ slug: 'monarda-fistulosa', targetPlants: 40, germinationRatePct: 75 }] }, []],
    [{ targets: [{ slug: 'monarda-fistulosa', targetPlants: 0 }] }, ['targets.0.targetPlants']],
    [{ targets: [{ slug: 'monarda-fistulosa', targetPlants: 5001 }] }, ['targets.0.targetPlants']],
    [{ targets: [{ slug: 'monarda-fistulosa', targetPlants: 2.5 }] }, ['targets.0.targetPlants']],
    [{ targets: [{ slug: 'Monarda', targetPlants: 5 }] }, ['targets.0.slug']],
    [
      {
        targets: [
          { slug: 'a-b', targetPlants: 5 },
          { slug: 'a-b', targetPlants: 6 },
        ],
      },
      ['targets.1.slug'],
    ],
  ])('%j → bad fields %j', (body, fields) => {
    expect(fieldsOf(targetsRequestSchema.safeParse(body))).toEqual(fields);
  });
});

describe('shareListRequestSchema', () => {
  it.each([
    [{}, []],
    [{ count: 2 }, ['count']],
    [{ count: 41 }, ['count']],
    [{ methods: ['hydroponics'] }, ['methods.0']],
  ])('%j → bad fields %j', (body, fields) => {
    expect(fieldsOf(shareListRequestSchema.safeParse(body))).toEqual(fields);
  });
});

describe("pastSeasonDateFields (today passed in; the clock is the caller's)", () => {
  it.each([
    ['2027-06-12', '2026-12-02', []],
    ['2027-06-12', '2027-06-12', []], // the plant share itself is still today
    ['2027-06-12', '2027-06-13', ['plantShareDate']],
  ])('plant share %s, today %s → %j', (plantShareDate, today, fields) => {
    expect(pastSeasonDateFields({ plantShareDate }, today).map((f) => f.field)).toEqual(fields);
  });
});
