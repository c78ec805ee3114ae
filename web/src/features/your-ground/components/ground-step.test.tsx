import type { PlaceLookup } from '@homeground/shared';
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { apiError } from '../../../testing/fake-api.js';
import { renderApp } from '../../../testing/render-app.js';

// Lookup answers: Vernon County, WI (ZIP 54665, Viroqua) in ecoregion 52 as the demo API answers
// it (county crosswalk share 1). The split-county answer is hand-built for the test: its shares
// are made up, only the two ecoregion names are EPA's (Level III 52 and 53).
const viroqua: PlaceLookup = {
  point: { lat: 43.5442, lon: -90.8939 },
  zip: { code: '54665', city: 'Viroqua', state: 'WI' },
  state: 'WI',
  county: { fips: '55123', name: 'Vernon' },
  ecoregion: {
    code: '52',
    name: 'Driftless Area',
    share: 1,
    description: 'Hills and deep valleys the glaciers missed.',
    level1: 'Eastern Temperate Forests',
    level2: 'Mixed Wood Plains',
    method: 'county-crosswalk',
  },
  otherEcoregions: [],
};
const split: PlaceLookup = {
  ...viroqua,
  zip: null,
  ecoregion: { ...viroqua.ecoregion, share: 0.6 },
  otherEcoregions: [
    {
      code: '53',
      name: 'Southeastern Wisconsin Till Plains',
      share: 0.4,
      description: 'Gently rolling glacial till plains.',
      level1: 'Eastern Temperate Forests',
      level2: 'Mixed Wood Plains',
    },
  ],
};

