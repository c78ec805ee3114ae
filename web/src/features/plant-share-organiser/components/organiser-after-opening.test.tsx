import { screen, waitFor, within } from '@testing-library/react';
import type { ShareWaitlist } from '@homeground/shared';
import { describe, expect, it } from 'vitest';
import { apiError, type FakeRoutes } from '../../../testing/fake-api.js';
import { maraOrganiser } from '../../../testing/fixtures.js';
import { renderApp } from '../../../testing/render-app.js';
import { SHARE_PATH, SLOT_1, SLOT_2, share } from '../testing/organiser-fixtures.js';

// After opening, the organiser changes the day, place, limits and slots, never below what households
// were promised: the plant-share API (api/src/plant-share/plant-share.service.ts) answers 400 naming
// the limit or the slot's capacity, and the page shows that beside the field. The waitlist is in the
// order households joined (Homeground's rule: offered in order, held two days).
function openPage(over: FakeRoutes = {}) {
  return renderApp({
    path: '/plant-share',
    token: 'token',
    api: { 'GET /api/me': { body: maraOrganiser }, [`GET ${SHARE_PATH}`]: { body: share }, ...over },
  });
}

const waitlist: ShareWaitlist = {
  species: [
    {
      speciesSlug: 'asclepias-tuberosa',
      commonName: 'Butterfly milkweed',
      scientificName: 'Asclepias tuberosa',
      remaining: 0,
      entries: [
        {
          position: 1,
          name: 'Sol Marchetti',
          email: 'sol.marchetti@example.org',
          count: 2,
          status: 'offered',
          held: 2,
          heldUntil: '2027-06-03T15:00:00.000Z',
          joinedAt: '2027-05-20T12:00:00.000Z',
        },
        {
          position: 2,
          name: 'Priya Vantongeren',
          email: 'priya.vantongeren@example.org',
          count: 1,
          status: 'waiting',
          held: 0,
          heldUntil: null,
          joinedAt: '2027-05-21T12:00:00.000Z',
        },
      ],
    },
  ],
};

describe('the organiser’s plant share after opening', () => {
  it('changes the limits and what to bring, and shows a limit below what is reserved beside the limit', async () => {
    const { user, api } = openPage({
      [`PATCH ${SHARE_PATH}`]: apiError(400, 'Check the highlighted fields.', {
        fields: [
          {
            field: 'limits.perSpecies',
            message: 'must be at least 4: a household has reserved 4 plants of one species already',
          },
        ],
      }),
    });
    await user.click(await screen.findByRole('button', { name: 'Change the day, place or limits' }));
    const perSpecies = screen.getByRole('textbox', { name: /^Most plants of one species/ });
    await user.clear(perSpecies);
    await user.type(perSpecies, '2');
    await user.type(screen.getByRole('textbox', { name: /^What to bring/ }), 'A box for your pots.');
    await user.click(screen.getByRole('button', { name: 'Save the share' }));
    expect(await screen.findByText(/Must be at least 4: a household has reserved 4/)).toBeInTheDocument();
    expect(api.callsTo('PATCH', SHARE_PATH)[0].body).toMatchObject({
      date: share.date,
      limits: { perSpecies: 2, total: share.limits.total },
      whatToBring: 'A box for your pots.',
    });
  });

  it('refuses a slot with fewer households than booked, beside the slot, and adds a slot on the share day', async () => {
    const { user, api } = openPage({
      [`PUT ${SHARE_PATH}/slots/${SLOT_1}`]: apiError(400, 'Check the highlighted fields.', {
        fields: [{ field: 'capacity', message: 'must be at least 1: that many households are booked in this slot' }],
      }),
      [`POST ${SHARE_PATH}/slots`]: { status: 201, body: share },
    });
    const cap = await screen.findByRole('textbox', { name: 'Households in slot 1' });
    await user.clear(cap);
    await user.type(cap, '0');
    await user.click(screen.getByRole('button', { name: 'Save slot 1' }));
    // pickupSlotRequestSchema: at least 1 household; checked before anything is sent.
    expect(screen.getByText('Must be at least 1')).toBeInTheDocument();
    expect(api.callsTo('PUT', `${SHARE_PATH}/slots/${SLOT_1}`)).toHaveLength(0);
    await user.clear(cap);
    await user.type(cap, '1');
    await user.click(screen.getByRole('button', { name: 'Save slot 1' }));
    expect(await screen.findByText(/Must be at least 1: that many households are booked/)).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Add a slot' }));
    expect(await screen.findByText('The slot is added.')).toBeInTheDocument();
    const added = api.callsTo('POST', `${SHARE_PATH}/slots`)[0].body as { start: string };
    expect(added.start.slice(0, 10)).toBe(share.date);
  });

  it('deletes an empty slot only after the organiser confirms, and offers no delete for a booked one', async () => {
    const { user, api } = openPage({
      [`DELETE ${SHARE_PATH}/slots/${SLOT_2}`]: { body: { ...share, slots: share.slots.slice(0, 1) } },
    });
    const remove = await screen.findByLabelText('Delete slot 2');
    // Slot 1 has a household booked (fixtures): the API would answer 409, so there is no button for it.
    expect(screen.queryByLabelText('Delete slot 1')).toBeNull();
    await user.click(remove);
    expect(await screen.findByText('Delete slot 2 (09:30–10:00)?')).toBeInTheDocument();
    await user.click(screen.getByText('Keep the slot'));
    expect(api.callsTo('DELETE', `${SHARE_PATH}/slots/${SLOT_2}`)).toHaveLength(0);
    await user.click(screen.getByLabelText('Delete slot 2'));
    await user.click(await screen.findByText('Delete the slot'));
    // The card is drawn again from the API's answer, which no longer has the slot.
    await waitFor(() => expect(screen.queryByLabelText('Delete slot 2')).toBeNull());
    expect(api.callsTo('DELETE', `${SHARE_PATH}/slots/${SLOT_2}`)).toHaveLength(1);
    expect(screen.queryByLabelText('Save slot 2')).toBeNull();
  });

  it('shows the waitlist per species in the order households joined, with what is held for them', async () => {
    openPage({ [`GET ${SHARE_PATH}/waitlist`]: { body: waitlist } });
    const section = await screen.findByRole('region', { name: 'Butterfly milkweed: 0 left on offer' });
    const rows = within(section).getAllByRole('row').slice(1);
    expect(rows.map((r) => within(r).getAllByRole('cell')[0].textContent)).toEqual(['1', '2']);
    expect(rows[0]).toHaveTextContent('Sol Marchetti');
    expect(rows[0]).toHaveTextContent(/Offered, held for them, held until/);
    expect(rows[1]).toHaveTextContent('Waiting');
  });
});
