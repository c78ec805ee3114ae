import type { WaitlistOfferView } from '@homeground/shared';
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, type FakeRoutes } from '../../../testing/fake-api.js';
import { renderApp } from '../../../testing/render-app.js';
import { reservation, share, SLOT_1, TOKEN } from '../testing/share-fixtures.js';

// A waitlist offer by the link the API e-mails (/plant-share/offers/:token), answered as
// GET /api/waitlist-offers/:token and claimed with a pickup slot (api/src/plant-share).
const OFFER_PATH = `/api/waitlist-offers/${TOKEN}`;
const offer: WaitlistOfferView = {
  speciesSlug: 'monarda-fistulosa',
  commonName: 'Wild bergamot',
  scientificName: 'Monarda fistulosa',
  count: 2,
  status: 'offered',
  heldUntil: '2027-06-08T17:00:00.000Z',
  joinsReservation: false,
  share: {
    groupSlug: share.groupSlug,
    groupName: share.groupName,
    date: share.date,
    place: share.place,
    status: 'open',
  },
  slots: share.slots,
};

function openOffer(over: FakeRoutes = {}) {
  return renderApp({ path: `/plant-share/offers/${TOKEN}`, api: { [`GET ${OFFER_PATH}`]: { body: offer }, ...over } });
}

describe('a waitlist offer', () => {
  it('asks for a slot, then takes the held plants and confirms', async () => {
    const { user, api } = openOffer({ [`POST ${OFFER_PATH}/claim`]: { status: 201, body: reservation } });
    expect(await screen.findByText(/2 × Wild bergamot came free/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Take these plants' }));
    expect(screen.getByText('Choose a pickup slot.')).toBeInTheDocument();
    expect(api.callsTo('POST', `${OFFER_PATH}/claim`)).toHaveLength(0);
    await user.click(screen.getByRole('radio', { name: /9:00 am – 9:30 am/ }));
    await user.click(screen.getByRole('button', { name: 'Take these plants' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Your plants are reserved' })).toBeInTheDocument();
    expect(api.callsTo('POST', `${OFFER_PATH}/claim`)[0].body).toEqual({ slotId: SLOT_1 });
  });

  it('says when the offer has lapsed', async () => {
    openOffer({ [`GET ${OFFER_PATH}`]: apiError(410, 'The offer has lapsed') });
    expect(await screen.findByText(/This link does not open an offer/)).toBeInTheDocument();
  });

  it('says plainly when the offer was not taken in time', async () => {
    openOffer({ [`GET ${OFFER_PATH}`]: { body: { ...offer, status: 'expired', heldUntil: null } } });
    expect(await screen.findByText(/was not taken in time/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Take these plants' })).toBeNull();
  });
});
