import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { createTestApp, registrationToken, type TestApp } from './support/test-app.js';
import { runSql } from '../src/common/database/dialect.js';

/**
 * Sign-in and sign-up in the reader's language (Accept-Language, RFC 9110 §12.5.4): refusals, the
 * password rules and the register e-mails (read back from the local outbox) are said in Spanish when
 * the request asks for it; nothing new is stored. The Spanish words are the API catalogue's own.
 */
describe('auth answers and register e-mails in the reader language (e2e, demo data)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100' });
  });
  afterAll(() => t.close());

  const mails = async (email: string): Promise<{ subject: string; text: string; html: string }[]> =>
    runSql<{ subject: string; text: string; html: string }>(
      t.app.get(DataSource),
      `SELECT subject, text, html FROM outbox_messages WHERE kind = 'registration' AND "to" LIKE ? ORDER BY received_at DESC`,
      [`%${email}%`],
    );

  it('refuses a wrong password in Spanish, and in English by default', async () => {
    const wrong = { email: 'mara.ellsworth@example.org', password: 'not-her-password' };
    const es = await t.http.post('/api/auth/login').set('Accept-Language', 'es-MX,es;q=0.9').send(wrong).expect(401);
    expect(es.body.message).toBe('El correo o la contraseña no son correctos.');
    const en = await t.http.post('/api/auth/login').send(wrong).expect(401);
    expect(en.body.message).toBe('E-mail or password is wrong.');
  });

  it('says the password rule in Spanish, naming the field', async () => {
    // "password123": a common password with a digit run, below zxcvbn score 3 (the library's own lists).
    const res = await t.http
      .post('/api/auth/register')
      .set('Accept-Language', 'es')
      .send({ email: 'nuevo.vecino@example.org', password: 'password123', displayName: 'Nuevo Vecino' })
      .expect(400);
    expect(res.body.fields).toEqual([
      {
        field: 'password',
        message:
          'es demasiado fácil de adivinar (una contraseña común o un patrón sencillo): prueba con tres o cuatro palabras sin relación entre sí',
      },
    ]);
  });

  it('sends the confirmation link in Spanish to a Spanish sign-up, and a refused link is said in Spanish', async () => {
    await t.http
      .post('/api/auth/register')
      .set('Accept-Language', 'es')
      .send({ email: 'nueva.vecina@example.org', password: 'cedro-lluvia-pradera-9', displayName: 'Nueva Vecina' })
      .expect(202);
    const [mail] = await mails('nueva.vecina@example.org');
    expect(mail.subject).toBe('Confirma tu dirección para Homeground');
    expect(mail.text).toContain('Hola, Nueva Vecina:');
    expect(mail.text).toContain('El enlace sirve durante');
    expect(mail.html).toContain('<html lang="es">');
    expect(await registrationToken(t, 'nueva.vecina@example.org')).not.toBeNull();

    const refused = await t.http
      .post('/api/auth/register/confirm')
      .set('Accept-Language', 'es')
      .send({ token: 'A'.repeat(43) })
      .expect(404);
    expect(refused.body.message).toMatch(/^Este enlace de confirmación ya se usó/);
  });

  it('tells an existing account owner in the language of the sign-up request', async () => {
    await t.http
      .post('/api/auth/register')
      .set('Accept-Language', 'es')
      .send({ email: 'theo.lindqvist@example.org', password: 'cedro-lluvia-pradera-9', displayName: 'Theo' })
      .expect(202);
    const [mail] = await mails('theo.lindqvist@example.org');
    expect(mail.subject).toBe('Ya tienes una cuenta de Homeground');
    expect(mail.text).toContain('Si fuiste tú, inicia sesión con tu contraseña.');
    expect(mail.text).not.toMatch(/register\/confirm/);
  });
});
