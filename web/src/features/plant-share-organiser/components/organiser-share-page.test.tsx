import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, type FakeRoutes } from '../../../testing/fake-api.js';
import { maraOrganiser, priyaMember } from '../../../testing/fixtures.js';
import { renderApp } from '../../../testing/render-app.js';
import { GROUP, SHARE_PATH, share } from '../testing/organiser-fixtures.js';

// Who may do what follows the plant-share API (api/src/plant-share): the group's organisers run the
// share; everyone else is sent to a group's public page. Counts are the fake answers beside.
function openPage(me = maraOrganiser, over: FakeRoutes = {}) {
  return renderApp({ path: '/plant-share', token: 'token', api: { 'GET /api/me': { body: me }, ...over } });
}

describe('the organiser’s plant share', () => {
  it('opens a share: the day, the place, two slots and the limits, sent as the shared request', async () => {
    const { user, api } = openPage(maraOrganiser, {
      [`GET ${SHARE_PATH}`]: apiError(404, 'No plant share yet'),
      [`POST ${SHARE_PATH}`]: { status: 201, body: share },
    });
    await screen.findByRole('heading', { name: 'Open a plant share' });
    await user.type(screen.getByLabelText(/^Date/), '2027-06-12');
    await user.type(screen.getByRole('textbox', { name: /^Place/ }), 'Larkfield Commons Hall');
    await user.type(screen.getByRole('textbox', { name: /^Street address/ }), '12 Commons Lane, Larkfield, WI');
    await user.click(screen.getByRole('button', { name: 'Add a slot' }));
    // A new slot follows the last one and lasts as long (09:30–10:00).
    expect(screen.getByLabelText('Start of slot 2')).toHaveValue('09:30');
    await user.click(screen.getByRole('button', { name: 'Open the plant share' }));

    expect(await screen.findByRole('heading', { name: 'Status: Open for reservations' })).toBeInTheDocument();
    const body = api.callsTo('POST', SHARE_PATH)[0].body as { slots: { start: string; end: string }[] };
    expect(body).toMatchObject({
      date: '2027-06-12',
      place: { name: 'Larkfield Commons Hall', address: '12 Commons Lane, Larkfield, WI' },
      limits: { perSpecies: 3, total: 10 },
    });
    // Slot times carry the browser's offset for that day, so the API reads the organiser's clock.
    expect(body.slots).toHaveLength(2);
    expect(body.slots[0].start).toMatch(/^2027-06-12T09:00:00[+-]\d{2}:\d{2}$/);
    expect(body.slots[1].end).toMatch(/^2027-06-12T10:00:00[+-]\d{2}:\d{2}$/);
  });

  it('names each bad field (shared schema words) and sends nothing', async () => {
    const { user, api } = openPage(maraOrganiser, { [`GET ${SHARE_PATH}`]: apiError(404, 'No plant share yet') });
    await screen.findByRole('heading', { name: 'Open a plant share' });
    await user.click(screen.getByRole('button', { name: 'Open the plant share' }));
    expect(screen.getAllByText('Must not be empty')).toHaveLength(2);
    await user.type(screen.getByLabelText(/^Date/), '2027-06-12');
    await user.type(screen.getByRole('textbox', { name: /^Place/ }), 'Larkfield Commons Hall');
    await user.type(screen.getByRole('textbox', { name: /^Street address/ }), '12 Commons Lane, Larkfield, WI');
    const total = screen.getByRole('textbox', { name: /^Most plants in all/ });
    await user.clear(total);
    await user.type(total, '2');
    await user.clear(screen.getByLabelText('Households in slot 1'));
    await user.click(screen.getByRole('button', { name: 'Open the plant share' }));
    expect(screen.getByText('Must be at least the limit per species')).toBeInTheDocument();
    expect(screen.getByText('Enter a number of households')).toBeInTheDocument();
    expect(api.callsTo('POST', SHARE_PATH)).toHaveLength(0);
  });

  it('shows the open share with its slots and stock, and pauses it', async () => {
    const { user, api } = openPage(maraOrganiser, {
      [`GET ${SHARE_PATH}`]: { body: share },
      [`PUT ${SHARE_PATH}/status`]: { body: { ...share, status: 'paused' } },
    });
    expect(await screen.findByRole('heading', { name: 'Status: Open for reservations' })).toBeInTheDocument();
    expect(screen.getByText('9:00 am – 9:30 am: 1 of 12 households')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: `/share/${GROUP}` })).toBeInTheDocument();
    expect(screen.getByText(/deleted on Monday, July 12, 2027/)).toBeInTheDocument();
    const stock = within(screen.getByRole('region', { name: 'Stock table' }));
    expect(stock.getByRole('textbox', { name: 'Plants of butterfly milkweed on offer' })).toHaveValue('50');

    await user.click(screen.getByRole('button', { name: 'Pause reservations' }));
    expect(await screen.findByRole('heading', { name: 'Status: Paused' })).toBeInTheDocument();
    expect(api.callsTo('PUT', `${SHARE_PATH}/status`)[0].body).toEqual({ status: 'paused' });
    expect(screen.getByRole('button', { name: 'Open for reservations' })).toBeInTheDocument();
  });

  it('speaks Spanish with the page: status, slots, dates, stock and the moves from here', async () => {
    const { user } = renderApp({
      path: '/plant-share',
      token: 'token',
      locale: 'es',
      api: {
        'GET /api/me': { body: maraOrganiser },
        [`GET ${SHARE_PATH}`]: { body: share },
        [`PUT ${SHARE_PATH}/status`]: { body: { ...share, status: 'paused' } },
      },
    });
    expect(await screen.findByRole('heading', { name: 'Estado: Abierto a reservas' })).toBeInTheDocument();
    // es-US writes the morning as "a.m." (CLDR via Intl); 1 of 12 households as the fixture says.
    expect(screen.getByText('9:00 a.m. – 9:30 a.m.: 1 de 12 hogares')).toBeInTheDocument();
    // The Spanish long date as CLDR writes it for es-US.
    expect(screen.getByText(/se borran el lunes, 12 de julio de 2027/)).toBeInTheDocument();
    const stock = within(screen.getByRole('region', { name: 'Tabla de plantas que se ofrecen' }));
    expect(stock.getByRole('textbox', { name: 'Plantas de butterfly milkweed que se ofrecen' })).toHaveValue('50');
    expect(screen.getByRole('heading', { name: 'Horarios de recogida' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Pausar las reservas' }));
    expect(await screen.findByRole('heading', { name: 'Estado: En pausa' })).toBeInTheDocument();
  });

  it('saves a changed count and adds plants that got ready, each checked first', async () => {
    const { user, api } = openPage(maraOrganiser, {
      [`GET ${SHARE_PATH}`]: { body: share },
      [`PUT ${SHARE_PATH}/stock`]: { body: share },
      [`POST ${SHARE_PATH}/stock/add`]: { body: share },
    });
    const offered = await screen.findByRole('textbox', { name: 'Plants of wild bergamot on offer' });
    await user.clear(offered);
    await user.type(offered, '-1');
    await user.click(screen.getByRole('button', { name: 'Save the counts' }));
    // stockLineSchema: "must be 0 or more"; nothing is sent while a row is wrong.
    expect(screen.getByText('Must be 0 or more')).toBeInTheDocument();
    expect(api.callsTo('PUT', `${SHARE_PATH}/stock`)).toHaveLength(0);
    await user.clear(offered);
    await user.type(offered, '60');
    await user.click(screen.getByRole('button', { name: 'Save the counts' }));
    expect(await screen.findByText('The counts are saved.')).toBeInTheDocument();
    expect(api.callsTo('PUT', `${SHARE_PATH}/stock`)[0].body).toEqual({
      stock: [{ speciesSlug: 'monarda-fistulosa', count: 60 }],
    });

    await user.type(screen.getByRole('textbox', { name: 'Plants of butterfly milkweed to add' }), '8');
    await user.click(screen.getByRole('button', { name: 'Add these plants' }));
    expect(await screen.findByText(/The plants are added/)).toBeInTheDocument();
    expect(api.callsTo('POST', `${SHARE_PATH}/stock/add`)[0].body).toEqual({
      lines: [{ speciesSlug: 'asclepias-tuberosa', count: 8 }],
    });
  });

  it('sends someone who runs no share to the groups’ public pages, never to names', async () => {
    const { api } = openPage(priyaMember);
    expect(await screen.findByRole('link', { name: 'Larkfield Commons Growers' })).toHaveAttribute(
      'href',
      `/share/${GROUP}`,
    );
    expect(api.callsTo('GET', SHARE_PATH)).toHaveLength(0);
  });
});
