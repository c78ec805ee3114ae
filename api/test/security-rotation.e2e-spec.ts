import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { JwtService } from '@nestjs/jwt';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';

const OLD_SECRET = 'old-secret-of-the-previous-quarter-0123456789';
const NEW_SECRET = 'new-secret-of-this-quarter-abcdefghijklmnopqrstu';
const GARDEN = 'https://garden.example.org';

/**
 * A sign-in secret rotation in progress (JWT_SECRET new, JWT_PREVIOUS_SECRET old) and CORS opened to a
 * named origin. Sources: RFC 8725 §3.2 (verify with the expected key and algorithm only) and the Fetch
 * standard's CORS protocol (Access-Control-Allow-Origin names the one allowed origin).
 * Its own file: the settings are read once per module registry.
 */
describe('secret rotation and CORS opened by configuration (e2e)', () => {
  let t: TestApp;
  let userId: string;
  let fresh: string;

  beforeAll(async () => {
    t = await createTestApp({
      JWT_SECRET: NEW_SECRET,
      JWT_PREVIOUS_SECRET: OLD_SECRET,
      CORS_ORIGINS: `${GARDEN}, http://localhost:5173`,
    });
    ({ id: userId, token: fresh } = await registerUser(t, { email: 'wren.halloway@example.org' }));
  });
  afterAll(() => t.close());

  it('signs new tokens with the new secret only', () => {
    expect(new JwtService({ secret: NEW_SECRET }).verify(fresh)).toMatchObject({ sub: userId });
    expect(() => new JwtService({ secret: OLD_SECRET }).verify(fresh)).toThrow(/signature/);
  });

  it('accepts a token signed with the previous secret until it expires, and nothing signed with any other', async () => {
    const old = new JwtService({ secret: OLD_SECRET });
    await t.http
      .get('/api/me')
      .set('Authorization', `Bearer ${old.sign({ sub: userId })}`)
      .expect(200);
    await t.http.get('/api/me').set('Authorization', `Bearer ${fresh}`).expect(200);
    await t.http
      .get('/api/me')
      .set('Authorization', `Bearer ${old.sign({ sub: userId }, { expiresIn: -10 })}`)
      .expect(401);
    const stranger = new JwtService({ secret: 'some-other-secret-nobody-configured-000000' });
    await t.http
      .get('/api/me')
      .set('Authorization', `Bearer ${stranger.sign({ sub: userId })}`)
      .expect(401);
    const hs512 = new JwtService({ secret: OLD_SECRET }).sign({ sub: userId }, { algorithm: 'HS512' });
    await t.http.get('/api/me').set('Authorization', `Bearer ${hs512}`).expect(401);
  });

  it('answers CORS for the named origins only, without credentials', async () => {
    const allowed = await t.http.get('/api/species?q=aster').set('Origin', GARDEN).expect(200);
    expect(allowed.headers['access-control-allow-origin']).toBe(GARDEN);
    expect(allowed.headers['access-control-allow-credentials']).toBeUndefined();
    const preflight = await t.http
      .options('/api/auth/login')
      .set('Origin', 'http://localhost:5173')
      .set('Access-Control-Request-Method', 'POST')
      .set('Access-Control-Request-Headers', 'content-type')
      .expect(204);
    expect(preflight.headers['access-control-allow-origin']).toBe('http://localhost:5173');
    expect(preflight.headers['access-control-allow-methods']).toMatch(/POST/);
    const other = await t.http.get('/api/species?q=aster').set('Origin', 'https://elsewhere.example').expect(200);
    expect(other.headers['access-control-allow-origin']).toBeUndefined();
  });
});
