import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, type FakeRequest, type FakeRoutes } from '../../../testing/fake-api.js';
import { renderApp } from '../../../testing/render-app.js';
import { GROUP, rankedForDrySun, reservation, SHARE_PATH, share, SLOT_1, TOKEN } from '../testing/share-fixtures.js';

// What the taker sees follows the public plant-share answer in ../testing/share-fixtures.ts (the
// invented demo group); sun, soil, height and bloom of each species are as USDA PLANTS lists them.
function openShare(over: FakeRoutes = {}) {
  return renderApp({ path: `/share/${GROUP}`, api: { [`GET ${SHARE_PATH}`]: shareAnswer, ...over } });
}

/** The share, ranked for dry full sun when the query asks for a yard (as the API does). */
const shareAnswer = (req: FakeRequest) => ({ body: req.search.includes('sun=') ? rankedForDrySun : share });

const card = (name: string) => within(screen.getByRole('article', { name }));

async function fillDetails(user: ReturnType<typeof openShare>['user']) {
  await user.type(screen.getByRole('textbox', { name: /^Name/ }), 'Priya Vantongeren');
  await user.type(screen.getByRole('textbox', { name: /^E-mail/ }), 'priya.vantongeren@example.org');
  await user.type(screen.getByRole('textbox', { name: /^ZIP code/ }), '53597');
}

