import type { LogEntryRequest } from '@homeground/shared';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import type { LogOutboxDb, OutboxEntry } from './log-outbox-db.js';

/** Sends one entry to the API; rejects with an ApiRequestError when it was not stored. */
export type SendLogEntry = (slug: string, batchId: string, entry: LogEntryRequest) => Promise<unknown>;

export interface FlushResult {
  /** clientIds the API now holds (removed from the device). */
  sent: string[];
  /** Entries the API refused with a reason (kept, marked, until the grower removes them). */
  refused: { clientId: string; error: unknown }[];
  /** True when sending stopped because there is no connection or the server could not take it now. */
  stopped: boolean;
}

function merge(a: FlushResult, b: FlushResult): FlushResult {
  return { sent: [...a.sent, ...b.sent], refused: [...a.refused, ...b.refused], stopped: b.stopped };
}

/**
 * Whether a failed send is worth trying again later: no answer at all (offline), the server busy or
 * down, or the sign-in lapsed. Any other answer (a 400 naming a field, a batch that no longer exists)
 * will not change by retrying, so the entry is marked refused instead.
 */
export function isRetryable(error: unknown): boolean {
  if (!isApiRequestError(error)) return true;
  const s = error.statusCode;
  return s === 0 || s === 401 || s === 403 || s === 408 || s === 429 || s >= 500;
}

/**
 * The batch-log outbox: every entry is written to the device first, then sent. An entry leaves the
 * device only once the API has answered that it holds it, and it always carries the same clientId, so
 * a send whose answer was lost and is sent again is stored once by the API (never lost, never twice).
 */
export function createLogOutbox(db: LogOutboxDb) {
  // One send at a time per page: the online event, the page opening and the button may coincide.
  let running: Promise<FlushResult> | null = null;

  async function keep(item: Omit<OutboxEntry, 'keptAt' | 'refused'>, keptAt = new Date().toISOString()) {
    await db.entries.put({ ...item, keptAt });
  }

  /** The grower's entries for one group, oldest first. */
  async function list(userId: string, slug: string): Promise<OutboxEntry[]> {
    const rows = await db.entries.where('[userId+slug]').equals([userId, slug]).toArray();
    return rows.sort((a, b) => a.keptAt.localeCompare(b.keptAt) || a.clientId.localeCompare(b.clientId));
  }

  async function remove(clientId: string): Promise<void> {
    await db.entries.delete(clientId);
  }

  async function sendAll(userId: string, slug: string, send: SendLogEntry): Promise<FlushResult> {
    const result: FlushResult = { sent: [], refused: [], stopped: false };
    for (const item of await list(userId, slug)) {
      if (item.refused !== undefined) continue;
      try {
        await send(item.slug, item.batchId, item.entry);
      } catch (error) {
        if (isRetryable(error)) {
          // Later entries may depend on this one (came up after sown): keep the order, stop here.
          result.stopped = true;
          break;
        }
        const message = error instanceof Error ? error.message : String(error);
        await db.entries.update(item.clientId, { refused: message });
        result.refused.push({ clientId: item.clientId, error });
        continue;
      }
      await remove(item.clientId);
      result.sent.push(item.clientId);
    }
    return result;
  }

  /**
   * Sends the grower's kept entries for the group, oldest first. A call while a send runs waits for it
   * and then sends again (an entry kept meanwhile is not missed); the answer covers both rounds.
   */
  function flush(userId: string, slug: string, send: SendLogEntry): Promise<FlushResult> {
    if (running) {
      return running.then(async (first) => merge(first, await flush(userId, slug, send)));
    }
    const round = sendAll(userId, slug, send).finally(() => {
      running = null;
    });
    running = round;
    return round;
  }

  return { keep, list, remove, flush };
}

export type LogOutbox = ReturnType<typeof createLogOutbox>;
