import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';
import { runSql } from '../src/common/database/dialect.js';

// Its own file: the per-address limit is set high here so only the per-account back-off can answer 429.
describe('sign-in back-off per account (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ LOGIN_THROTTLE_LIMIT: '100', LOGIN_THROTTLE_TTL_SECONDS: '60' });
    await registerUser(t, { email: 'ines.calder@example.org', password: 'right-password-1' });
  });
  afterAll(() => t.close());

  const login = (email: string, password: string) => t.http.post('/api/auth/login').send({ email, password });

  // OWASP Authentication Cheat Sheet ("account lockout"): after a few failures, hold the account back
  // for a growing time rather than for ever; here 5 free failures, then 1 minute doubling to 15.
  it('holds an e-mail address back after five wrong passwords, even with the right one, and not others', async () => {
    for (let i = 0; i < 5; i++) expect((await login('ines.calder@example.org', `wrong-guess-${i}`)).status).toBe(401);
    const held = await login('ines.calder@example.org', 'right-password-1');
    expect(held.status).toBe(429);
    expect(held.body).toMatchObject({ statusCode: 429, message: expect.stringMatching(/wait 1 minute/) });
    // Another person signing in from the same address is not affected.
    await registerUser(t, { email: 'theo.lindqvist@example.org', password: 'winter-sowing-jugs' });
    expect((await login('theo.lindqvist@example.org', 'winter-sowing-jugs')).status).toBe(200);
  });

  it('says the same for an address with no account, so the hold reveals nothing', async () => {
    for (let i = 0; i < 5; i++) expect((await login('nobody.here@example.org', `wrong-guess-${i}`)).status).toBe(401);
    expect((await login('nobody.here@example.org', 'anything-at-all')).status).toBe(429);
  });

  it('lets the person in once the hold has passed, clears the count and notes the sign-in', async () => {
    const db = t.app.get(DataSource);
    await runSql(db, `UPDATE sign_in_failures SET locked_until = ?`, [new Date(Date.now() - 1000).toISOString()]);
    expect((await login('ines.calder@example.org', 'right-password-1')).status).toBe(200);
    const rows = await runSql(db, `SELECT COUNT(*) AS n FROM sign_in_failures`);
    expect(Number(rows[0].n)).toBe(1); // only the address with no account is still counted
    const [user] = await runSql(db, `SELECT last_sign_in_at FROM users WHERE email = 'ines.calder@example.org'`);
    expect(user.last_sign_in_at).not.toBeNull();
  });

  it('keeps only a hash of the address typed', async () => {
    const keys = (await runSql(t.app.get(DataSource), `SELECT email_key FROM sign_in_failures`)) as {
      email_key: string;
    }[];
    for (const k of keys) {
      expect(k.email_key).toMatch(/^[0-9a-f]{64}$/);
      expect(k.email_key).not.toContain('nobody');
    }
  });
});
