import { execFile } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import Database from 'better-sqlite3';

/** What a backup wrote, for the operator's log line. */
export interface BackupResult {
  file: string;
  kind: 'sqlite' | 'postgres';
  /** SQLite only: the page count copied and the copy's integrity check ("ok" when sound). */
  pages?: number;
  integrity?: string;
}

/**
 * A consistent copy of a live SQLite database through SQLite's online backup API (better-sqlite3's
 * `backup()`): it copies page by page while the API keeps running and restarts on its own if another
 * connection writes in between, so the copy is one committed state, WAL contents included. Copying the
 * file with `cp` would not be: a WAL database's recent commits live in the `-wal` file until a checkpoint.
 */
export async function backupSqlite(source: string, destination: string): Promise<BackupResult> {
  mkdirSync(path.dirname(destination), { recursive: true });
  const db = new Database(source, { readonly: true, fileMustExist: true });
  let pages: number;
  try {
    // Busy for a moment while the API commits: wait rather than fail.
    db.pragma('busy_timeout = 5000');
    ({ totalPages: pages } = await db.backup(destination));
  } finally {
    db.close();
  }
  // The copy keeps the source's WAL mode; switched to a rollback journal it is one self-contained file
  // (no -wal or -shm beside it), which is what gets copied back on a restore. The API turns WAL on again.
  const copy = new Database(destination, { fileMustExist: true });
  try {
    copy.pragma('journal_mode = DELETE');
    const integrity = String(copy.pragma('integrity_check', { simple: true }));
    if (integrity !== 'ok') throw new Error(`the backup ${destination} failed its integrity check: ${integrity}`);
    return { file: destination, kind: 'sqlite', pages, integrity };
  } finally {
    copy.close();
  }
}

/**
 * A PostgreSQL backup is pg_dump's job: a consistent snapshot in its custom format (restored with
 * pg_restore). The connection string is passed as pg_dump's own `--dbname`, never through a shell.
 */
export async function backupPostgres(databaseUrl: string, destination: string): Promise<BackupResult> {
  mkdirSync(path.dirname(destination), { recursive: true });
  await promisify(execFile)('pg_dump', [
    '--format=custom',
    '--no-owner',
    `--file=${destination}`,
    `--dbname=${databaseUrl}`,
  ]);
  return { file: destination, kind: 'postgres' };
}

/** `homeground-2026-12-03T04-05-06Z.sqlite`: sorts by time, and no colons for file systems that refuse them. */
export function backupFileName(now: Date, extension: 'sqlite' | 'dump'): string {
  return `homeground-${now.toISOString().slice(0, 19).replace(/:/g, '-')}Z.${extension}`;
}
