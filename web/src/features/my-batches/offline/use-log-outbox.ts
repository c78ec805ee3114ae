import { useQueryClient } from '@tanstack/react-query';
import { liveQuery } from 'dexie';
import { useCallback, useEffect, useState } from 'react';
import { postLogEntry } from '../../../api/batches/batches.api.js';
import { batchKeys } from '../../../api/batches/batches.queries.js';
import { openLogOutboxDb, type LogOutboxDb, type OutboxEntry } from './log-outbox-db.js';
import { createLogOutbox, type FlushResult, type LogOutbox } from './log-outbox.js';

let shared: { db: LogOutboxDb; outbox: LogOutbox } | null = null;

/** The page's one outbox (one database connection per tab), opened on first use. */
export function deviceOutbox(): { db: LogOutboxDb; outbox: LogOutbox } {
  if (!shared) {
    const db = openLogOutboxDb();
    shared = { db, outbox: createLogOutbox(db) };
  }
  return shared;
}

export interface LogOutboxState {
  /** The grower's entries for this group still on the device, oldest first. */
  entries: OutboxEntry[];
  sending: boolean;
  /** Sends what is kept now (the retry button; also runs on opening the page and on `online`). */
  send: () => Promise<FlushResult>;
  keep: (item: Omit<OutboxEntry, 'keptAt' | 'refused' | 'userId' | 'slug'>) => Promise<void>;
  remove: (clientId: string) => Promise<void>;
}

/**
 * The batch-log outbox for one grower and group: what is kept on the device (live from IndexedDB),
 * sent when the page opens, when the browser says the connection is back, and on the retry button.
 * After anything reached the API the batches are fetched again, so the log shows it from the server.
 */
export function useLogOutbox(slug: string, userId: string): LogOutboxState {
  const queryClient = useQueryClient();
  const [entries, setEntries] = useState<OutboxEntry[]>([]);
  const [sending, setSending] = useState(false);

  useEffect(() => {
    const subscription = liveQuery(() => deviceOutbox().outbox.list(userId, slug)).subscribe({
      next: setEntries,
      // No IndexedDB (a locked-down browser): nothing is kept, and the form sends directly.
      error: () => setEntries([]),
    });
    return () => subscription.unsubscribe();
  }, [slug, userId]);

  const send = useCallback(async () => {
    setSending(true);
    try {
      const result = await deviceOutbox().outbox.flush(userId, slug, postLogEntry);
      if (result.sent.length > 0) await queryClient.invalidateQueries({ queryKey: batchKeys.season(slug) });
      return result;
    } finally {
      setSending(false);
    }
  }, [queryClient, slug, userId]);

  useEffect(() => {
    const retry = () => void send().catch(() => undefined);
    retry();
    window.addEventListener('online', retry);
    return () => window.removeEventListener('online', retry);
  }, [send]);

  const keep = useCallback<LogOutboxState['keep']>(
    (item) => deviceOutbox().outbox.keep({ ...item, userId, slug }),
    [slug, userId],
  );
  const remove = useCallback((clientId: string) => deviceOutbox().outbox.remove(clientId), []);

  return { entries, sending, send, keep, remove };
}
