import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, type TestApp } from './support/test-app.js';

// Its own file: the config module reads the environment once per module registry (one per test file).
describe('sign-in throttling (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ LOGIN_THROTTLE_LIMIT: '3', LOGIN_THROTTLE_TTL_SECONDS: '60' });
  });
  afterAll(() => t.close());

  it('answers 429 in the API error shape once an address passes the sign-in limit', async () => {
    const attempt = () =>
      t.http.post('/api/auth/login').send({ email: 'mara.ellsworth@example.org', password: 'guess-guess' });
    for (let i = 0; i < 3; i++) expect((await attempt()).status).toBe(401);
    const blocked = await attempt();
    expect(blocked.status).toBe(429);
    expect(blocked.body).toMatchObject({
      statusCode: 429,
      error: 'Too Many Requests',
      message: expect.stringMatching(/wait a minute/),
    });
  });

  // The same refusal in the language the request asks for (Accept-Language, RFC 9110 §12.5.4).
  it('says the 429 in Spanish when the request asks for Spanish', async () => {
    const blocked = await t.http
      .post('/api/auth/login')
      .set('Accept-Language', 'es')
      .send({ email: 'mara.ellsworth@example.org', password: 'guess-guess' })
      .expect(429);
    expect(blocked.body.message).toBe('Demasiados intentos: espera un minuto y vuelve a probar.');
  });

  // A client must not buy a fresh allowance by making up a forwarding header (TRUST_PROXY unset: no
  // proxy is believed). OWASP Authentication Cheat Sheet: limits keyed on what the client controls fail.
  it('ignores a made-up X-Forwarded-For, so changing it gives no fresh allowance', async () => {
    const fresh = await createTestApp({ LOGIN_THROTTLE_LIMIT: '3', LOGIN_THROTTLE_TTL_SECONDS: '60' });
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 4; i++) {
        const res = await fresh.http
          .post('/api/auth/login')
          .set('X-Forwarded-For', `203.0.113.${i + 1}`)
          .send({ email: `someone${i}@example.org`, password: 'guess-guess' });
        statuses.push(res.status);
      }
      expect(statuses).toEqual([401, 401, 401, 429]);
    } finally {
      await fresh.close();
    }
  });
});
