import { act, screen, within } from '@testing-library/react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { openSavedAnswersDb } from '../../../lib/offline/saved-answers.js';
import { deviceOutbox } from '../offline/use-log-outbox.js';
import { apiError, type FakeRoutes } from '../../../testing/fake-api.js';
import { juniperGrower, priyaMember } from '../../../testing/fixtures.js';
import { renderApp } from '../../../testing/render-app.js';
import {
  amaraGrower,
  BATCHES_PATH,
  bergamot,
  GROWERS_PATH,
  milkweed,
  seasonBatches,
} from '../testing/batch-fixtures.js';

// What a grower may do follows the batches API (api/src/batches): a grower reads and logs their own
// batches. The log checks are the shared logEntryRequestSchema's; the dates are the fixtures'.
const amara = { ...juniperGrower, id: 'u-amara', displayName: 'Amara Reyes', email: 'amara.reyes@example.org' };

function openMyBatches(me = amara, over: FakeRoutes = {}, locale?: 'en' | 'es') {
  return renderApp({
    path: '/my-batches',
    token: 'token',
    ...(locale && { locale }),
    api: {
      'GET /api/me': { body: me },
      [`GET ${BATCHES_PATH}`]: { body: seasonBatches },
      [`GET ${GROWERS_PATH}`]: { body: [amaraGrower] },
      ...over,
    },
  });
}

const card = async (name: string) =>
  within((await screen.findByRole('heading', { level: 2, name })).closest('section') as HTMLElement);

