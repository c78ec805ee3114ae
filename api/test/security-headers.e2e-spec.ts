import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { JwtService } from '@nestjs/jwt';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';

/** The CSP header as a map of directive → sources. */
function csp(header: string | undefined): Record<string, string[]> {
  return Object.fromEntries(
    (header ?? '')
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((d) => d[0])
      .map(([name, ...sources]) => [name, sources]),
  );
}

/**
 * Security headers, CORS and sign-in tokens with the default settings. Sources: OWASP Secure Headers
 * Project (recommended values), CSP Level 3 (W3C) for the directives, the Fetch standard's CORS protocol
 * (no Access-Control-Allow-Origin: the browser withholds the answer), RFC 7519 §4.1.4 (exp) and
 * RFC 8725 §3.1 (refuse "none" and unexpected algorithms).
 */
describe('security defaults (e2e)', () => {
  let t: TestApp;
  let token: string;

  beforeAll(async () => {
    t = await createTestApp();
    token = (await registerUser(t, { email: 'wren.halloway@example.org' })).token;
  });
  afterAll(() => t.close());

  it('sends a strict Content-Security-Policy and the usual helmet headers on every answer', async () => {
    for (const url of ['/api/health', '/api/species?q=aster', '/api/no-such-route']) {
      const res = await t.http.get(url);
      const policy = csp(res.headers['content-security-policy']);
      expect(policy['default-src']).toEqual(["'self'"]);
      expect(policy['script-src']).toEqual(["'self'"]);
      expect(policy['script-src-attr']).toEqual(["'none'"]);
      expect(policy['object-src']).toEqual(["'none'"]);
      expect(policy['frame-ancestors']).toEqual(["'none'"]);
      expect(policy['base-uri']).toEqual(["'self'"]);
      expect(policy['connect-src']).toEqual(["'self'"]);
      // Nothing is loaded from another host: no scheme-wide or remote source in any directive.
      for (const [name, sources] of Object.entries(policy))
        for (const s of sources) expect([name, s]).not.toEqual([name, expect.stringMatching(/^(https?:|\*|.*\.\w+$)/)]);
      expect(res.headers['x-frame-options']).toBe('DENY');
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      expect(res.headers['referrer-policy']).toBe('no-referrer');
      expect(res.headers['cross-origin-opener-policy']).toBe('same-origin');
      expect(res.headers['x-powered-by']).toBeUndefined();
    }
  });

  it('keeps CORS closed: no other site may read an answer or pass a preflight', async () => {
    const origin = 'https://elsewhere.example';
    const get = await t.http.get('/api/species?q=aster').set('Origin', origin).expect(200);
    expect(get.headers['access-control-allow-origin']).toBeUndefined();
    const preflight = await t.http
      .options('/api/auth/login')
      .set('Origin', origin)
      .set('Access-Control-Request-Method', 'POST')
      .set('Access-Control-Request-Headers', 'content-type');
    expect(preflight.headers['access-control-allow-origin']).toBeUndefined();
    expect(preflight.headers['access-control-allow-methods']).toBeUndefined();
  });

  it('issues tokens that live JWT_EXPIRES_IN_SECONDS (12 hours by default) and refuses expired, foreign and unsigned ones', async () => {
    const payload = JSON.parse(Buffer.from(token.split('.')[1], 'base64url').toString()) as {
      sub: string;
      iat: number;
      exp: number;
    };
    expect(payload.exp - payload.iat).toBe(43_200);
    await t.http.get('/api/me').set('Authorization', `Bearer ${token}`).expect(200);

    const secret = (await import('node:fs')).readFileSync(`${t.dataDir}/jwt-secret`, 'utf8').trim();
    const ours = new JwtService({ secret });
    const expired = ours.sign({ sub: payload.sub }, { expiresIn: -10 });
    const foreign = new JwtService({ secret: 'a'.repeat(48) }).sign({ sub: payload.sub });
    const header = Buffer.from(JSON.stringify({ alg: 'none', typ: 'JWT' })).toString('base64url');
    const unsigned = `${header}.${token.split('.')[1]}.`;
    for (const bad of [expired, foreign, unsigned]) {
      const res = await t.http.get('/api/me').set('Authorization', `Bearer ${bad}`).expect(401);
      expect(res.body.message).toMatch(/Sign in/);
    }
    // A previous secret is accepted only when one is configured (security-rotation.e2e-spec.ts).
    await t.http
      .get('/api/me')
      .set('Authorization', `Bearer ${ours.sign({ sub: payload.sub })}`)
      .expect(200);
  });
});
