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
      // FORCE ends the app's own connections; a server process of another role (a vacuum worker, on a
      // server that runs them) cannot be ended by the test role, so wait for it and try again.
      for (let attempt = 1; ; attempt++) {
        try {
          await withClient(adminUrl, (c) => c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
          return;
        } catch (e) {
          const code = (e as { code?: string }).code;
          if (attempt >= 20 || (code !== '42501' && code !== '55006')) throw e;
          await new Promise((r) => setTimeout(r, 250));
        }
      }
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
