import type { DataSource, QueryRunner } from 'typeorm';
import { dialectOf, placeholders } from '../common/database/dialect.js';

/** One step a unit of plant-share work asks the database for. */
export type ShareStep =
  { kind: 'get' | 'all' | 'run'; sql: string; params: unknown[] } | { kind: 'lockShare'; shareId: string };

/**
 * A unit of plant-share work written once for both databases: a generator that yields each SQL step
 * and is handed its answer back. On SQLite it runs synchronously inside one better-sqlite3 transaction
 * (nothing else runs in between); on PostgreSQL it runs asynchronously inside one READ COMMITTED
 * transaction. Because it may be run again after a deadlock, it must not do anything outside the
 * database (no e-mail, no clock reads that must stay fixed: take those before).
 */
export type ShareWork<T> = Generator<ShareStep, T, unknown>;

/**
 * The steps, used as `const row = yield* tx.get<Row>(sql, a, b)`. SQL is written with `?` placeholders
 * and must be portable (see common/database/dialect.ts); `run` answers the number of rows it changed,
 * which is how a conditional decrement (`… WHERE remaining >= ?`) says whether it happened.
 */
export const tx = {
  *get<T>(sql: string, ...params: unknown[]): ShareWork<T | undefined> {
    return (yield { kind: 'get', sql, params }) as T | undefined;
  },
  *all<T>(sql: string, ...params: unknown[]): ShareWork<T[]> {
    return (yield { kind: 'all', sql, params }) as T[];
  },
  *run(sql: string, ...params: unknown[]): ShareWork<number> {
    return (yield { kind: 'run', sql, params }) as number;
  },
  /**
   * Holds the share's row until the transaction ends (`SELECT … FOR UPDATE` on PostgreSQL), so units
   * on the same share queue behind each other across instances; on SQLite the transaction already
   * holds the database's one write lock, so it is a no-op.
   */
  *lockShare(shareId: string): ShareWork<void> {
    yield { kind: 'lockShare', shareId };
  },
};

/** The few better-sqlite3 calls the runner uses (the package ships no types of its own). */
interface NativeStatement {
  run(...params: unknown[]): { changes: number };
  all(...params: unknown[]): unknown[];
  get(...params: unknown[]): unknown;
}
interface NativeDatabase {
  prepare(sql: string): NativeStatement;
  transaction<T>(fn: () => T): { immediate(): T };
}

/** PostgreSQL's codes for "run it again": serialization failure and deadlock. */
const RETRY_CODES = new Set(['40001', '40P01']);
/** How many times a unit is tried before its error is answered (a 500): deadlocks here are rare. */
const MAX_ATTEMPTS = 5;

/** The PostgreSQL error code of a failed query, wrapped by TypeORM or not. */
export function pgErrorCode(e: unknown): string | undefined {
  const err = e as { code?: unknown; driverError?: { code?: unknown } } | null;
  const code = err?.driverError?.code ?? err?.code;
  return typeof code === 'string' ? code : undefined;
}

/** Runs plant-share units of work on the app's database, whichever it is. */
export class ShareTxRunner {
  private readonly statements = new Map<string, NativeStatement>();
  private readonly native: NativeDatabase | null;

  constructor(private readonly db: DataSource) {
    this.native =
      dialectOf(db) === 'sqlite'
        ? (db.driver as unknown as { databaseConnection: NativeDatabase }).databaseConnection
        : null;
  }

  /**
   * Runs `work` as one transaction: all of it is written, or (when it throws) none of it. On SQLite
   * BEGIN IMMEDIATE takes the write lock first, so another connection's write makes it wait out the
   * busy timeout rather than fail on a stale snapshot. On PostgreSQL a deadlock or serialization
   * failure rolls back and runs a fresh generator from `work` again.
   */
  async atomically<T>(work: () => ShareWork<T>): Promise<T> {
    const native = this.native;
    if (native) return native.transaction(() => this.drive(work())).immediate();
    for (let attempt = 1; ; attempt++) {
      try {
        return await this.onPostgres(work, true);
      } catch (e) {
        if (attempt >= MAX_ATTEMPTS || !RETRY_CODES.has(pgErrorCode(e) ?? '')) throw e;
      }
    }
  }

  /** Runs read-only `work` outside a transaction (each statement sees what is committed when it runs). */
  async read<T>(work: () => ShareWork<T>): Promise<T> {
    if (this.native) return this.drive(work());
    return this.onPostgres(work, false);
  }

  /** SQLite: each step synchronously, so the whole unit runs without yielding the event loop. */
  private drive<T>(gen: ShareWork<T>): T {
    let next = gen.next();
    while (!next.done) next = gen.next(this.sqliteStep(next.value));
    return next.value;
  }

  private sqliteStep(step: ShareStep): unknown {
    if (step.kind === 'lockShare') return undefined;
    const s = this.statement(step.sql);
    if (step.kind === 'run') return s.run(...step.params).changes;
    return step.kind === 'all' ? s.all(...step.params) : s.get(...step.params);
  }

  private statement(sql: string): NativeStatement {
    let s = this.statements.get(sql);
    if (!s) {
      s = this.native!.prepare(sql);
      this.statements.set(sql, s);
    }
    return s;
  }

  /** PostgreSQL: each step awaited on one pooled connection, inside a transaction when asked. */
  private async onPostgres<T>(work: () => ShareWork<T>, inTransaction: boolean): Promise<T> {
    const qr = this.db.createQueryRunner();
    await qr.connect();
    try {
      if (inTransaction) await qr.startTransaction('READ COMMITTED');
      const gen = work();
      let next = gen.next();
      while (!next.done) next = gen.next(await postgresStep(qr, next.value));
      if (inTransaction) await qr.commitTransaction();
      return next.value;
    } catch (e) {
      if (qr.isTransactionActive) await qr.rollbackTransaction().catch(() => undefined);
      throw e;
    } finally {
      await qr.release();
    }
  }
}

async function postgresStep(qr: QueryRunner, step: ShareStep): Promise<unknown> {
  if (step.kind === 'lockShare') {
    await qr.query('SELECT id FROM plant_shares WHERE id = $1 FOR UPDATE', [step.shareId]);
    return undefined;
  }
  const sql = placeholders('postgres', step.sql);
  if (step.kind === 'run') return (await qr.query(sql, step.params, true)).affected ?? 0;
  const rows = (await qr.query(sql, step.params)) as unknown[];
  return step.kind === 'all' ? rows : rows[0];
}
