import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, type TestApp } from './support/test-app.js';

async function signIn(t: TestApp, email: string, password: string): Promise<string> {
  const res = await t.http.post('/api/auth/login').send({ email, password }).expect(200);
  return res.body.accessToken;
}

describe('group roles (e2e, demo data)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '50' });
  });
  afterAll(() => t.close());

  it('shows the organiser role on /api/me and lets the organiser add a grower', async () => {
    const mara = await signIn(t, 'mara.ellsworth@example.org', 'larkfield-mara');
    const me = await t.http.get('/api/me').set('Authorization', `Bearer ${mara}`).expect(200);
    expect(me.body.groups).toEqual([
      expect.objectContaining({ groupSlug: 'larkfield-commons-growers', role: 'organiser' }),
    ]);

    const added = await t.http
      .put('/api/groups/larkfield-commons-growers/members')
      .set('Authorization', `Bearer ${mara}`)
      .send({ email: 'priya.vantongeren@example.org', role: 'grower' })
      .expect(200);
    expect(added.body).toMatchObject({ displayName: 'Priya Vantongeren', role: 'grower' });
  });

  it('refuses a grower who tries to add people, and a member who asks for the list', async () => {
    const juniper = await signIn(t, 'juniper.okafor@example.org', 'larkfield-juniper');
    await t.http
      .put('/api/groups/larkfield-commons-growers/members')
      .set('Authorization', `Bearer ${juniper}`)
      .send({ email: 'sol.marchetti@example.org', role: 'organiser' })
      .expect(403);
    const sol = await signIn(t, 'sol.marchetti@example.org', 'larkfield-sol');
    await t.http.get('/api/groups/larkfield-commons-growers/members').set('Authorization', `Bearer ${sol}`).expect(403);
  });

  it('keeps demo sign-ins out of production', async () => {
    const { AuthService } = await import('../src/auth/auth.service.js');
    const { APP_CONFIG } = await import('../src/config/app-config.js');
    const config = t.app.get(APP_CONFIG);
    const auth = t.app.get(AuthService);
    config.isProduction = true;
    try {
      await expect(auth.login({ email: 'mara.ellsworth@example.org', password: 'larkfield-mara' })).rejects.toThrow(
        /wrong/,
      );
    } finally {
      config.isProduction = false;
    }
  });
});
