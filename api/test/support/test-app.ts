import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import request from 'supertest';
import { createTestDatabase, TEST_PG_URL } from './postgres.js';

export interface TestApp {
  app: NestExpressApplication;
  http: ReturnType<typeof request>;
  dataDir: string;
  close(): Promise<void>;
}

/**
 * Boots the real AppModule against a throwaway SQLite file in a temp folder (or, in the PostgreSQL
 * run, a fresh database on the test server), with migrations run as at start. Environment variables are set before the app's modules are imported, because the
 * config module validates the environment when it is first loaded.
 */
export async function createTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'homeground-e2e-'));
  const database = TEST_PG_URL && !('DATABASE_URL' in env) ? await createTestDatabase(TEST_PG_URL) : null;
  if (database) process.env.DATABASE_URL = database.url;
  Object.assign(process.env, {
    NODE_ENV: 'test',
    DATA_DIR: dataDir,
    DATABASE: path.join(dataDir, 'test.sqlite'),
    DEMO_DATA: 'false',
    WEB_DIST: path.join(dataDir, 'no-web-build'),
    LOG_LEVEL: 'error',
    ...env,
  });
  const { AppModule } = await import('../../src/app.module.js');
  const { configureApp } = await import('../../src/app.factory.js');
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = moduleRef.createNestApplication<NestExpressApplication>({ logger: ['error'] });
  configureApp(app);
  await app.init();
  return {
    app,
    http: request(app.getHttpServer()),
    dataDir,
    async close() {
      await app.close();
      await database?.drop();
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

/**
 * The secret of the newest sign-up confirmation link e-mailed to `email`, read from the outbox as the
 * local mail server received it (the API's own outbox route is for admins and organisers).
 */
export async function registrationToken(t: TestApp, email: string): Promise<string | null> {
  const { DataSource } = await import('typeorm');
  const { runSql } = await import('../../src/common/database/dialect.js');
  const rows = await runSql<{ text: string }>(
    t.app.get(DataSource),
    `SELECT text FROM outbox_messages WHERE kind = 'registration' AND "to" LIKE ? ORDER BY received_at DESC`,
    [`%${email.toLowerCase()}%`],
  );
  for (const row of rows) {
    const match = /\/register\/confirm\/([A-Za-z0-9_-]{43})/.exec(row.text);
    if (match) return match[1];
  }
  return null;
}

/**
 * Registers a person through the API as they would: sign up (202, "check your e-mail"), open the
 * link from the e-mail, and come back signed in. Returns their token.
 */
export async function registerUser(
  t: TestApp,
  who: { email: string; password?: string; displayName?: string },
): Promise<{ token: string; id: string }> {
  await t.http
    .post('/api/auth/register')
    .send({
      email: who.email,
      password: who.password ?? 'correct-horse-battery',
      displayName: who.displayName ?? 'Test Grower',
    })
    .expect(202);
  const token = await registrationToken(t, who.email);
  if (!token) throw new Error(`No confirmation e-mail reached ${who.email}`);
  const res = await t.http.post('/api/auth/register/confirm').send({ token }).expect(201);
  return { token: res.body.accessToken, id: res.body.user.id };
}
