import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { apiError, type FakeRoutes } from '../../../testing/fake-api.js';
import { maraOrganiser } from '../../../testing/fixtures.js';
import { renderApp } from '../../../testing/render-app.js';
import { PRIYA, pickupList, SHARE_PATH, share, SLOT_1 } from '../testing/organiser-fixtures.js';

// Pickup day as the plant-share API answers it (api/src/plant-share): one slot's households with
// names for organisers, check-in outcomes "picked-up" and "no-show", walk-ups as plant lines.
const LIST_PATH = `${SHARE_PATH}/slots/${SLOT_1}/pickup-list`;
const CHECK_IN = `${SHARE_PATH}/reservations/${PRIYA}/check-in`;

function openPickup(over: FakeRoutes = {}) {
  return renderApp({
    path: '/plant-share/pickup',
    token: 'token',
    api: {
      'GET /api/me': { body: maraOrganiser },
      [`GET ${SHARE_PATH}`]: { body: share },
      [`GET ${LIST_PATH}`]: { body: pickupList },
      ...over,
    },
  });
}

describe('pickup day', () => {
  it('lists the first slot’s households with their plants and a box to tick, and prints', async () => {
    const print = vi.spyOn(window, 'print').mockImplementation(() => undefined);
    const { user } = openPickup();
    const table = within(await screen.findByRole('region', { name: 'Pickup list table' }));
    expect(table.getByText('Pickup list, 9:00 am – 9:30 am: 1 household, 5 plants')).toBeInTheDocument();
    const row = within(table.getByText('Priya Vantongeren').closest('tr') as HTMLElement);
    expect(row.getByText('3 × butterfly milkweed, 2 × wild bergamot')).toBeInTheDocument();
    expect(row.getByRole('img', { name: 'Waiting' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Print the pickup list' }));
    expect(print).toHaveBeenCalledTimes(1);
  });

  it('checks a household in with one big button and reads the list again', async () => {
    let status: 'confirmed' | 'picked-up' = 'confirmed';
    const { user, api } = openPickup({
      [`GET ${LIST_PATH}`]: () => ({
        body: { ...pickupList, households: pickupList.households.map((h) => ({ ...h, status })) },
      }),
      [`POST ${CHECK_IN}`]: () => {
        status = 'picked-up';
        return { status: 201, body: { household: { ...pickupList.households[0], status }, released: [] } };
      },
    });
    const checkIn = await screen.findByRole('button', { name: 'Checked in: Priya Vantongeren' });
    await user.click(checkIn);
    expect(api.callsTo('POST', CHECK_IN)[0].body).toEqual({ outcome: 'picked-up' });
    const item = within(screen.getByRole('listitem', { name: 'Priya Vantongeren' }));
    expect(await item.findByText('Checked in')).toBeInTheDocument();
    expect(item.queryByRole('button', { name: /No-show/ })).not.toBeInTheDocument();
  });

  it('marks a no-show and says where the plants went', async () => {
    const { user, api } = openPickup({
      [`POST ${CHECK_IN}`]: {
        status: 201,
        body: {
          household: { ...pickupList.households[0], status: 'no-show' },
          released: [
            { speciesSlug: 'asclepias-tuberosa', toWaitlist: 1, toStock: 2 },
            { speciesSlug: 'monarda-fistulosa', toWaitlist: 0, toStock: 2 },
          ],
        },
      },
    });
    await user.click(await screen.findByRole('button', { name: 'No-show: Priya Vantongeren' }));
    expect(await screen.findByText('5 plants went back to the waitlist or the share.')).toBeInTheDocument();
    expect(api.callsTo('POST', CHECK_IN)[0].body).toEqual({ outcome: 'no-show' });
  });

  it('records a walk-up as plant lines and a ZIP, and checks the ZIP first', async () => {
    const { user, api } = openPickup({
      [`POST ${SHARE_PATH}/walk-ups`]: {
        status: 201,
        body: { id: 'w1', lines: [], givenAt: '2027-06-12T11:40:00-05:00' },
      },
    });
    await screen.findByRole('heading', { name: 'Walk-up' });
    await user.click(screen.getByRole('button', { name: 'Record what was given' }));
    expect(screen.getByText('Add at least one plant first.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'One more: Plants of wild bergamot given' }));
    await user.click(screen.getByRole('button', { name: 'One more: Plants of wild bergamot given' }));
    await user.type(screen.getByRole('textbox', { name: 'ZIP code (if they say)' }), '5466');
    await user.click(screen.getByRole('button', { name: 'Record what was given' }));
    // zipSchema in the shared requests: five digits.
    expect(screen.getByText('Must be a 5-digit ZIP code')).toBeInTheDocument();
    expect(api.callsTo('POST', `${SHARE_PATH}/walk-ups`)).toHaveLength(0);
    await user.type(screen.getByRole('textbox', { name: 'ZIP code (if they say)' }), '5');
    await user.click(screen.getByRole('button', { name: 'Record what was given' }));
    expect(await screen.findByText('Recorded 2 plants given at walk-up.')).toBeInTheDocument();
    expect(api.callsTo('POST', `${SHARE_PATH}/walk-ups`)[0].body).toEqual({
      lines: [{ speciesSlug: 'monarda-fistulosa', count: 2 }],
      zip: '54665',
    });
  });

  it('says what went wrong when a check-in is refused', async () => {
    const { user } = openPickup({ [`POST ${CHECK_IN}`]: apiError(409, 'This reservation was cancelled') });
    await user.click(await screen.findByRole('button', { name: 'Checked in: Priya Vantongeren' }));
    expect(await screen.findByText('This reservation was cancelled')).toBeInTheDocument();
  });
});