describe('My batches', () => {
  beforeEach(async () => {
    await deviceOutbox().db.entries.clear();
  });

  it('keeps an entry made with no connection, marked not yet sent, and sends it when the connection returns', async () => {
    let online = false;
    const held = new Set<string>();
    const { user, api } = openMyBatches(amara, {
      [`POST ${BATCHES_PATH}/${milkweed.id}/log`]: (request) => {
        // No connection: fetch itself fails, as in a browser with no signal.
        if (!online) throw new TypeError('Failed to fetch');
        held.add(String((request.body as { clientId: string }).clientId));
        return { status: 201, body: milkweed };
      },
    });
    const form = within(await screen.findByRole('form', { name: 'Add to the log: Butterfly milkweed' }));
    await user.click(form.getByRole('button', { name: 'Came up' }));
    await user.type(form.getByRole('textbox', { name: /How many/ }), '12');
    await user.click(form.getByRole('button', { name: 'Add to the log' }));
    expect(await form.findByText(/Kept on this device, not yet sent/)).toBeInTheDocument();
    const waiting = within(await screen.findByRole('list', { name: 'Waiting on this device: Butterfly milkweed' }));
    expect(waiting.getByText('Not yet sent')).toBeInTheDocument();
    expect(screen.getByText(/1 log entry is kept on this device/)).toBeInTheDocument();

    online = true;
    await act(async () => {
      window.dispatchEvent(new Event('online'));
    });
    await vi.waitFor(() => expect(screen.queryByText('Not yet sent')).not.toBeInTheDocument());
    // Sent twice in all (once failed, once stored), always with the same clientId: the API holds one entry.
    const calls = api.callsTo('POST', `${BATCHES_PATH}/${milkweed.id}/log`);
    expect(new Set(calls.map((c) => (c.body as { clientId: string }).clientId)).size).toBe(1);
    expect(held.size).toBe(1);
  });

  it('speaks Spanish when the page is in Spanish: log buttons, totals, units and dates', async () => {
    openMyBatches(amara, {}, 'es');
    expect(await screen.findByRole('heading', { level: 1, name: 'Mis lotes' })).toBeInTheDocument();
    const m = await card('Butterfly milkweed');
    expect(m.getByText(/· Macetas afuera durante el invierno/)).toBeInTheDocument();
    expect(m.getByText(/20 plantas en 20 macetas; siembra unas 34 semillas/)).toBeInTheDocument();
    expect(m.getByText('Sembradas 150 · brotaron 0 · trasplantadas 0 · perdidas 0 · listas 0')).toBeInTheDocument();
    const form = within(m.getByRole('form', { name: 'Añadir al registro: Butterfly milkweed' }));
    expect(form.getByRole('button', { name: 'Brotaron' })).toBeInTheDocument();
    expect(form.getByRole('button', { name: 'Añadir al registro' })).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Cómo cultivo' })).toBeInTheDocument();
  });

  it("shows each batch with its dates, treatment, how-to, cautions and log, and the grower's supplies", async () => {
    openMyBatches();
    expect(await screen.findByRole('heading', { level: 1, name: 'My batches' })).toBeInTheDocument();
    const m = await card('Butterfly milkweed');
    expect(m.getByText(/· Outdoor pots over winter/)).toBeInTheDocument();
    expect(m.getByText(/20 plants in 20 pots; sow about 34 seeds/)).toBeInTheDocument();
    const dates = within(m.getByRole('list', { name: 'Dates for Butterfly milkweed' }));
    expect(dates.getByText('Sow')).toBeInTheDocument();
    expect(dates.getByText('Pot up')).toBeInTheDocument();
    expect(dates.getByText('Frost watch: protect from a late frost')).toBeInTheDocument();
    expect(dates.getByText('Ready to give')).toBeInTheDocument();
    expect(m.getByText(/\(outdoors, by winter\)/)).toBeInTheDocument();
    expect(m.getByRole('button', { name: 'Outdoor pots over winter' })).toBeInTheDocument(); // how-to
    expect(m.getByText(/Milky sap irritates eyes/)).toBeInTheDocument();
    expect(m.getByText(/Frost watch until 2027-05-24: .* cover the pots with frost cloth/)).toBeInTheDocument();
    expect(m.getByText('Sown 150 · came up 0 · potted up 0 · lost 0 · ready 0')).toBeInTheDocument();
    expect(m.getByText('Three seeds a pot.')).toBeInTheDocument();

    const b = await card('Wild bergamot');
    expect(b.getByText(/Not sown yet/)).toBeInTheDocument();
    expect(b.getByText('Nothing logged yet.')).toBeInTheDocument();

    const supplies = within(screen.getByRole('region', { name: 'My supply list' }));
    expect(supplies.getByText('39 L (36 qt)')).toBeInTheDocument();
    expect(screen.getByText(/dusty/)).toBeInTheDocument();
  });

  it('logs seedlings that came up, with a client id so a retry is stored once, and refreshes', async () => {
    const { user, api } = openMyBatches(amara, {
      [`POST ${BATCHES_PATH}/${milkweed.id}/log`]: { status: 201, body: milkweed },
    });
    const form = within(await screen.findByRole('form', { name: 'Add to the log: Butterfly milkweed' }));
    await user.click(form.getByRole('button', { name: 'Came up' }));
    expect(form.getByRole('button', { name: 'Came up' })).toHaveAttribute('aria-pressed', 'true');
    await user.type(form.getByRole('textbox', { name: /How many \(seedlings that came up\)/ }), '12');
    await user.click(form.getByRole('button', { name: 'Add to the log' }));
    expect(await form.findByText('Saved to the log.')).toBeInTheDocument();
    const body = api.callsTo('POST', `${BATCHES_PATH}/${milkweed.id}/log`)[0].body as Record<string, unknown>;
    expect(body).toMatchObject({ kind: 'germinated', count: 12 });
    expect(body.date).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(body.clientId).toMatch(/^[0-9a-f-]{36}$/);
    expect(api.callsTo('GET', BATCHES_PATH).length).toBeGreaterThanOrEqual(2);
  });

  it('refuses a negative count and a loss without a reason before sending anything', async () => {
    const { user, api } = openMyBatches();
    const form = within(await screen.findByRole('form', { name: 'Add to the log: Wild bergamot' }));
    await user.type(form.getByRole('textbox', { name: /How many/ }), '-3');
    await user.click(form.getByRole('button', { name: 'Add to the log' }));
    expect(await form.findByText('Must be 0 or more')).toBeInTheDocument();

    await user.click(form.getByRole('button', { name: 'Lost' }));
    await user.clear(form.getByRole('textbox', { name: /How many/ }));
    await user.type(form.getByRole('textbox', { name: /How many/ }), '2');
    await user.click(form.getByRole('button', { name: 'Add to the log' }));
    expect(await form.findByText('Say why the plants were lost')).toBeInTheDocument();
    expect(api.callsTo('POST', `${BATCHES_PATH}/${bergamot.id}/log`)).toHaveLength(0);
  });

  it("shows the API's 400 (more came up than were sown) beside the count", async () => {
    const { user } = openMyBatches(amara, {
      [`POST ${BATCHES_PATH}/${bergamot.id}/log`]: apiError(400, 'Please check: count', {
        error: 'Bad Request',
        fields: [{ field: 'count', message: 'would make more seedlings (5) than seeds sown (0)' }],
      }),
    });
    const form = within(await screen.findByRole('form', { name: 'Add to the log: Wild bergamot' }));
    await user.click(form.getByRole('button', { name: 'Came up' }));
    await user.type(form.getByRole('textbox', { name: /How many/ }), '5');
    await user.click(form.getByRole('button', { name: 'Add to the log' }));
    expect(await form.findByText('Would make more seedlings (5) than seeds sown (0)')).toBeInTheDocument();
    expect(form.queryByText('Saved to the log.')).not.toBeInTheDocument();
  });

  it('lets the grower say how they grow, one box per method, and refuses an empty form', async () => {
    const { user, api } = openMyBatches(amara, {
      [`PUT ${GROWERS_PATH}/u-amara`]: { body: amaraGrower },
    });
    const form = within(await screen.findByRole('form', { name: 'How I grow' }));
    const pots = form.getByRole('textbox', { name: 'outdoor pots over winter: pots' });
    expect(pots).toHaveValue('120');
    await user.clear(pots);
    await user.click(form.getByRole('button', { name: 'Save how I grow' }));
    expect(await form.findByText('Fill in at least one method')).toBeInTheDocument();
    await user.type(
      form.getByRole('textbox', { name: 'winter sowing in covered containers: covered containers' }),
      '0',
    );
    await user.click(form.getByRole('button', { name: 'Save how I grow' }));
    expect(await form.findByText(/Must be a whole number from 1/)).toBeInTheDocument();
    expect(api.callsTo('PUT', `${GROWERS_PATH}/u-amara`)).toHaveLength(0);

    await user.clear(form.getByRole('textbox', { name: 'winter sowing in covered containers: covered containers' }));
    await user.type(
      form.getByRole('textbox', { name: 'winter sowing in covered containers: covered containers' }),
      '12',
    );
    await user.type(pots, '100');
    await user.click(form.getByRole('button', { name: 'Save how I grow' }));
    expect(await form.findByText(/^Saved\./)).toBeInTheDocument();
    expect(api.callsTo('PUT', `${GROWERS_PATH}/u-amara`)[0].body).toEqual({
      methods: [
        { method: 'outdoor-pot-winter', capacity: 100 },
        { method: 'winter-sowing', capacity: 12 },
      ],
    });
  });

  it('still shows how the grower grows with no signal, from the copy this device saved on the last visit', async () => {
    const first = openMyBatches();
    const online = within(await screen.findByRole('form', { name: 'How I grow' }));
    expect(online.getByRole('textbox', { name: 'outdoor pots over winter: pots' })).toHaveValue('120');
    // Wait until the copy is written to the device before the page is closed.
    await vi.waitFor(async () => {
      expect(await openSavedAnswersDb().answers.get('u-amara|growers:larkfield-commons-growers')).toBeDefined();
    });
    first.unmount();

    // No connection now: fetch itself fails for every read, as in a garden with no signal.
    const noSignal = () => {
      throw new TypeError('Failed to fetch');
    };
    openMyBatches(amara, { [`GET ${GROWERS_PATH}`]: noSignal, [`GET ${BATCHES_PATH}`]: noSignal });
    const offline = within(await screen.findByRole('form', { name: 'How I grow' }));
    expect(offline.getByRole('textbox', { name: 'outdoor pots over winter: pots' })).toHaveValue('120');
    expect(screen.getByText(/No connection: this is what you stated, as this device saved it on/)).toBeInTheDocument();
  });

  it('downloads the batch dates as iCalendar with the sign-in token', async () => {
    const createObjectURL = vi.fn(() => 'blob:my-batches');
    // jsdom has no object URLs; a stand-in URL class keeps the real one untouched for other tests.
    vi.stubGlobal('URL', Object.assign(class extends URL {}, { createObjectURL, revokeObjectURL: vi.fn() }));
    const { user, api } = openMyBatches(amara, {
      [`GET /api/groups/larkfield-commons-growers/season/my-batches.ics`]: { body: 'BEGIN:VCALENDAR' },
    });
    await user.click(await screen.findByRole('button', { name: 'Add the dates to my calendar (iCalendar)' }));
    await vi.waitFor(() => expect(createObjectURL).toHaveBeenCalledTimes(1));
    const call = api.callsTo('GET', '/api/groups/larkfield-commons-growers/season/my-batches.ics')[0];
    expect(call.headers.authorization).toBe('Bearer token');
    vi.unstubAllGlobals();
  });

  it('tells someone who is not a grower what the page is for, without asking for batches', async () => {
    const { api } = openMyBatches(priyaMember);
    expect(await screen.findByText(/My batches is for growers/)).toBeInTheDocument();
    expect(api.callsTo('GET', BATCHES_PATH)).toHaveLength(0);
  });
});
