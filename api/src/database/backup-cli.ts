/**
 * `npm run db:backup [-- --out <file>]`: a consistent online backup of the running database. SQLite
 * (the default) through the online backup API; PostgreSQL (DATABASE_URL=postgres://…) through pg_dump.
 * Without --out the copy goes to DATA_DIR/backups/ with the time in its name. Restoring is in the README.
 */
import path from 'node:path';
import { parseArgs } from 'node:util';
import { PROJECT_ROOT } from '../config/app-config.js';
import { envSchema } from '../config/env.validation.js';
import { backupFileName, backupPostgres, backupSqlite } from './backup.js';

const { values } = parseArgs({ options: { out: { type: 'string' } } });
const env = envSchema.parse(process.env);
const fromRoot = (p: string) => (path.isAbsolute(p) ? p : path.resolve(PROJECT_ROOT, p));
const databaseUrl = process.env.DATABASE_URL ?? '';
const postgres = /^postgres(ql)?:\/\//.test(databaseUrl);
const out = values.out
  ? path.resolve(process.env.INIT_CWD ?? process.cwd(), values.out)
  : path.join(fromRoot(env.DATA_DIR), 'backups', backupFileName(new Date(), postgres ? 'dump' : 'sqlite'));

try {
  const result = postgres ? await backupPostgres(databaseUrl, out) : await backupSqlite(fromRoot(env.DATABASE), out);
  console.log(
    result.kind === 'sqlite'
      ? `Backed up ${fromRoot(env.DATABASE)} to ${result.file} (${result.pages} pages, integrity ${result.integrity}).`
      : `Backed up the PostgreSQL database to ${result.file} (pg_dump custom format; restore with pg_restore).`,
  );
} catch (e) {
  console.error(`Backup failed: ${e instanceof Error ? e.message : String(e)}`);
  process.exitCode = 1;
}
