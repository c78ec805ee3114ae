import { describe, expect, it } from 'vitest';
import { LOG_KINDS, type LogKind } from '../types/batch.js';
import { logTotals, logTotalsAfter } from './batch-log.js';

// The log's rule (each entry counts what is new since the last, alive = up − lost) is the project's own
// definition in batch-log.ts; the check here is that adding one entry to the totals gives what summing
// the whole log again gives, for every kind, including losses that exceed what came up (alive stays 0).
describe('logTotalsAfter', () => {
  const log: { kind: LogKind; count: number }[] = [
    { kind: 'sown', count: 100 },
    { kind: 'germinated', count: 60 },
    { kind: 'lost', count: 5 },
    { kind: 'potted-up', count: 20 },
    { kind: 'ready', count: 10 },
  ];

  it.each(LOG_KINDS.map((kind) => [kind]))('adding a %s entry matches summing the whole log again', (kind) => {
    const entry = { kind, count: 7 };
    expect(logTotalsAfter(logTotals(log), entry)).toEqual(logTotals([...log, entry]));
  });

  it('worked example: 100 sown, 60 up, 5 lost, then 3 more lost → 52 alive', () => {
    expect(logTotalsAfter(logTotals(log), { kind: 'lost', count: 3 })).toMatchObject({ lost: 8, alive: 52 });
  });

  it('never counts fewer than none alive', () => {
    expect(logTotalsAfter(logTotals([]), { kind: 'lost', count: 4 }).alive).toBe(0);
  });
});
