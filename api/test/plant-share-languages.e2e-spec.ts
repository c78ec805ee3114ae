import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { runSql } from '../src/common/database/dialect.js';
import { ShareMailQueue } from '../src/plant-share/share-mail-queue.js';
import { bearer, demoTokens, GROUP_SLUG, mailTo, PUBLIC, PUBLIC_URL } from './support/plant-share.js';
import { createTestApp, type TestApp } from './support/test-app.js';

type Tokens = Awaited<ReturnType<typeof demoTokens>>;

/**
 * E-mails in the reader's language, read back from the local SMTP server's outbox: a Spanish
 * reservation (Accept-Language: es, RFC 9110 §12.5.4) gets its confirmation in Spanish, an English
 * one in English; the language is kept with the reservation; an invitation follows the inviter's
 * page language. Dates are Intl's for es-US and en-US (CLDR); the Spanish words are the catalogues'.
 */
describe('plant-share and invitation e-mails in the reader language (e2e, demo data)', () => {
  let t: TestApp;
  let tokens: Tokens;
  let slotId: string;

  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100', PUBLIC_URL });
    tokens = await demoTokens(t);
    // The demo share's fourth slot: 12 June 2027, 10:30–11:00 at Larkfield Commons Hall.
    slotId = (await t.http.get(PUBLIC).expect(200)).body.slots[3].id;
  });
  afterAll(async () => {
    await t.app.get(ShareMailQueue).idle();
    await t.close();
  });

  const reserve = (name: string, language: string) =>
    t.http
      .post(`${PUBLIC}/reservations`)
      .set('Accept-Language', language)
      .send({
        name,
        email: `${name.toLowerCase().replace(/ /g, '.')}@example.org`,
        zip: '54665',
        slotId,
        lines: [{ speciesSlug: 'asclepias-incarnata', count: 2 }],
      })
      .expect(201);

  it('confirms a Spanish reservation in Spanish: the slot, the care sheet and the link', async () => {
    const reserved = await reserve('Theo Lindqvist', 'es-MX,es;q=0.9');
    const mail = await mailTo(t, tokens.organiser, 'plant-share-reservation', 'theo.lindqvist@example.org');
    expect(mail).toBeDefined();
    expect(mail!.subject).toMatch(/^Tus plantas están reservadas: reparto de plantas de Larkfield Commons Growers/);
    expect(mail!.text).toContain('Hola, Theo Lindqvist:');
    // 12 June 2027 is a Saturday (Gregorian calendar); "sáb" and "jun" are CLDR's es-US abbreviations.
    expect(mail!.text).toMatch(/Horario de recogida: sáb, 12 (de )?jun (de )?2027, 10:30–11:00\./);
    expect(mail!.text).toContain('Hoja de cuidados:');
    // Swamp milkweed's record: best in full sun (the shared Spanish sun word "pleno sol").
    expect(mail!.text).toMatch(/swamp milkweed \(Asclepias incarnata\): Mejor a pleno sol/);
    expect(mail!.text).toMatch(/de distancia\./);
    expect(mail!.text).toMatch(/Savia irritante: /);
    expect(mail!.text).toContain('llama al 811');
    expect(mail!.text).toContain(`Cambiar o cancelar tu reserva: ${PUBLIC_URL}/plant-share/reservations/`);
    expect(mail!.text).not.toMatch(/Pickup slot|Care sheet|Best in/);
    expect(mail!.html).toContain('<html lang="es">');

    const [row] = await runSql<{ locale: string }>(
      t.app.get(DataSource),
      `SELECT locale FROM share_reservations WHERE email = ?`,
      ['theo.lindqvist@example.org'],
    );
    expect(row.locale).toBe('es');
    expect(reserved.body.status).toBe('confirmed');
    // The answer's care sheet too: the caution said in Spanish (shared Spanish caution table), the
    // record's own sentence after it, marked as English.
    const [sheet] = reserved.body.careSheet;
    expect(sheet.sun).toMatch(/^Mejor a pleno sol/);
    expect(sheet.cautions[0]).toMatch(
      /^Savia irritante: Su savia puede irritar la piel y los ojos\. En la ficha \(en inglés\): /,
    );
    expect(mail!.text).toContain('En la ficha (en inglés)');
    // The private link read in English later shows the sheet in English.
    const token = /reservations\/([A-Za-z0-9_-]+)/.exec(mail!.text)![1];
    const later = (await t.http.get(`/api/reservations/${token}`).set('Accept-Language', 'en').expect(200)).body;
    expect(later.careSheet[0].sun).toMatch(/^Best in full sun/);
  });

  it('says the plant share page notes and caution titles in Spanish when asked', async () => {
    const es = (await t.http.get(PUBLIC).set('Accept-Language', 'es').expect(200)).body;
    expect(es.notes[0]).toBe(
      'Las precauciones aparecen con cada planta, como en su ficha: usa guantes con las plantas de savia irritante y lávate las manos después de tocarlas.',
    );
    expect(es.notes[1]).toMatch(/^Antes de cavar, llama al 811/);
    const titles = es.species.flatMap((s: { cautions: { title: string }[] }) => s.cautions.map((c) => c.title));
    expect(titles).toContain('Savia irritante');
    const en = (await t.http.get(PUBLIC).expect(200)).body;
    expect(en.notes[0]).toMatch(/^Cautions are shown with each plant/);
  });

  it('confirms an English reservation in English, and a reader with no language of ours gets English', async () => {
    await reserve('Juniper Okafor', 'en-US');
    const mail = await mailTo(t, tokens.organiser, 'plant-share-reservation', 'juniper.okafor@example.org');
    expect(mail!.subject).toMatch(/^Your plants are reserved: Larkfield Commons Growers plant share/);
    expect(mail!.text).toContain('Pickup slot: Sat, Jun 12, 2027, 10:30–11:00.');
    expect(mail!.text).toMatch(/swamp milkweed \(Asclepias incarnata\): Best in full sun/);
    expect(mail!.html).toContain('<html lang="en">');

    await reserve('Amara Reyes', 'de-DE');
    const german = await mailTo(t, tokens.organiser, 'plant-share-reservation', 'amara.reyes@example.org');
    expect(german!.text).toContain('Pickup slot:');
  });

  it('writes an invitation in the inviter page language', async () => {
    await t.http
      .post(`/api/groups/${GROUP_SLUG}/invitations`)
      .set(bearer(tokens.organiser))
      .set('Accept-Language', 'es')
      .send({ email: 'sol.marchetti@example.org', role: 'grower' })
      .expect(201);
    const res = await t.http
      .get('/api/outbox')
      .query({ kind: 'invitation', to: 'sol.marchetti@example.org' })
      .set(bearer(tokens.organiser))
      .expect(200);
    const mail = res.body[0];
    expect(mail.subject).toBe('Mara Ellsworth te invita a Larkfield Commons Growers');
    expect(mail.text).toContain('como cultivador/a');
    expect(mail.text).toContain('El enlace de abajo sirve durante');
  });
});
