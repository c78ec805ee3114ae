import { expect } from '@jest/globals';
import { DataSource } from 'typeorm';
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

/** Everything the plant-share routes could write, to prove a refused request wrote nothing. */
export async function shareSnapshot(t: TestApp): Promise<unknown> {
  return t.app.get(DataSource).query(`SELECT
    (SELECT COUNT(*) FROM plant_shares) AS shares,
    (SELECT group_concat(status || retention_days || per_species_limit || total_limit) FROM plant_shares) AS settings,
    (SELECT COUNT(*) FROM share_slots) AS slots,
    (SELECT SUM(booked) FROM share_slots) AS booked,
    (SELECT group_concat(slug || ':' || offered || ':' || remaining) FROM (SELECT * FROM share_stock ORDER BY id)) AS stock,
    (SELECT COUNT(*) FROM share_reservations) AS reservations,
    (SELECT group_concat(status) FROM (SELECT status FROM share_reservations ORDER BY id)) AS statuses,
    (SELECT COUNT(*) FROM share_reservation_lines) AS lines,
    (SELECT SUM(count) FROM share_reservation_lines) AS plants,
    (SELECT COUNT(*) FROM share_waitlist) AS waitlist,
    (SELECT COUNT(*) FROM share_walk_ups) AS walkUps`);
}
