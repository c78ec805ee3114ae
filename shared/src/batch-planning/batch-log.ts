import type { IsoDate } from '../sowing-calendar/calendar-date.js';
import type { LogEntryRequest, LogKind } from '../types/batch.js';

/** A batch log's counts so far: each entry counts what is new since the last. */
export interface LogTotals {
  sown: number;
  germinated: number;
  pottedUp: number;
  lost: number;
  ready: number;
  /** Seedlings that came up and are not lost. */
  alive: number;
}

export function logTotals(entries: readonly { kind: LogKind; count: number }[]): LogTotals {
  const sum = (kind: LogKind) => entries.filter((e) => e.kind === kind).reduce((a, e) => a + e.count, 0);
  const t = { sown: sum('sown'), germinated: sum('germinated'), pottedUp: sum('potted-up'), lost: sum('lost') };
  return { ...t, ready: sum('ready'), alive: Math.max(0, t.germinated - t.lost) };
}

/** The totals after one more entry, from the totals before it (no need to read the log again). */
export function logTotalsAfter(before: LogTotals, entry: { kind: LogKind; count: number }): LogTotals {
  const key = (
    { sown: 'sown', germinated: 'germinated', 'potted-up': 'pottedUp', lost: 'lost', ready: 'ready' } as const
  )[entry.kind];
  const t = { ...before, [key]: before[key] + entry.count };
  return { ...t, alive: Math.max(0, t.germinated - t.lost) };
}

export interface FieldProblem {
  field: string;
  message: string;
}

/**
 * What is wrong with a new log entry given the log so far, as 400 fields: no date after today (the
 * caller passes today), no more seedlings than seeds sown, no more lost, potted up or ready than
 * are alive. Empty when the entry fits.
 */
export function logEntryProblems(
  totals: LogTotals,
  entry: Pick<LogEntryRequest, 'kind' | 'count' | 'date'>,
  today: IsoDate,
): FieldProblem[] {
  const problems: FieldProblem[] = [];
  if (entry.date > today) problems.push({ field: 'date', message: `must not be after today (${today})` });
  const n = entry.count;
  switch (entry.kind) {
    case 'germinated':
      if (totals.germinated + n > totals.sown)
        problems.push({
          field: 'count',
          message: `would make more seedlings (${totals.germinated + n}) than seeds sown (${totals.sown})`,
        });
      break;
    case 'lost':
      if (n > totals.alive)
        problems.push({ field: 'count', message: `is more than the ${totals.alive} seedlings alive in this batch` });
      break;
    case 'potted-up':
      if (totals.pottedUp + n > totals.alive)
        problems.push({
          field: 'count',
          message: `would make more potted up (${totals.pottedUp + n}) than seedlings alive (${totals.alive})`,
        });
      break;
    case 'ready':
      if (totals.ready + n > totals.alive)
        problems.push({
          field: 'count',
          message: `would make more ready (${totals.ready + n}) than plants alive (${totals.alive})`,
        });
      break;
    case 'sown':
      break;
  }
  return problems;
}
