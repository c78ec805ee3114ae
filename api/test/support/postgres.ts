import { randomBytes } from 'node:crypto';
import pg from 'pg';

/**
 * The PostgreSQL server the e2e suites run against a second time (`npm run test:pg`), as a role that may
 * create databases; unset, every suite runs on SQLite.
 */
export const TEST_PG_URL = process.env.HOMEGROUND_TEST_PG_URL || null;

/** A fresh, empty database on the test server, so each e2e file starts from its own migrations. */
export async function createTestDatabase(adminUrl: string): Promise<{ url: string; drop(): Promise<void> }> {
  const name = `homeground_e2e_${randomBytes(6).toString('hex')}`;
  await withClient(adminUrl, (c) => c.query(`CREATE DATABASE "${name}"`));
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    drop: async () => {
      await withClient(adminUrl, (c) => c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
    },
  };
}

async function withClient<T>(url: string, work: (c: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}
