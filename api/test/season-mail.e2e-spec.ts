import { rmSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import { addDays, isoWeek } from '@homeground/shared';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { SeasonMailService } from '../src/season-mail/season-mail.service.js';
import { createTestApp, type TestApp } from './support/test-app.js';

const SEASON = '/api/groups/larkfield-commons-growers/season';
const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
const today = () => new Date().toISOString().slice(0, 10);

interface Mail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  kind: string;
}

/**
 * Frost warnings and weekly summaries, read back from what the local SMTP server received (the
 * outbox): who got a message and what it says. The demo season (api/src/demo) gives Amara sown
 * outdoor pots, Juniper covered containers not sown yet and Theo batches indoors under lights, so
 * on a night this winter only Amara has plants outdoors. What to do on a frosty night is ordinary
 * home-grower practice (from memory); the ISO week is ISO 8601's (checked in shared).
 */
describe('frost warnings and weekly summaries by e-mail (e2e, demo data)', () => {
  let t: TestApp;
  let http: ReturnType<typeof request>;
  let app: NestExpressApplication;
  const who: Record<string, string> = {};

  async function signInAll() {
    const people: [string, string, string][] = [
      ['organiser', 'mara.ellsworth@example.org', 'larkfield-mara'],
      ['admin', 'wes.hollenbeck@example.org', 'larkfield-wes'],
      ['juniper', 'juniper.okafor@example.org', 'larkfield-juniper'],
      ['theo', 'theo.lindqvist@example.org', 'larkfield-theo'],
      ['amara', 'amara.reyes@example.org', 'larkfield-amara'],
      ['member', 'priya.vantongeren@example.org', 'larkfield-priya'],
      ['curator', 'ines.calder@example.org', 'larkfield-ines'],
    ];
    for (const [role, email, password] of people)
      who[role] = (await http.post('/api/auth/login').send({ email, password }).expect(200)).body.accessToken;
  }
  const outbox = async (kind: string): Promise<Mail[]> =>
    (await http.get('/api/outbox').query({ kind }).set(bearer(who.organiser)).expect(200)).body;
  const count = async (table: string) =>
    Number((await app.get(DataSource).query(`SELECT COUNT(*) AS n FROM ${table}`))[0].n);

  beforeAll(async () => {
    t = await createTestApp({
      DEMO_DATA: 'true',
      LOGIN_THROTTLE_LIMIT: '100',
      PUBLIC_URL: 'https://plants.larkfield.example',
    });
    http = t.http;
    app = t.app;
    await signInAll();
  });
  afterAll(async () => {
    await app.close();
    rmSync(t.dataDir, { recursive: true, force: true });
  });

  describe('who may send (role matrix)', () => {
    const night = () => addDays(today(), 1);
    it.each([
      ['a grower', 'juniper', 403],
      ['a member', 'member', 403],
      ['a curator outside the group', 'curator', 403],
    ])('%s cannot send a frost warning or the weekly summary', async (_what, as, status) => {
      await http.post(`${SEASON}/frost-warning`).set(bearer(who[as])).send({ night: night() }).expect(status);
      await http.post(`${SEASON}/weekly-summary`).set(bearer(who[as])).send({}).expect(status);
    });
    it('nobody signed in gets 401', async () => {
      await http.post(`${SEASON}/frost-warning`).send({ night: night() }).expect(401);
      await http.post(`${SEASON}/weekly-summary`).send({}).expect(401);
    });
    it('an unknown group is 404', async () => {
      await http
        .post('/api/groups/no-such-group/season/frost-warning')
        .set(bearer(who.organiser))
        .send({ night: night() })
        .expect(404);
    });
    it('a grower and a member cannot read what was sent', async () => {
      await http.get('/api/outbox').set(bearer(who.amara)).expect(403);
      await http.get('/api/outbox').set(bearer(who.member)).expect(403);
    });
  });

  it('a frost warning goes only to growers with plants outdoors, saying what to cover', async () => {
    const night = addDays(today(), 1);
    const res = await http
      .post(`${SEASON}/frost-warning`)
      .set(bearer(who.organiser))
      .send({ night, note: 'The forecast low is 28 °F (−2 °C).' })
      .expect(200);
    expect(res.body.growers.map((g: { displayName: string }) => g.displayName)).toEqual(['Amara Reyes']);
    expect(JSON.stringify(res.body)).not.toContain('@'); // no addresses in the answer

    const mails = await outbox('frost-warning');
    expect(mails).toHaveLength(1);
    const [mail] = mails;
    expect(mail.to).toEqual(['amara.reyes@example.org']);
    expect(mail.subject).toMatch(/^Frost tonight\? Protect your seedlings: Larkfield Commons Growers/);
    // Her two sown outdoor-pot batches (demo-batches.ts), each with what to do.
    expect(mail.text).toContain(
      'Butterfly milkweed: cover the pots with frost cloth or an old sheet, or move them against the house.',
    );
    expect(mail.text).toContain('Calico aster: cover the pots');
    expect(mail.text).not.toContain('Wild bergamot'); // not sown yet: nothing outdoors to protect
    expect(mail.text).toContain('Mara Ellsworth adds: The forecast low is 28 °F (−2 °C).');
    expect(mail.text).toContain('https://plants.larkfield.example/my-batches');
    expect(mail.html).toContain('Butterfly milkweed: cover the pots');
  });

  it('refuses a night in the past or too far ahead with a 400 naming night, and sends nothing', async () => {
    const before = (await outbox('frost-warning')).length;
    for (const night of [addDays(today(), -1), addDays(today(), 15)]) {
      const res = await http.post(`${SEASON}/frost-warning`).set(bearer(who.organiser)).send({ night }).expect(400);
      expect(res.body.fields.map((f: { field: string }) => f.field)).toEqual(['night']);
    }
    expect(await outbox('frost-warning')).toHaveLength(before);
  });

  it('the weekly summary goes once a week to each grower, even after a restart', async () => {
    const week = isoWeek(today());
    const first = await http.post(`${SEASON}/weekly-summary`).set(bearer(who.organiser)).send({}).expect(200);
    expect(first.body).toEqual({ week, sent: 3, alreadySent: 0 });

    const mails = await outbox('weekly-summary');
    expect(mails.map((m) => m.to[0]).sort()).toEqual([
      'amara.reyes@example.org',
      'juniper.okafor@example.org',
      'theo.lindqvist@example.org',
    ]);
    const amara = mails.find((m) => m.to[0] === 'amara.reyes@example.org')!;
    expect(amara.subject).toBe('Your batches this week: Larkfield Commons Growers');
    expect(amara.text).toMatch(/Wild bergamot: Sow, \w+day, \w+ \d+\./);
    expect(amara.text).toMatch(/Wild bergamot: Not sown yet/); // the demo's batch behind plan
    expect(amara.text).not.toContain('Juniper'); // only her own batches
    const theo = mails.find((m) => m.to[0] === 'theo.lindqvist@example.org')!;
    expect(theo.text).not.toContain('Butterfly milkweed');

    const again = await http.post(`${SEASON}/weekly-summary`).set(bearer(who.organiser)).send({}).expect(200);
    expect(again.body).toEqual({ week, sent: 0, alreadySent: 3 });

    // Restart the API on the same database: the scheduled run finds the week already sent.
    await app.close();
    const { AppModule } = await import('../src/app.module.js');
    const { configureApp } = await import('../src/app.factory.js');
    const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
    app = moduleRef.createNestApplication<NestExpressApplication>({ logger: ['error'] });
    configureApp(app);
    await app.init();
    http = request(app.getHttpServer());
    await signInAll();
    const service = app.get(SeasonMailService);
    expect((await service.runWeekly(today()))['larkfield-commons-growers']).toEqual({ week, sent: 0, alreadySent: 3 });
    expect(await count('weekly_summaries_sent')).toBe(3);
    expect(await outbox('weekly-summary')).toHaveLength(3);

    // Next week is a new week.
    const nextWeek = addDays(today(), 7);
    expect((await service.runWeekly(nextWeek))['larkfield-commons-growers']).toEqual({
      week: isoWeek(nextWeek),
      sent: 3,
      alreadySent: 0,
    });
    expect(await outbox('weekly-summary')).toHaveLength(6);
  });

  // The language is what the database already knows of the grower: Amara reserves plants at the share
  // with the page in Spanish (Accept-Language: es, RFC 9110 §12.5.4), so her next summaries are Spanish.
  it('writes a grower’s weekly summary in the language of her latest plant-share reservation', async () => {
    const PUBLIC = '/api/plant-shares/larkfield-commons-growers';
    const slotId = (await http.get(PUBLIC).expect(200)).body.slots[3].id;
    await http
      .post(`${PUBLIC}/reservations`)
      .set('Accept-Language', 'es')
      .send({
        name: 'Amara Reyes',
        email: 'Amara.Reyes@example.org',
        zip: '54665',
        slotId,
        lines: [{ speciesSlug: 'asclepias-incarnata', count: 1 }],
      })
      .expect(201);
    const inTwoWeeks = addDays(today(), 14);
    // Earlier summaries may carry the same second, so the new ones are told apart by id, not by order.
    const before = new Set((await outbox('weekly-summary')).map((m) => m.id));
    await app.get(SeasonMailService).runWeekly(inTwoWeeks);
    const fresh = (await outbox('weekly-summary')).filter((m) => !before.has(m.id));
    expect(fresh.filter((m) => m.to[0] === 'amara.reyes@example.org')).toHaveLength(1);
    const amara = fresh.find((m) => m.to[0] === 'amara.reyes@example.org')!;
    expect(amara.subject).toBe('Tus lotes esta semana: Larkfield Commons Growers');
    expect(amara.text).toContain('Hola, Amara Reyes:');
    // The demo's batch behind plan, in the shared Spanish batch words.
    expect(amara.text).toMatch(/Wild bergamot: Todavía sin sembrar/);
    const juniper = fresh.find((m) => m.to[0] === 'juniper.okafor@example.org')!;
    expect(juniper.subject).toBe('Your batches this week: Larkfield Commons Growers');
  });
});