describe('your ground', { timeout: 30_000 }, () => {
  it('checks the ZIP before asking, then shows state, county and ecoregion with its description', async () => {
    const { user, api, router } = renderApp({
      path: '/find-plants',
      api: { 'GET /api/places/lookup': { body: viroqua } },
    });
    const zip = await screen.findByRole('textbox', { name: 'ZIP code' });
    await user.type(zip, '5466');
    await user.click(screen.getByRole('button', { name: 'Find my ground' }));
    expect(screen.getByText('Enter a 5-digit ZIP code, such as 54665.')).toBeInTheDocument();
    expect(api.callsTo('GET', '/api/places/lookup')).toHaveLength(0);

    await user.type(zip, '5');
    await user.click(screen.getByRole('button', { name: 'Find my ground' }));
    expect(await screen.findByText(/Vernon County, Wisconsin/)).toBeInTheDocument();
    expect(screen.getByText('(ZIP 54665, Viroqua)', { exact: false })).toBeInTheDocument();
    expect(screen.getByText('Ecoregion: Driftless Area (52)')).toBeInTheDocument();
    expect(screen.getByText('Hills and deep valleys the glaciers missed.')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Next: your yard' }));
    expect(await screen.findByRole('heading', { name: 'Step 2 of 3: your yard' })).toBeInTheDocument();
    expect(Object.fromEntries(new URLSearchParams(router.state.location.search))).toEqual({
      step: 'yard',
      state: 'WI',
      eco: '52',
    });
  });

  it('says an unknown ZIP in words beside the field', async () => {
    const { user } = renderApp({
      path: '/find-plants',
      api: {
        'GET /api/places/lookup': apiError(400, '00000 is not a US ZIP code we know. Check the five digits.', {
          fields: [{ field: 'zip', message: '00000 is not a US ZIP code we know' }],
        }),
      },
    });
    await user.type(await screen.findByRole('textbox', { name: 'ZIP code' }), '00000');
    await user.click(screen.getByRole('button', { name: 'Find my ground' }));
    expect(await screen.findByText('00000 is not a US ZIP code we know. Check the five digits.')).toBeInTheDocument();
  });

  it('asks which ecoregion when the county is split, with radio cards and descriptions', async () => {
    const { user, router } = renderApp({ path: '/find-plants', api: { 'GET /api/places/lookup': { body: split } } });
    await user.type(await screen.findByRole('textbox', { name: 'ZIP code' }), '54665');
    await user.click(screen.getByRole('button', { name: 'Find my ground' }));
    const group = await screen.findByRole('radiogroup', { name: /more than one ecoregion/ });
    expect(group).toHaveTextContent('Driftless Area (ecoregion 52): about 60% of your county');
    expect(group).toHaveTextContent('Gently rolling glacial till plains.');
    expect(
      screen.getByText(/By county: your county is mostly in Driftless Area \(about 60%\)\./, { exact: false }),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('radio', { name: /Southeastern Wisconsin Till Plains/ }));
    expect(screen.getByText('Ecoregion: Southeastern Wisconsin Till Plains (53)')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Next: your yard' }));
    await waitFor(() =>
      expect(Object.fromEntries(new URLSearchParams(router.state.location.search))).toEqual({
        step: 'yard',
        state: 'WI',
        eco: '53',
      }),
    );
  });

  it('explains in words when the browser is not allowed to share the location', async () => {
    // W3C Geolocation: error code 1 is PERMISSION_DENIED.
    vi.stubGlobal('navigator', {
      ...navigator,
      geolocation: { getCurrentPosition: (_ok: unknown, fail: (e: { code: number }) => void) => fail({ code: 1 }) },
    });
    const { user } = renderApp({ path: '/find-plants' });
    await user.click(await screen.findByRole('button', { name: 'Use my location' }));
    expect(await screen.findByText(/was not allowed to use your location/)).toBeInTheDocument();
  });

  it('says in a whole sentence when the located point is outside the 48 states and DC', async () => {
    // Fairbanks, Alaska (64.84 N, 147.72 W): the EPA maps Level III ecoregions of the conterminous US only.
    vi.stubGlobal('navigator', {
      ...navigator,
      geolocation: {
        getCurrentPosition: (ok: (p: { coords: { latitude: number; longitude: number } }) => void) =>
          ok({ coords: { latitude: 64.84, longitude: -147.72 } }),
      },
    });
    const sentence =
      'Alaska is outside the area Homeground covers. Homeground covers the 48 conterminous states and the District of Columbia, where the EPA maps its Level III ecoregions.';
    const { user, api } = renderApp({
      path: '/find-plants',
      api: {
        'GET /api/places/lookup': apiError(400, sentence, {
          fields: [{ field: 'lat', message: 'is outside the 48 conterminous states and DC' }],
        }),
      },
    });
    await user.click(await screen.findByRole('button', { name: 'Use my location' }));
    expect(await screen.findByText(new RegExp(`^${sentence} Click on land in the lower 48`))).toBeInTheDocument();
    expect(api.callsTo('GET', '/api/places/lookup')).toHaveLength(1);
  });

  it("draws the chosen ecoregion's EPA outline on the map when the boundaries are loaded", async () => {
    // A made-up square over western Wisconsin stands in for the EPA outline of 52 (only its code is EPA's).
    const square = [
      [
        [-91.5, 43],
        [-90, 43],
        [-90, 44.5],
        [-91.5, 44.5],
        [-91.5, 43],
      ],
    ];
    const { user } = renderApp({
      path: '/find-plants',
      api: {
        'GET /api/places/lookup': { body: viroqua },
        'GET /api/ecoregions/52/outline': { body: { code: '52', outline: { type: 'Polygon', coordinates: square } } },
      },
    });
    await user.type(await screen.findByRole('textbox', { name: 'ZIP code' }), '54665');
    await user.click(screen.getByRole('button', { name: 'Find my ground' }));
    await screen.findByText('Ecoregion: Driftless Area (52)');
    await waitFor(() => expect(document.querySelector('path[data-ecoregion="Driftless Area"]')).not.toBeNull());
    expect(document.querySelector('path[data-chosen="true"]')).toBeNull();
  });

  it('shades the chosen state on the map when no ecoregion outline is loaded', async () => {
    const { user } = renderApp({
      path: '/find-plants',
      api: {
        'GET /api/places/lookup': { body: viroqua },
        'GET /api/ecoregions/52/outline': { body: { code: '52', outline: null } },
      },
    });
    await user.type(await screen.findByRole('textbox', { name: 'ZIP code' }), '54665');
    await user.click(screen.getByRole('button', { name: 'Find my ground' }));
    await screen.findByText('Ecoregion: Driftless Area (52)');
    await waitFor(() => expect(document.querySelector('path[data-chosen="true"]')).not.toBeNull());
    expect(document.querySelector('path[data-chosen="true"]')?.getAttribute('data-state')).toBe('Wisconsin');
    expect(document.querySelector('path[data-ecoregion]')).toBeNull();
  });

  it('lists the District of Columbia under D in the state picker', async () => {
    renderApp({ path: '/find-plants' });
    const select = await screen.findByRole('combobox', { name: /State/ });
    const names = Array.from(select.querySelectorAll('option')).map((o) => o.textContent);
    const at = names.indexOf('Delaware');
    expect(names.slice(at, at + 3)).toEqual(['Delaware', 'District of Columbia', 'Florida']);
    expect(names).not.toContain('the District of Columbia');
  });
});
