import type { TakerReservation } from '@homeground/shared';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, type FakeRoutes } from '../../../testing/fake-api.js';
import { renderApp } from '../../../testing/render-app.js';
import { reservation, SHARE_PATH, share, SLOT_2, TOKEN } from '../testing/share-fixtures.js';

// A reservation opened by its private link (the path the API writes into the e-mail:
// /plant-share/reservations/:token); no account and no sign-in token are involved.
const RESERVATION_PATH = `/api/reservations/${TOKEN}`;
const mine: TakerReservation = { ...reservation };
const roomy = { ...share, slots: share.slots.map((s) => ({ ...s, left: 3 })) };

function openLink(over: FakeRoutes = {}) {
  return renderApp({
    path: `/plant-share/reservations/${TOKEN}`,
    api: { [`GET ${RESERVATION_PATH}`]: { body: mine }, [`GET ${SHARE_PATH}`]: { body: roomy }, ...over },
  });
}

describe('my reservation by its private link', () => {
  it('shows the pickup and care sheet, and changes the counts and the slot in one request', async () => {
    const { user, api } = openLink({
      [`PUT ${RESERVATION_PATH}`]: (req) => ({
        body: { ...mine, slot: { ...mine.slot, id: SLOT_2 }, ...(req.body as object) },
      }),
    });
    expect(await screen.findByRole('heading', { level: 1, name: 'Your reservation' })).toBeInTheDocument();
    expect(screen.getByText('Plant 18 in (46 cm) apart.')).toBeInTheDocument();
    const change = within(await screen.findByRole('region', { name: 'Change or cancel' }));
    await change.findByRole('button', { name: 'One more: Plants of Wild bergamot' });
    await user.click(change.getByRole('button', { name: 'One more: Plants of Wild bergamot' }));
    await user.click(change.getByRole('radio', { name: /9:30 am – 10:00 am/ }));
    await user.click(change.getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText(/Your reservation is changed/)).toBeInTheDocument();
    expect(api.callsTo('PUT', RESERVATION_PATH)[0].body).toEqual({
      slotId: SLOT_2,
      lines: [
        { speciesSlug: 'asclepias-tuberosa', count: 2 },
        { speciesSlug: 'monarda-fistulosa', count: 1 },
      ],
    });
    // The link is the key: nothing is sent with a sign-in token.
    expect(api.callsTo('PUT', RESERVATION_PATH)[0].headers.authorization).toBeUndefined();
  });

  it('cancels only after a second yes', async () => {
    const { user, api } = openLink({
      [`DELETE ${RESERVATION_PATH}`]: { body: { ...mine, status: 'cancelled', canChange: false } },
    });
    await user.click(await screen.findByRole('button', { name: 'Cancel my reservation' }));
    expect(api.callsTo('DELETE', RESERVATION_PATH)).toHaveLength(0);
    await user.click(screen.getByRole('button', { name: 'Cancel it: give the plants back' }));
    expect(await screen.findByText(/This reservation is cancelled/)).toBeInTheDocument();
    expect(api.callsTo('DELETE', RESERVATION_PATH)).toHaveLength(1);
  });

  it('says so when the slot has started or the share closed', async () => {
    openLink({ [`GET ${RESERVATION_PATH}`]: { body: { ...mine, canChange: false } } });
    expect(await screen.findByText(/can no longer be changed/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Save changes' })).not.toBeInTheDocument();
  });

  it('answers a forged link plainly', async () => {
    openLink({ [`GET ${RESERVATION_PATH}`]: apiError(404, 'is not a reservation link we sent') });
    expect(await screen.findByText(/This link does not open a reservation/)).toBeInTheDocument();
  });

  it('keeps the slot the reservation holds choosable even when it is full', async () => {
    openLink({ [`GET ${SHARE_PATH}`]: { body: share } });
    const change = within(await screen.findByRole('region', { name: 'Change or cancel' }));
    expect(await change.findByRole('radio', { name: /9:00 am – 9:30 am/ })).toBeEnabled();
    expect(change.getByRole('radio', { name: /9:30 am – 10:00 am/ })).toBeDisabled();
  });
});
