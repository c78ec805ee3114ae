import type { LogEntryRequest } from '@homeground/shared';
import { Dexie, type EntityTable } from 'dexie';

/** One batch-log entry kept on the device until the API has it. */
export interface OutboxEntry {
  /** The entry's own id, sent with it: the API stores an entry sent twice once. */
  clientId: string;
  /** Whose entry it is: on a shared phone, only the signed-in grower's entries are shown and sent. */
  userId: string;
  slug: string;
  batchId: string;
  entry: LogEntryRequest & { clientId: string };
  /** When it was kept (ISO time); entries are sent oldest first, so "sown" goes before "came up". */
  keptAt: string;
  /** The API refused it (e.g. more came up than were sown): its words, until the grower removes it. */
  refused?: string;
}

/** The device's store of log entries not yet sent. Dexie over IndexedDB, which survives reloads and restarts. */
export type LogOutboxDb = Dexie & { entries: EntityTable<OutboxEntry, 'clientId'> };

/** Opens (creating on first use) the outbox database. `name` lets tests use a fresh one each. */
export function openLogOutboxDb(name = 'homeground-log-outbox'): LogOutboxDb {
  const db = new Dexie(name) as LogOutboxDb;
  db.version(1).stores({ entries: 'clientId, [userId+slug], keptAt' });
  return db;
}
