import { describe, expect, it } from 'vitest';
import { seedsToSow } from '../quantities/seed-count.js';
import { logEntryProblems, logTotals } from './batch-log.js';
import { batchForecast } from './ready-forecast.js';

// Germination rates: Asclepias incarnata 70 % (the catalogue record); the loss allowance 0.2 is
// common practice (seed-count.ts). The worked examples are arithmetic on those, stated beside.
const base = { germinationRatePct: 70, lossFactor: 0.2, readyAfterShare: false, stillSprouting: true };
const empty = logTotals([]);

describe('batchForecast', () => {
  it('before sowing, gives back about the plants planned (the seed list sows for them)', () => {
    const seeds = seedsToSow(50, 70, 0.2); // 50 ÷ (0.7 × 0.8) = 89.3 → 90
    const f = batchForecast({ ...base, seedsToSow: seeds, totals: empty });
    expect(f).toEqual({ expected: 50, low: 37, high: 63, basis: 'planned' }); // 90 × 0.7 × 0.8 = 50.4; × 0.6 = 37.8; × 1 = 63
  });

  it('worked example: 100 sown, 60 up, 5 lost to slugs → 55 alive, 48 expected (range 43–55)', () => {
    const totals = logTotals([
      { kind: 'sown', count: 100 },
      { kind: 'germinated', count: 60 },
      { kind: 'lost', count: 5 },
    ]);
    const f = batchForecast({ ...base, stillSprouting: false, seedsToSow: 100, totals });
    // 60 × 0.2 = 12 usual losses, 5 already → 7 more: 55 − 7 = 48. Low: 60 × 0.4 = 24 − 5 = 19 more → 36.
    expect(f).toEqual({ expected: 48, low: 36, high: 55, basis: 'germinated' });
  });

  it('losses already past the usual allowance leave what is alive', () => {
    const totals = logTotals([
      { kind: 'sown', count: 100 },
      { kind: 'germinated', count: 50 },
      { kind: 'lost', count: 30 },
    ]);
    expect(batchForecast({ ...base, stillSprouting: false, seedsToSow: 100, totals }).expected).toBe(20);
  });

  it('while seed is still sprouting, a few early seedlings do not sink the forecast', () => {
    const totals = logTotals([
      { kind: 'sown', count: 100 },
      { kind: 'germinated', count: 5 },
    ]);
    expect(batchForecast({ ...base, seedsToSow: 100, totals }).expected).toBe(56); // 100 × 0.7 × 0.8
  });

  it('a batch ready only after the share gives nothing for it; plants logged ready always count', () => {
    expect(batchForecast({ ...base, readyAfterShare: true, seedsToSow: 90, totals: empty }).expected).toBe(0);
    const totals = logTotals([
      { kind: 'sown', count: 20 },
      { kind: 'germinated', count: 20 },
      { kind: 'ready', count: 19 },
    ]);
    expect(batchForecast({ ...base, stillSprouting: false, seedsToSow: 20, totals }).expected).toBe(19);
  });
});

describe('logEntryProblems', () => {
  const totals = logTotals([
    { kind: 'sown', count: 40 },
    { kind: 'germinated', count: 30 },
    { kind: 'lost', count: 4 },
  ]);
  it.each([
    ['germinated', 11, 'count'],
    ['lost', 27, 'count'],
    ['potted-up', 27, 'count'],
    ['ready', 27, 'count'],
  ] as const)('refuses %s %d (more than the log allows) naming %s', (kind, count, field) => {
    expect(logEntryProblems(totals, { kind, count, date: '2027-03-01' }, '2027-03-02').map((p) => p.field)).toEqual([
      field,
    ]);
  });
  it('accepts what fits and refuses a date after today', () => {
    expect(logEntryProblems(totals, { kind: 'germinated', count: 10, date: '2027-03-01' }, '2027-03-01')).toEqual([]);
    expect(logEntryProblems(totals, { kind: 'sown', count: 10, date: '2027-03-03' }, '2027-03-02')[0].field).toBe(
      'date',
    );
  });
});
