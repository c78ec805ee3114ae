import type { QueryRunner } from 'typeorm';

/** The two databases Homeground runs on: embedded SQLite (the default) and a PostgreSQL server. */
export type Dialect = 'sqlite' | 'postgres';

/** Anything that knows its data source's options: a DataSource, an EntityManager's connection, a QueryRunner's. */
interface HasOptions {
  options: { type: string };
}

/** Which dialect a data source speaks. */
export function dialectOf(source: HasOptions): Dialect {
  return source.options.type === 'postgres' ? 'postgres' : 'sqlite';
}

/**
 * The words of a migration's DDL that differ between the dialects. On SQLite each is exactly the text the
 * migrations were first written with, so an existing SQLite database's schema is unchanged
 * (test/sqlite-schema.e2e-spec.ts compares it); on PostgreSQL each is the type or default that holds the
 * same values.
 */
export interface SchemaWords {
  /** A point in time: SQLite's `datetime` text, PostgreSQL's `timestamptz`. */
  datetime: string;
  /** The default for "now", in brackets. */
  now: string;
  /** The default for a false boolean, in brackets (SQLite stores booleans as 0 and 1). */
  false: string;
  /** A floating-point number. PostgreSQL's `real` is single precision, so it gets `double precision`. */
  real: string;
  /** Milliseconds since the epoch: past 32 bits, so PostgreSQL needs `bigint` (SQLite integers are 64-bit). */
  epochMs: string;
  /**
   * A text primary key for TypeORM's generated UUIDs. On SQLite TypeORM makes the UUID itself; on
   * PostgreSQL it leaves the column out of the INSERT and reads the key back, so the column needs a default.
   */
  uuidKey: string;
}

const SQLITE_WORDS: SchemaWords = {
  datetime: 'datetime',
  now: `(datetime('now'))`,
  false: '(0)',
  real: 'real',
  epochMs: 'integer',
  uuidKey: 'varchar PRIMARY KEY NOT NULL',
};

const POSTGRES_WORDS: SchemaWords = {
  datetime: 'timestamptz',
  now: '(CURRENT_TIMESTAMP)',
  false: '(false)',
  real: 'double precision',
  epochMs: 'bigint',
  uuidKey: 'varchar PRIMARY KEY NOT NULL DEFAULT (gen_random_uuid()::text)',
};

/** The DDL words for the database a migration runs on. */
export function schemaWords(q: Pick<QueryRunner, 'connection'>): SchemaWords {
  return dialectOf(q.connection) === 'postgres' ? POSTGRES_WORDS : SQLITE_WORDS;
}

/**
 * Raw SQL written with `?` placeholders (SQLite's) in the dialect's own form: PostgreSQL numbers them
 * (`$1`, `$2`…). Placeholders are only ever bound values, never inside quoted text, in Homeground's SQL.
 */
export function placeholders(dialect: Dialect, sql: string): string {
  if (dialect === 'sqlite') return sql;
  let n = 0;
  return sql.replace(/\?/g, () => `$${++n}`);
}

/** A DataSource or a transaction's EntityManager: both run raw SQL. */
type SqlRunner =
  | { options: { type: string }; query(sql: string, params?: unknown[]): Promise<unknown> }
  | { connection: { options: { type: string } }; query(sql: string, params?: unknown[]): Promise<unknown> };

/**
 * Runs raw SQL written with `?` placeholders on either database. The SQL itself must be portable:
 * `CURRENT_TIMESTAMP` rather than `datetime('now')`, `INSERT … ON CONFLICT … DO UPDATE` rather than
 * `INSERT OR REPLACE`, booleans bound as values; PostgreSQL answers counts as text, so callers wrap them in `Number`.
 */
export async function runSql<T = Record<string, unknown>>(
  db: SqlRunner,
  sql: string,
  params?: unknown[],
): Promise<T[]> {
  const dialect = dialectOf('options' in db ? db : db.connection);
  return (await db.query(placeholders(dialect, sql), params)) as T[];
}

/** Whether a table exists in the database's (current) schema. */
export async function tableExists(db: SqlRunner, table: string): Promise<boolean> {
  const dialect = dialectOf('options' in db ? db : db.connection);
  const sql =
    dialect === 'postgres'
      ? `SELECT 1 FROM information_schema.tables WHERE table_schema = current_schema() AND table_name = ?`
      : `SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = ?`;
  return (await runSql(db, sql, [table])).length > 0;
}
