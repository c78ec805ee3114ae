import { logTotals } from '../batch-planning/batch-log.js';
import type { LogKind } from '../types/batch.js';
import { SOWING_METHODS, type SowingMethod } from '../types/species.js';
import type { GerminationReport } from './answers.js';

/** One batch as the season report needs it: its method, its grower (first name only) and its log. */
export interface GerminationBatch {
  method: SowingMethod;
  grower: string;
  entries: readonly { kind: LogKind; count: number }[];
}

/**
 * Germination by method and by grower from the batch logs: seeds sown, seedlings up and plants ready,
 * summed over batches (each log entry counts what is new since the last, as `logTotals` reads it).
 * Methods in the catalogue's order, growers by name; only those with a logged sowing. Null while no
 * batch has logged a sowing, so the report says "later" instead of a table of zeros. Counts only.
 */
export function germinationReport(batches: readonly GerminationBatch[]): GerminationReport | null {
  const byMethod = new Map<SowingMethod, Counts>();
  const byGrower = new Map<string, Counts>();
  for (const b of batches) {
    const t = logTotals(b.entries);
    if (t.sown === 0 && t.germinated === 0 && t.ready === 0) continue;
    add(byMethod, b.method, t);
    add(byGrower, b.grower, t);
  }
  if (byMethod.size === 0) return null;
  return {
    byMethod: SOWING_METHODS.filter((m) => byMethod.has(m)).map((method) => ({ method, ...byMethod.get(method)! })),
    byGrower: [...byGrower]
      .sort(([a], [b]) => a.localeCompare(b, 'en'))
      .map(([grower, counts]) => ({ grower, ...counts })),
  };
}

interface Counts {
  sown: number;
  germinated: number;
  ready: number;
}

function add<K>(into: Map<K, Counts>, key: K, t: Counts): void {
  const c = into.get(key) ?? { sown: 0, germinated: 0, ready: 0 };
  into.set(key, { sown: c.sown + t.sown, germinated: c.germinated + t.germinated, ready: c.ready + t.ready });
}
