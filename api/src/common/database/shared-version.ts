import { randomUUID } from 'node:crypto';
import { runSql } from './dialect.js';

/** A DataSource (or anything that runs raw SQL the same way). */
type Db = Parameters<typeof runSql>[0];

/**
 * The catalogue's change mark, shared by every API instance on one database: a row of `catalogue_meta`
 * that each write to the catalogue (species, photos, boundaries) sets to a new random value. An instance
 * that reads a mark other than the one its in-memory read models were built at rebuilds them, so a
 * curator's edit made through one instance is seen through every other on the next request.
 */
const KEY = 'catalogue_version';

/** The current mark, or null before the first write. */
export async function readCatalogueMark(db: Db): Promise<string | null> {
  const [row] = await runSql<{ value: string }>(db, `SELECT value FROM catalogue_meta WHERE key = ?`, [KEY]);
  return row?.value ?? null;
}

/** Sets a new mark (after a catalogue write has committed) and answers it. */
export async function bumpCatalogueMark(db: Db): Promise<string> {
  const mark = randomUUID();
  await runSql(
    db,
    `INSERT INTO catalogue_meta (key, value) VALUES (?, ?) ON CONFLICT (key) DO UPDATE SET value = excluded.value`,
    [KEY, mark],
  );
  return mark;
}