describe('what is available', () => {
  it('shows every species with its fact-card summary, wildlife value in words, cautions and how many are left', async () => {
    openShare();
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Plant share: Larkfield Commons Growers' }),
    ).toBeVisible();
    expect(screen.getByText(/Saturday, June 12, 2027 at Larkfield Commons Hall/)).toBeInTheDocument();
    expect(screen.getByText(/Up to 3 of each species and 6 plants in all per household/)).toBeInTheDocument();

    const milkweed = card('Butterfly milkweed');
    expect(milkweed.getByText('Full sun')).toBeInTheDocument();
    expect(milkweed.getByText('Dry or medium-moist soil')).toBeInTheDocument();
    // 30–75 cm is 12–30 in (1 in = 2.54 cm, NIST SP 811).
    expect(milkweed.getByText('12–30 in (30–75 cm) tall')).toBeInTheDocument();
    expect(milkweed.getByText('Blooms Jun–Aug')).toBeInTheDocument();
    expect(milkweed.getByText('A host plant of the monarch caterpillar.')).toBeInTheDocument();
    expect(milkweed.getByText('12 left')).toBeInTheDocument();
    expect(milkweed.getByText(/Milky sap irritates eyes/)).toBeInTheDocument();

    const iris = card('Southern blue flag');
    expect(iris.getByText('All taken')).toBeInTheDocument();
    expect(iris.getByText(/roots are poisonous/)).toBeInTheDocument();
    expect(iris.queryByRole('button', { name: /One more/ })).not.toBeInTheDocument();
    // No raw score anywhere: wildlife value and fit are said in words (DESIGN.md).
    expect(screen.queryByText(/score/i)).not.toBeInTheDocument();
  });

  it('ranks by fit for the taker’s sun and soil, with why, and keeps the others below', async () => {
    const { user, api } = openShare();
    await screen.findByRole('article', { name: 'Butterfly milkweed' });
    await user.click(screen.getByRole('radio', { name: 'Full sun' }));
    await user.click(screen.getByRole('radio', { name: 'Dry' }));
    await user.click(screen.getByRole('button', { name: 'Show what fits' }));

    expect(await card('Butterfly milkweed').findByText('Thrives in dry soil and full sun.')).toBeInTheDocument();
    expect(card('Butterfly milkweed').getByText('Thrives in your spot')).toBeInTheDocument();
    expect(card('Wild bergamot').getByText('Grows in your spot')).toBeInTheDocument();
    expect(screen.getByText('Ranked for dry full sun.')).toBeInTheDocument();
    expect(api.callsTo('GET', SHARE_PATH).map((c) => c.search)).toContain('?sun=full&moisture=dry');
    const names = screen.getAllByRole('article').map((a) => a.getAttribute('aria-label'));
    expect(names).toEqual(['Butterfly milkweed', 'Wild bergamot', 'Southern blue flag']);
    expect(screen.getByRole('heading', { name: 'Less suited to your spot' })).toBeInTheDocument();
    expect(card('Southern blue flag').getByText('Needs wet soil.')).toBeInTheDocument();
  });

  it('ranks for the taker’s ZIP or a saved mix, says for which place, and checks the ZIP first', async () => {
    const mixId = '0b7b1d1e-4a4f-4c59-9d4a-0d1f4e8b9c21';
    const { user, api } = openShare({
      [`GET ${SHARE_PATH}`]: (req: FakeRequest) => ({
        body: req.search.includes('zip=')
          ? { ...rankedForDrySun, yard: { ...rankedForDrySun.yard!, from: 'zip', place: 'Viroqua, WI' } }
          : req.search.includes('mix=')
            ? {
                ...rankedForDrySun,
                yard: { ...rankedForDrySun.yard!, from: 'mix', place: 'WI', mixName: 'Dry front bed' },
              }
            : share,
      }),
    });
    await screen.findByRole('article', { name: 'Butterfly milkweed' });
    await user.click(screen.getByRole('radio', { name: 'Full sun' }));
    await user.click(screen.getByRole('radio', { name: 'Dry' }));
    const zip = screen.getByRole('textbox', { name: /^Your ZIP code/ });
    await user.type(zip, '5466');
    await user.click(screen.getByRole('button', { name: 'Show what fits' }));
    // zipSchema (shared): five digits; nothing is asked of the API until it is.
    expect(screen.getByText('Must be a 5-digit ZIP code')).toBeInTheDocument();
    expect(api.callsTo('GET', SHARE_PATH).some((c) => c.search.includes('zip='))).toBe(false);
    await user.type(zip, '5');
    await user.click(screen.getByRole('button', { name: 'Show what fits' }));
    expect(await screen.findByText('Ranked for dry full sun in Viroqua, WI.')).toBeInTheDocument();
    expect(api.callsTo('GET', SHARE_PATH).map((c) => c.search)).toContain('?sun=full&moisture=dry&zip=54665');

    await user.type(
      screen.getByRole('textbox', { name: /^Link to your saved mix/ }),
      `https://x.example/mixes/${mixId}`,
    );
    await user.click(screen.getByRole('button', { name: 'Rank for this mix' }));
    expect(await screen.findByText(/Ranked for your saved mix “Dry front bed”/)).toBeInTheDocument();
    expect(api.callsTo('GET', SHARE_PATH).map((c) => c.search)).toContain(`?mix=${mixId}`);
  });

  it('asks for both sun and soil before ranking', async () => {
    const { user, api } = openShare();
    await screen.findByRole('article', { name: 'Butterfly milkweed' });
    await user.click(screen.getByRole('radio', { name: 'Full sun' }));
    await user.click(screen.getByRole('button', { name: 'Show what fits' }));
    expect(screen.getByText('Choose both the sun and the soil of your spot.')).toBeInTheDocument();
    expect(api.callsTo('GET', SHARE_PATH).every((c) => c.search === '')).toBe(true);
  });

  it('keeps counts within the limits shown, reserves, and confirms with the pickup and care sheet', async () => {
    const { user, api } = openShare({ [`POST ${SHARE_PATH}/reservations`]: { status: 201, body: reservation } });
    // The list shows the share's order: Southern blue flag (none left) first, as the API answered it.
    await screen.findByRole('article', { name: 'Wild bergamot' });
    const more = (name: string) => card(name).getByRole('button', { name: `One more: Plants of ${name}` });
    // Wild bergamot has 2 left, under the limit of 3 per species: the stepper stops at 2.
    await user.click(more('Wild bergamot'));
    await user.click(more('Wild bergamot'));
    expect(more('Wild bergamot')).toBeDisabled();
    await user.click(more('Butterfly milkweed'));
    await user.click(more('Butterfly milkweed'));
    await user.click(more('Butterfly milkweed'));
    expect(more('Butterfly milkweed')).toBeDisabled();
    expect(screen.getByText('5 of 6 plants chosen')).toBeInTheDocument();

    expect(screen.getByRole('radio', { name: /9:30 am – 10:00 am/ })).toBeDisabled();
    await user.click(screen.getByRole('radio', { name: /9:00 am – 9:30 am/ }));
    await fillDetails(user);
    await user.click(screen.getByRole('button', { name: 'Reserve these plants' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Your plants are reserved' })).toBeInTheDocument();
    expect(
      screen.getByText(/We sent a confirmation to priya.vantongeren@example.org with a private link/),
    ).toBeVisible();
    expect(screen.getByText('Saturday, June 12, 2027, 9:00 am – 9:30 am')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Change or cancel this reservation' })).toHaveAttribute(
      'href',
      `/plant-share/reservations/${TOKEN}`,
    );
    expect(screen.getByText('Larkfield Commons Hall, 1 Commons Lane, Larkfield, WI')).toBeInTheDocument();
    expect(screen.getByText('Stay in your car; volunteers bring the plants to you.')).toBeInTheDocument();
    expect(screen.getByText('Plant 18 in (46 cm) apart.')).toBeInTheDocument();
    expect(screen.getByRole('list', { name: 'Cautions for Butterfly milkweed' })).toHaveTextContent(/Milky sap/);
    expect(api.callsTo('POST', `${SHARE_PATH}/reservations`)[0].body).toEqual({
      name: 'Priya Vantongeren',
      email: 'priya.vantongeren@example.org',
      zip: '53597',
      slotId: SLOT_1,
      lines: [
        { speciesSlug: 'asclepias-tuberosa', count: 3 },
        { speciesSlug: 'monarda-fistulosa', count: 2 },
      ],
    });
  });

  it('names each missing field and sends nothing', async () => {
    const { user, api } = openShare();
    await screen.findByRole('article', { name: 'Wild bergamot' });
    await user.type(screen.getByRole('textbox', { name: /^ZIP code/ }), '5359');
    await user.click(screen.getByRole('button', { name: 'Reserve these plants' }));
    expect(screen.getByText('Choose at least one plant first.')).toBeInTheDocument();
    expect(screen.getByText('Choose a pickup slot.')).toBeInTheDocument();
    // The shared reservation schema's own words (shared/src/plant-share/requests.ts).
    expect(screen.getByText('Must not be empty')).toBeInTheDocument();
    expect(screen.getByText('Must be a 5-digit ZIP code')).toBeInTheDocument();
    expect(api.callsTo('POST', `${SHARE_PATH}/reservations`)).toHaveLength(0);
  });

  it('offers the waitlist when the plants were all taken (409)', async () => {
    const { user, api } = openShare({
      [`POST ${SHARE_PATH}/reservations`]: apiError(409, 'All taken: Wild bergamot', {
        error: 'Conflict',
        waitlist: { speciesSlugs: ['monarda-fistulosa'], path: `${SHARE_PATH}/waitlist` },
      }),
      [`POST ${SHARE_PATH}/waitlist`]: {
        status: 201,
        body: { entries: [{ speciesSlug: 'monarda-fistulosa', commonName: 'Wild bergamot', count: 1, position: 1 }] },
      },
    });
    await screen.findByRole('article', { name: 'Wild bergamot' });
    await user.click(card('Wild bergamot').getByRole('button', { name: /One more/ }));
    await user.click(screen.getByRole('radio', { name: /9:00 am/ }));
    await fillDetails(user);
    await user.click(screen.getByRole('button', { name: 'Reserve these plants' }));

    expect(await screen.findByText(/Join the waitlist for Wild bergamot\?/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Join the waitlist' }));
    expect(await screen.findByText(/You are on the waitlist/)).toBeInTheDocument();
    expect(api.callsTo('POST', `${SHARE_PATH}/waitlist`)[0].body).toEqual({
      name: 'Priya Vantongeren',
      email: 'priya.vantongeren@example.org',
      zip: '53597',
      lines: [{ speciesSlug: 'monarda-fistulosa', count: 1 }],
    });
    // What is left changed for everyone, so the list is read again.
    expect(api.callsTo('GET', SHARE_PATH).length).toBeGreaterThanOrEqual(2);
  });

  it('speaks Spanish with the page: the lead, limits, what is left, slots and the reserve form', async () => {
    renderApp({ path: `/share/${GROUP}`, locale: 'es', api: { [`GET ${SHARE_PATH}`]: shareAnswer } });
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Reparto de plantas: Larkfield Commons Growers' }),
    ).toBeVisible();
    // The Spanish long date as CLDR writes it for es-US (Intl.DateTimeFormat), not a hand-built string.
    expect(screen.getByText(/Recogida el sábado, 12 de junio de 2027 en Larkfield Commons Hall/)).toBeInTheDocument();
    expect(screen.getByText(/Hasta 3 de cada especie y 6 plantas en total por hogar\./)).toBeInTheDocument();
    expect(card('Butterfly milkweed').getByText('Quedan 12')).toBeInTheDocument();
    expect(card('Southern blue flag').getByText('No queda ninguna')).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Reservar plantas' })).toBeInTheDocument();
    // es-US writes the morning as "a.m." (CLDR); the slot keeps the organiser's clock.
    expect(screen.getByRole('radio', { name: /9:00 a\.m\. – 9:30 a\.m\./ })).toBeInTheDocument();
    expect(screen.getByText('Quedan 4 lugares')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Reservar estas plantas' })).toBeInTheDocument();
    expect(screen.queryByText(/left|Reserve/)).not.toBeInTheDocument();
  });

  it('says when there is no share at the address', async () => {
    renderApp({ path: '/share/no-such-group', api: {} });
    expect(await screen.findByText(/There is no plant share at this address/)).toBeInTheDocument();
  });
});
