import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';

/** The few better-sqlite3 calls the plant share uses (the package ships no types of its own). */
interface Statement {
  run(...params: unknown[]): { changes: number };
  all(...params: unknown[]): unknown[];
  get(...params: unknown[]): unknown;
}
interface NativeDatabase {
  prepare(sql: string): Statement;
  transaction<T>(fn: () => T): { immediate(): T };
}

/**
 * SQL for the plant share, on the app's one SQLite connection.
 *
 * Why not TypeORM transactions: TypeORM's better-sqlite3 driver shares one query runner, so two async
 * transactions in flight would nest as savepoints of each other, and any other request's write made
 * while one is open would roll back with it. `atomically` instead runs the whole unit synchronously
 * in one SQLite transaction: nothing else runs in between, and a throw rolls all of it back. The
 * statements are portable SQL (conditional `UPDATE … WHERE remaining >= ?` with the affected-row
 * count checked), so a PostgreSQL port keeps them as they are inside one transaction per unit.
 */
@Injectable()
export class ShareDb {
  private readonly statements = new Map<string, Statement>();
  private readonly native: NativeDatabase;

  constructor(@InjectDataSource() db: DataSource) {
    this.native = (db.driver as unknown as { databaseConnection: NativeDatabase }).databaseConnection;
  }

  private statement(sql: string): Statement {
    let s = this.statements.get(sql);
    if (!s) {
      s = this.native.prepare(sql);
      this.statements.set(sql, s);
    }
    return s;
  }

  /** Runs a write; answers the number of rows it changed. */
  run(sql: string, ...params: unknown[]): number {
    return this.statement(sql).run(...params).changes;
  }

  all<T>(sql: string, ...params: unknown[]): T[] {
    return this.statement(sql).all(...params) as T[];
  }

  get<T>(sql: string, ...params: unknown[]): T | undefined {
    return this.statement(sql).get(...params) as T | undefined;
  }

  /**
   * Runs `work` as one transaction: all of it is written, or (when it throws) none of it. BEGIN IMMEDIATE
   * takes the write lock first, so another connection's write (a backup tool, an operator's sqlite3)
   * makes it wait out the busy timeout; a deferred BEGIN would read first and then fail with
   * SQLITE_BUSY on its stale snapshot, answering 500.
   */
  atomically<T>(work: () => T): T {
    return this.native.transaction(work).immediate();
  }
}
