import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';
import { runSql } from '../src/common/database/dialect.js';

describe("the admin's people page (e2e)", () => {
  let t: TestApp;
  let admin: { token: string; id: string };
  let grower: { token: string; id: string };
  let curator: { token: string; id: string };

  beforeAll(async () => {
    t = await createTestApp({ LOGIN_THROTTLE_LIMIT: '100' });
    const db = t.app.get(DataSource);
    admin = await registerUser(t, { email: 'wes.hollenbeck@example.org', displayName: 'Wes Hollenbeck' });
    await runSql(db, `UPDATE users SET role = 'admin' WHERE id = ?`, [admin.id]);
    curator = await registerUser(t, { email: 'ines.calder@example.org', displayName: 'Ines Calder' });
    await runSql(db, `UPDATE users SET role = 'curator' WHERE id = ?`, [curator.id]);
    grower = await registerUser(t, {
      email: 'amara.reyes@example.org',
      password: 'lantern-gravel-oboe',
      displayName: 'Amara Reyes',
    });
  });
  afterAll(() => t.close());

  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  it('lets only admins read and change people (role matrix)', async () => {
    for (const who of [grower, curator]) {
      await t.http.get('/api/users').set(as(who.token)).expect(403);
      await t.http.patch(`/api/users/${grower.id}/role`).set(as(who.token)).send({ role: 'curator' }).expect(403);
      await t.http.patch(`/api/users/${grower.id}/access`).set(as(who.token)).send({ disabled: true }).expect(403);
    }
    await t.http.get('/api/users').expect(401);
    await t.http.patch(`/api/users/${grower.id}/access`).send({ disabled: true }).expect(401);
  });

  it('lists accounts with role, groups and sign-in activity, never a hash or a token', async () => {
    await t.http.post('/api/auth/login').send({ email: 'amara.reyes@example.org', password: 'lantern-gravel-oboe' });
    const res = await t.http.get('/api/users').set(as(admin.token)).expect(200);
    const amara = res.body.find((p: { email: string }) => p.email === 'amara.reyes@example.org');
    expect(amara).toMatchObject({ role: 'member', groups: [], disabledAt: null, signInHeld: false });
    expect(amara.lastSignInAt).toEqual(expect.any(String));
    const text = JSON.stringify(res.body);
    expect(text).not.toMatch(/scrypt|passwordHash|password_hash|accessToken/);
  });

  it('shows an account held back after too many wrong passwords', async () => {
    for (let i = 0; i < 5; i++)
      await t.http.post('/api/auth/login').send({ email: 'ines.calder@example.org', password: `wrong-guess-${i}` });
    const res = await t.http.get('/api/users').set(as(admin.token)).expect(200);
    expect(res.body.find((p: { email: string }) => p.email === 'ines.calder@example.org').signInHeld).toBe(true);
  });

  it('switches an account off: its token is refused on the very next request and sign-in says why', async () => {
    await t.http.get('/api/me').set(as(grower.token)).expect(200);
    const off = await t.http.patch(`/api/users/${grower.id}/access`).set(as(admin.token)).send({ disabled: true });
    expect(off.status).toBe(200);
    expect(off.body.disabledAt).toEqual(expect.any(String));
    await t.http.get('/api/me').set(as(grower.token)).expect(401);
    const signIn = await t.http
      .post('/api/auth/login')
      .send({ email: 'amara.reyes@example.org', password: 'lantern-gravel-oboe' })
      .expect(403);
    expect(signIn.body.message).toMatch(/switched off/);
    // A wrong password still gets the same answer as for anyone, so the switch-off reveals nothing.
    await t.http
      .post('/api/auth/login')
      .send({ email: 'amara.reyes@example.org', password: 'not-her-password' })
      .expect(401);

    await t.http.patch(`/api/users/${grower.id}/access`).set(as(admin.token)).send({ disabled: false }).expect(200);
    await t.http.get('/api/me').set(as(grower.token)).expect(200);
  });

  it('never lets an admin switch off or demote themselves, so an admin always remains', async () => {
    const off = await t.http.patch(`/api/users/${admin.id}/access`).set(as(admin.token)).send({ disabled: true });
    expect(off.status).toBe(409);
    const demote = await t.http.patch(`/api/users/${admin.id}/role`).set(as(admin.token)).send({ role: 'member' });
    expect(demote.status).toBe(409);
    const [row] = await runSql(t.app.get(DataSource), `SELECT role, disabled_at FROM users WHERE id = ?`, [admin.id]);
    expect(row).toEqual({ role: 'admin', disabled_at: null });
  });

  it('answers 404 for someone who does not exist and 400 for a bad body, writing nothing', async () => {
    await t.http
      .patch('/api/users/00000000-0000-4000-8000-000000000000/access')
      .set(as(admin.token))
      .send({ disabled: true })
      .expect(404);
    const bad = await t.http
      .patch(`/api/users/${grower.id}/access`)
      .set(as(admin.token))
      .send({ disabled: 'yes' })
      .expect(400);
    expect(bad.body.fields.map((f: { field: string }) => f.field)).toEqual(['disabled']);
    const [row] = await runSql(t.app.get(DataSource), `SELECT disabled_at FROM users WHERE id = ?`, [grower.id]);
    expect(row.disabled_at).toBeNull();
  });
});
