import { expect } from '@jest/globals';
import { DataSource } from 'typeorm';
import { runSql } from '../../src/common/database/dialect.js';
import { ShareMailQueue } from '../../src/plant-share/share-mail-queue.js';
import type { TestApp } from './test-app.js';

export const GROUP_SLUG = 'larkfield-commons-growers';
export const SHARE = `/api/groups/${GROUP_SLUG}/plant-share`;
export const PUBLIC = `/api/plant-shares/${GROUP_SLUG}`;
export const PUBLIC_URL = 'https://plants.larkfield.example';

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

export async function signIn(t: TestApp, email: string, password: string): Promise<string> {
  return (await t.http.post('/api/auth/login').send({ email, password }).expect(200)).body.accessToken;
}

/** The demo people's tokens by their part in the scenario (DESIGN.md); Sol starts outside the group. */
export async function demoTokens(
  t: TestApp,
): Promise<Record<'organiser' | 'admin' | 'grower' | 'member' | 'outsider', string>> {
  return {
    organiser: await signIn(t, 'mara.ellsworth@example.org', 'larkfield-mara'),
    admin: await signIn(t, 'wes.hollenbeck@example.org', 'larkfield-wes'),
    grower: await signIn(t, 'juniper.okafor@example.org', 'larkfield-juniper'),
    member: await signIn(t, 'priya.vantongeren@example.org', 'larkfield-priya'),
    outsider: await signIn(t, 'sol.marchetti@example.org', 'larkfield-sol'),
  };
}

/** Newest message of `kind` to `to` (with a subject matching `subject` when given), as the local SMTP server received it into the outbox. */
export async function mailTo(
  t: TestApp,
  organiser: string,
  kind: string,
  to: string,
  subject?: RegExp,
): Promise<{ subject: string; text: string; html: string | null } | undefined> {
  // Plant-share mail goes out after the answer: wait until the queue has handed it to the SMTP server.
  await t.app.get(ShareMailQueue).idle();
  const res = await t.http.get('/api/outbox').query({ kind, to }).set(bearer(organiser)).expect(200);
  // Messages received within the same second have no order between them: pick by subject when asked.
  return subject ? res.body.find((m: { subject: string }) => subject.test(m.subject)) : res.body[0];
}

/** The private link's secret in a message. */
export function linkSecret(text: string, kind: 'reservations' | 'offers'): string {
  const m = new RegExp(`https://plants\\.larkfield\\.example/plant-share/${kind}/([A-Za-z0-9_-]{43})`).exec(text);
  expect(m).not.toBeNull();
  return m![1];
}

/** Everything the plant-share routes could write, to prove a refused request wrote nothing (on either database). */
export async function shareSnapshot(t: TestApp): Promise<unknown> {
  const db = t.app.get(DataSource);
  const rows = (sql: string) => runSql<Record<string, unknown>>(db, sql);
  const n = async (sql: string) => Number((await rows(sql))[0].n ?? 0);
  const joined = async (sql: string) => (await rows(sql)).map((r) => Object.values(r).join(':')).join(',');
  return {
    shares: await n('SELECT COUNT(*) AS n FROM plant_shares'),
    settings: await joined(
      'SELECT status, retention_days, per_species_limit, total_limit FROM plant_shares ORDER BY id',
    ),
    slots: await n('SELECT COUNT(*) AS n FROM share_slots'),
    booked: await n('SELECT SUM(booked) AS n FROM share_slots'),
    stock: await joined('SELECT slug, offered, remaining FROM share_stock ORDER BY id'),
    reservations: await n('SELECT COUNT(*) AS n FROM share_reservations'),
    statuses: await joined('SELECT status FROM share_reservations ORDER BY id'),
    lines: await n('SELECT COUNT(*) AS n FROM share_reservation_lines'),
    plants: await n('SELECT SUM(count) AS n FROM share_reservation_lines'),
    waitlist: await n('SELECT COUNT(*) AS n FROM share_waitlist'),
    walkUps: await n('SELECT COUNT(*) AS n FROM share_walk_ups'),
  };
}
