import type { LogEntryRequest } from '@homeground/shared';
import { describe, expect, it } from 'vitest';
import { ApiRequestError } from '../../../lib/api-request-error.js';
import { openLogOutboxDb } from './log-outbox-db.js';
import { createLogOutbox, isRetryable, type SendLogEntry } from './log-outbox.js';

/**
 * The device's batch-log outbox over IndexedDB (fake-indexeddb in jsdom). What is checked is the
 * promise to the grower: an entry stays until the server holds it, goes with the same clientId every
 * time (the API keeps one entry per clientId, batches.service.ts), goes oldest first, and a refusal is
 * kept and shown rather than dropped. The status classes follow RFC 9110 (4xx: the request itself is
 * wrong, do not repeat it unchanged; 5xx and 408/429: try again later).
 */
let dbCount = 0;
const fresh = () => {
  const db = openLogOutboxDb(`outbox-test-${++dbCount}`);
  return { db, outbox: createLogOutbox(db) };
};
const offline = () => new ApiRequestError({ statusCode: 0, error: 'Network error', message: 'offline' });
const sown = (clientId: string, count = 60, date = '2027-01-10'): LogEntryRequest & { clientId: string } => ({
  kind: 'sown',
  count,
  date,
  clientId,
});
const ID_A = '11111111-1111-4111-8111-111111111111';
const ID_B = '22222222-2222-4222-8222-222222222222';

/** A stand-in API that keeps one entry per clientId, as the real one does. */
function fakeApi() {
  const held = new Map<string, LogEntryRequest>();
  let calls = 0;
  let reachable = true;
  const send: SendLogEntry = async (_slug, _batchId, entry) => {
    calls++;
    if (!reachable) throw offline();
    if (entry.clientId && !held.has(entry.clientId)) held.set(entry.clientId, entry);
    return {};
  };
  return {
    send,
    held,
    get calls() {
      return calls;
    },
    setReachable: (r: boolean) => {
      reachable = r;
    },
  };
}

