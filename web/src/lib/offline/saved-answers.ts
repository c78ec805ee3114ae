import { Dexie, type EntityTable } from 'dexie';
import { isApiRequestError, NETWORK_ERROR_STATUS } from '../api-request-error.js';

/** The last answer of one read, kept on the device for when there is no signal. */
interface SavedAnswer {
  /** `owner|key`: one copy per person and read. */
  id: string;
  /** Whose answer it is (a user id, or a digest of the session token): no one else's read finds it. */
  owner: string;
  key: string;
  data: unknown;
  /** When the answer came from the server (ISO time). */
  savedAt: string;
}

type SavedAnswersDb = Dexie & { answers: EntityTable<SavedAnswer, 'id'> };

/** An answer with where it came from: `savedAt` is null for a fresh one, else when the kept copy was taken. */
export interface Saved<T> {
  data: T;
  savedAt: string | null;
}

let opened: SavedAnswersDb | null = null;

/** Opens (creating on first use) the device's store of saved answers. `name` lets tests use a fresh one. */
export function openSavedAnswersDb(name = 'homeground-saved-answers'): SavedAnswersDb {
  const db = new Dexie(name) as SavedAnswersDb;
  db.version(1).stores({ answers: 'id, owner' });
  return db;
}

function database(): SavedAnswersDb {
  opened ??= openSavedAnswersDb();
  return opened;
}

/** True when the request never reached the server (no signal), as opposed to the server saying no. */
function isNoConnection(error: unknown): boolean {
  return isApiRequestError(error) && error.statusCode === NETWORK_ERROR_STATUS;
}

/**
 * Reads from the server and keeps a copy on the device for `owner`; with no connection, answers the
 * kept copy and when it was taken. Any other failure (401, 403, 500) is passed on as it is, so a
 * refused read never shows old data. Without IndexedDB (a locked-down browser) nothing is kept.
 */
export async function withSavedCopy<T>(owner: string, key: string, read: () => Promise<T>): Promise<Saved<T>> {
  const id = `${owner}|${key}`;
  try {
    const data = await read();
    await database()
      .answers.put({ id, owner, key, data, savedAt: new Date().toISOString() })
      .catch(() => undefined);
    return { data, savedAt: null };
  } catch (error) {
    if (!isNoConnection(error)) throw error;
    const saved = await database()
      .answers.get(id)
      .catch(() => undefined);
    if (!saved || saved.owner !== owner) throw error;
    return { data: saved.data as T, savedAt: saved.savedAt };
  }
}

/** Deletes every saved answer on the device (on sign-out: the next person sees none of them). */
export async function forgetSavedAnswers(): Promise<void> {
  await database()
    .answers.clear()
    .catch(() => undefined);
}

/**
 * A stable owner for reads made before the profile is known: a SHA-256 digest of the session token
 * (the token itself is never stored twice). Null where the browser has no Web Crypto (a page served
 * over plain http from another machine): then nothing is kept.
 */
export async function tokenOwner(token: string): Promise<string | null> {
  if (!globalThis.crypto?.subtle) return null;
  const digest = await crypto.subtle.digest('SHA-256', new TextEncoder().encode(token));
  return `token:${[...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('')}`;
}
