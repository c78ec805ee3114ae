import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, type TestApp } from './support/test-app.js';

const GROUP = '/api/groups/larkfield-commons-growers';
const PUBLIC_URL = 'https://plants.larkfield.example';

async function signIn(t: TestApp, email: string, password: string): Promise<string> {
  return (await t.http.post('/api/auth/login').send({ email, password }).expect(200)).body.accessToken;
}
const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

/** The invitation link in the newest message to `to`, read from the outbox as the local mail server received it. */
async function linkFromOutbox(
  t: TestApp,
  token: string,
  to: string,
): Promise<{ link: string; secret: string; subject: string; html: string | null }> {
  const res = await t.http.get('/api/outbox').query({ kind: 'invitation', to }).set(bearer(token)).expect(200);
  expect(res.body.length).toBeGreaterThan(0);
  const mail = res.body[0];
  expect(mail.to).toEqual([to]);
  const match = /https:\/\/plants\.larkfield\.example\/invitations\/([A-Za-z0-9_-]{43})/.exec(mail.text);
  expect(match).not.toBeNull();
  return { link: match![0], secret: match![1], subject: mail.subject, html: mail.html };
}

describe('group invitations and the local outbox (e2e, demo data)', () => {
  let t: TestApp;
  let mara: string;
  let juniper: string;
  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100', PUBLIC_URL });
    mara = await signIn(t, 'mara.ellsworth@example.org', 'larkfield-mara');
    juniper = await signIn(t, 'juniper.okafor@example.org', 'larkfield-juniper');
  });
  afterAll(() => t.close());

  it('e-mails a new person a link on the public address; the link makes their account and joins them as a grower', async () => {
    const sent = await t.http
      .post(`${GROUP}/invitations`)
      .set(bearer(mara))
      .send({ email: 'Rowan.Pell@example.org', role: 'grower' })
      .expect(201);
    expect(sent.body).toMatchObject({ email: 'rowan.pell@example.org', role: 'grower', acceptedAt: null });
    expect(JSON.stringify(sent.body)).not.toMatch(/token/i);

    const mail = await linkFromOutbox(t, mara, 'rowan.pell@example.org');
    expect(mail.subject).toBe('Mara Ellsworth invites you to Larkfield Commons Growers');
    expect(mail.html).toContain(mail.link);

    const preview = await t.http.get(`/api/invitations/${mail.secret}`).expect(200);
    expect(preview.body).toMatchObject({
      groupName: 'Larkfield Commons Growers',
      role: 'grower',
      email: 'rowan.pell@example.org',
      accountExists: false,
    });

    // Without a name and password nothing is written: no account, and the link still works.
    const bad = await t.http.post(`/api/invitations/${mail.secret}/accept`).send({}).expect(400);
    expect(bad.body.fields.map((f: { field: string }) => f.field).sort()).toEqual(['displayName', 'password']);
    await t.http
      .post('/api/auth/login')
      .send({ email: 'rowan.pell@example.org', password: 'a-long-garden-password' })
      .expect(401);

    const joined = await t.http
      .post(`/api/invitations/${mail.secret}/accept`)
      .send({ displayName: 'Rowan Pell', password: 'a-long-garden-password' })
      .expect(200);
    expect(joined.body.user.groups).toEqual([
      expect.objectContaining({ groupSlug: 'larkfield-commons-growers', role: 'grower' }),
    ]);
    await t.http
      .post(`/api/invitations/${mail.secret}/accept`)
      .send({ displayName: 'Rowan Again', password: 'another-long-password' })
      .expect(410);
  });

  // The invited person reads the page in their own language: every refusal of the link and of the new
  // account (missing name, weak password, used link) comes back in Spanish for Accept-Language es.
  // The Spanish words are the API catalogue's; the weak-password rule is zxcvbn's (see auth-languages).
  it('says the invitation refusals and the password check in Spanish for a Spanish reader', async () => {
    await t.http
      .post(`${GROUP}/invitations`)
      .set(bearer(mara))
      .send({ email: 'larkfield.newcomer@example.org', role: 'member' })
      .expect(201);
    const { secret } = await linkFromOutbox(t, mara, 'larkfield.newcomer@example.org');
    const es = { 'Accept-Language': 'es' };
    const missing = await t.http.post(`/api/invitations/${secret}/accept`).set(es).send({}).expect(400);
    expect(missing.body.message).toBe('Para unirte, escribe tu nombre y elige una contraseña.');
    expect(missing.body.fields).toContainEqual({ field: 'password', message: 'hace falta para crear tu cuenta' });
    const short = await t.http
      .post(`/api/invitations/${secret}/accept`)
      .set(es)
      .send({ displayName: 'Vecina Nueva', password: 'corta' })
      .expect(400);
    expect(short.body.fields).toEqual([{ field: 'password', message: 'debe tener al menos 10 caracteres' }]);
    // "password123": a common password with a digit run, below zxcvbn score 3 (the library's own lists).
    const weak = await t.http
      .post(`/api/invitations/${secret}/accept`)
      .set(es)
      .send({ displayName: 'Vecina Nueva', password: 'password123' })
      .expect(400);
    expect(weak.body.fields[0].message).toMatch(/^es demasiado fácil de adivinar/);
    await t.http
      .post(`/api/invitations/${secret}/accept`)
      .send({ displayName: 'Vecina Nueva', password: 'cedro-lluvia-pradera-9' })
      .expect(200);
    const used = await t.http.get(`/api/invitations/${secret}`).set(es).expect(410);
    expect(used.body.message).toBe('Esta invitación ya se usó.');
    const english = await t.http.get(`/api/invitations/${secret}`).expect(410);
    expect(english.body.message).toBe('This invitation has already been used.');
  });

  it('lets an existing account accept only when signed in with the invited address', async () => {
    await t.http
      .post(`${GROUP}/invitations`)
      .set(bearer(mara))
      .send({ email: 'sol.marchetti@example.org', role: 'member' })
      .expect(201);
    const { secret } = await linkFromOutbox(t, mara, 'sol.marchetti@example.org');
    expect((await t.http.get(`/api/invitations/${secret}`).expect(200)).body.accountExists).toBe(true);
    await t.http.post(`/api/invitations/${secret}/accept`).send({}).expect(409);
    const priya = await signIn(t, 'priya.vantongeren@example.org', 'larkfield-priya');
    await t.http.post(`/api/invitations/${secret}/accept`).set(bearer(priya)).send({}).expect(403);
    const sol = await signIn(t, 'sol.marchetti@example.org', 'larkfield-sol');
    const joined = await t.http.post(`/api/invitations/${secret}/accept`).set(bearer(sol)).send({}).expect(200);
    expect(joined.body.user.groups).toEqual([expect.objectContaining({ role: 'member' })]);
    await t.http
      .post(`${GROUP}/invitations`)
      .set(bearer(mara))
      .send({ email: 'sol.marchetti@example.org', role: 'grower' })
      .expect(409);
  });

  it('keeps invitations, the outbox and e-mail addresses to organisers and admins', async () => {
    await t.http
      .post(`${GROUP}/invitations`)
      .set(bearer(juniper))
      .send({ email: 'someone@example.org', role: 'grower' })
      .expect(403);
    await t.http.get(`${GROUP}/invitations`).set(bearer(juniper)).expect(403);
    await t.http.get('/api/outbox').set(bearer(juniper)).expect(403);
    await t.http.get('/api/outbox').expect(401);
    const wes = await signIn(t, 'wes.hollenbeck@example.org', 'larkfield-wes');
    expect((await t.http.get('/api/outbox').set(bearer(wes)).expect(200)).body.length).toBeGreaterThanOrEqual(2);

    const seenByGrower = await t.http.get(`${GROUP}/members`).set(bearer(juniper)).expect(200);
    expect(seenByGrower.body.every((m: { email: string | null }) => m.email === null)).toBe(true);
    const seenByOrganiser = await t.http.get(`${GROUP}/members`).set(bearer(mara)).expect(200);
    expect(seenByOrganiser.body.find((m: { displayName: string }) => m.displayName === 'Juniper Okafor').email).toBe(
      'juniper.okafor@example.org',
    );
  });

  it('answers bad invitations with 400 naming the field, and writes nothing', async () => {
    const before = (await t.http.get(`${GROUP}/invitations`).set(bearer(mara)).expect(200)).body.length;
    const cases: [object, string][] = [
      [{ email: 'not-an-address', role: 'grower' }, 'email'],
      [{ email: 'a@example.org', role: 'boss' }, 'role'],
      [{ email: 'a@example.org', role: 'grower', admin: true }, 'admin'],
    ];
    for (const [body, field] of cases) {
      const res = await t.http.post(`${GROUP}/invitations`).set(bearer(mara)).send(body).expect(400);
      expect(res.body.fields.map((f: { field: string }) => f.field)).toContain(field);
    }
    await t.http.get('/api/invitations/short').expect(400);
    await t.http.get(`/api/invitations/${'x'.repeat(43)}`).expect(404);
    expect((await t.http.get(`${GROUP}/invitations`).set(bearer(mara)).expect(200)).body.length).toBe(before);
  });

  it('lets organisers remove people, but never the last organiser', async () => {
    const members = (await t.http.get(`${GROUP}/members`).set(bearer(mara)).expect(200)).body as {
      userId: string;
      displayName: string;
    }[];
    const sol = members.find((m) => m.displayName === 'Sol Marchetti')!;
    const maraId = members.find((m) => m.displayName === 'Mara Ellsworth')!.userId;
    await t.http.delete(`${GROUP}/members/${sol.userId}`).set(bearer(juniper)).expect(403);
    await t.http.delete(`${GROUP}/members/${sol.userId}`).set(bearer(mara)).expect(204);
    await t.http.delete(`${GROUP}/members/${maraId}`).set(bearer(mara)).expect(409);
    const after = (await t.http.get(`${GROUP}/members`).set(bearer(mara)).expect(200)).body as {
      displayName: string;
    }[];
    expect(after.map((m) => m.displayName)).not.toContain('Sol Marchetti');
  });
});
