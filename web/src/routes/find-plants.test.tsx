import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { driftlessEcoregion, fixtureMix } from '../features/yard-mix/testing/mix-fixtures.js';
import { renderApp } from '../testing/render-app.js';

// Your ground: WI, EPA Level III ecoregion 52 (Driftless Area); the mix is the hand-built fixture.
describe('find plants: from your yard to your yard mix', { timeout: 30_000 }, () => {
  it('sends the yard answers with your ground and shows the mix, with the answers in the URL', async () => {
    const { user, api, router } = renderApp({
      path: '/find-plants?step=yard&state=WI&eco=52',
      api: {
        'POST /api/mixes/balance': { body: fixtureMix() },
        'GET /api/ecoregions/52': { body: driftlessEcoregion },
      },
    });
    expect(
      await screen.findByText('Driftless Area (ecoregion 52) of Wisconsin', {}, { timeout: 5000 }),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('radio', { name: /^Shade/ }));
    await user.click(screen.getByRole('radio', { name: /^Wet/ }));
    await user.click(screen.getByRole('radio', { name: /^Often/ }));
    await user.type(screen.getByRole('textbox', { name: /Area to plant/ }), '150');
    await user.click(screen.getByRole('button', { name: 'Show my yard mix' }));

    expect(await screen.findByRole('heading', { name: 'Your yard mix' }, { timeout: 5000 })).toBeInTheDocument();
    expect(api.callsTo('POST', '/api/mixes/balance')[0].body).toEqual({
      site: { sun: 'shade', moisture: 'wet', areaSqFt: 150, deerPressure: 'high', goals: [] },
      region: { state: 'WI', ecoregionCode: '52' },
      options: { locked: [], excluded: [] },
    });
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('chosen')).toBeTruthy());
    expect(new URLSearchParams(router.state.location.search).get('sun')).toBe('shade');
    expect(document.title).toBe('Your yard mix · Homeground');
  });

  it('says in words when a shared link has broken yard answers', async () => {
    renderApp({ path: '/find-plants?state=WI&eco=52&sun=sideways&moisture=wet&area=200&deer=low' });
    expect(
      await screen.findByText("This link's yard answers are incomplete", {}, { timeout: 5000 }),
    ).toBeInTheDocument();
  });
});
