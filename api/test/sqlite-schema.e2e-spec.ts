import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from '@jest/globals';
import { databaseOptions, openDataSource } from '../src/database/data-source.js';

/**
 * The migrations also run on PostgreSQL, but an existing SQLite database must keep working: the schema
 * they build on SQLite is compared, statement by statement, with the one they built before they learnt
 * a second dialect (test/fixtures/sqlite-schema.json, taken from `sqlite_master` at that commit).
 */
describe('SQLite schema', () => {
  const dir = mkdtempSync(path.join(tmpdir(), 'homeground-schema-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('is exactly what the migrations built before they ran on PostgreSQL', async () => {
    const db = await openDataSource(
      databaseOptions({ databasePath: path.join(dir, 'schema.sqlite'), databaseUrl: null }),
    );
    try {
      const rows: unknown[] = await db.query(
        `SELECT type, name, tbl_name, sql FROM sqlite_master WHERE name NOT LIKE 'sqlite_%' ORDER BY type, name`,
      );
      const expected: unknown = JSON.parse(
        readFileSync(path.join(import.meta.dirname, 'fixtures', 'sqlite-schema.json'), 'utf8'),
      );
      expect(rows).toEqual(expected);
    } finally {
      await db.destroy();
    }
  });
});