describe('batch-log outbox', () => {
  it('keeps an entry while offline and sends it once the connection returns', async () => {
    const { outbox } = fresh();
    const api = fakeApi();
    api.setReachable(false);
    await outbox.keep({ clientId: ID_A, userId: 'u1', slug: 'g', batchId: 'b1', entry: sown(ID_A) });

    const first = await outbox.flush('u1', 'g', api.send);
    expect(first).toEqual({ sent: [], refused: [], stopped: true });
    expect(await outbox.list('u1', 'g')).toHaveLength(1);

    api.setReachable(true);
    const second = await outbox.flush('u1', 'g', api.send);
    expect(second.sent).toEqual([ID_A]);
    expect(await outbox.list('u1', 'g')).toEqual([]);
    expect([...api.held.keys()]).toEqual([ID_A]);
  });

  it('an entry whose answer was lost is sent again with the same clientId and held once', async () => {
    const { outbox } = fresh();
    const api = fakeApi();
    await outbox.keep({ clientId: ID_A, userId: 'u1', slug: 'g', batchId: 'b1', entry: sown(ID_A) });
    // The server stores it, but the answer never reaches the phone.
    const lostAnswer: SendLogEntry = async (...args) => {
      await api.send(...args);
      throw offline();
    };
    await outbox.flush('u1', 'g', lostAnswer);
    expect(await outbox.list('u1', 'g')).toHaveLength(1);
    await outbox.flush('u1', 'g', api.send);
    expect(api.calls).toBe(2);
    expect(api.held.size).toBe(1);
    expect(await outbox.list('u1', 'g')).toEqual([]);
  });

  it('sends oldest first and stops at the first entry that cannot go, keeping the rest in order', async () => {
    const { outbox } = fresh();
    const order: string[] = [];
    await outbox.keep(
      { clientId: ID_B, userId: 'u1', slug: 'g', batchId: 'b1', entry: sown(ID_B) },
      '2027-01-11T08:00:00Z',
    );
    await outbox.keep(
      { clientId: ID_A, userId: 'u1', slug: 'g', batchId: 'b1', entry: sown(ID_A) },
      '2027-01-10T08:00:00Z',
    );
    const result = await outbox.flush('u1', 'g', async (_s, _b, e) => {
      order.push(e.clientId ?? '');
      throw offline();
    });
    expect(order).toEqual([ID_A]);
    expect(result.stopped).toBe(true);
    expect((await outbox.list('u1', 'g')).map((e) => e.clientId)).toEqual([ID_A, ID_B]);
  });

  it('keeps a refused entry, marked with the reason, and goes on with the others', async () => {
    const { outbox } = fresh();
    const api = fakeApi();
    await outbox.keep(
      { clientId: ID_A, userId: 'u1', slug: 'g', batchId: 'b1', entry: sown(ID_A) },
      '2027-01-10T08:00:00Z',
    );
    await outbox.keep(
      { clientId: ID_B, userId: 'u1', slug: 'g', batchId: 'b2', entry: sown(ID_B) },
      '2027-01-11T08:00:00Z',
    );
    const refusal = new ApiRequestError({
      statusCode: 400,
      error: 'Bad Request',
      message: 'more came up than were sown',
      fields: [{ field: 'count', message: 'more came up than were sown' }],
    });
    const result = await outbox.flush('u1', 'g', async (slug, batchId, e) => {
      if (batchId === 'b1') throw refusal;
      return api.send(slug, batchId, e);
    });
    expect(result.sent).toEqual([ID_B]);
    expect(result.refused.map((r) => r.clientId)).toEqual([ID_A]);
    const left = await outbox.list('u1', 'g');
    expect(left).toHaveLength(1);
    expect(left[0]).toMatchObject({ clientId: ID_A, refused: 'more came up than were sown' });
    // A refused entry is not sent again by itself; the grower removes it.
    const again = await outbox.flush('u1', 'g', api.send);
    expect(again.sent).toEqual([]);
    await outbox.remove(ID_A);
    expect(await outbox.list('u1', 'g')).toEqual([]);
  });

  it('sends only the signed-in grower’s entries for the group', async () => {
    const { outbox } = fresh();
    const api = fakeApi();
    await outbox.keep({ clientId: ID_A, userId: 'u1', slug: 'g', batchId: 'b1', entry: sown(ID_A) });
    await outbox.keep({ clientId: ID_B, userId: 'u2', slug: 'g', batchId: 'b9', entry: sown(ID_B) });
    const result = await outbox.flush('u1', 'g', api.send);
    expect(result.sent).toEqual([ID_A]);
    expect(await outbox.list('u2', 'g')).toHaveLength(1);
  });

  it('two sends at once (page opening and the online event) send each entry once', async () => {
    const { outbox } = fresh();
    const api = fakeApi();
    await outbox.keep({ clientId: ID_A, userId: 'u1', slug: 'g', batchId: 'b1', entry: sown(ID_A) });
    const [a, b] = await Promise.all([outbox.flush('u1', 'g', api.send), outbox.flush('u1', 'g', api.send)]);
    expect(api.calls).toBe(1);
    expect(a.sent).toEqual([ID_A]);
    expect(b.sent).toContain(ID_A);
  });

  it('an entry kept while a send runs is sent by the send that waited for it', async () => {
    const { outbox } = fresh();
    const api = fakeApi();
    await outbox.keep({ clientId: ID_A, userId: 'u1', slug: 'g', batchId: 'b1', entry: sown(ID_A) });
    const first = outbox.flush('u1', 'g', api.send);
    await outbox.keep({ clientId: ID_B, userId: 'u1', slug: 'g', batchId: 'b1', entry: sown(ID_B) });
    const second = await outbox.flush('u1', 'g', api.send);
    await first;
    expect(second.sent).toContain(ID_B);
    expect(api.held.size).toBe(2);
    expect(await outbox.list('u1', 'g')).toEqual([]);
  });
});

describe('which failures are tried again (RFC 9110 status classes)', () => {
  it.each([
    [0, true],
    [401, true],
    [408, true],
    [429, true],
    [500, true],
    [503, true],
    [400, false],
    [404, false],
    [409, false],
  ])('status %i → retry %s', (statusCode, retry) => {
    expect(isRetryable(new ApiRequestError({ statusCode, error: 'x', message: 'x' }))).toBe(retry);
  });
});
