import type { SavedMix } from '@homeground/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import {
  driftlessEcoregion,
  FIXTURE_MIX_PATH,
  fixtureMix,
  fixtureSpecies,
} from '../features/yard-mix/testing/mix-fixtures.js';
import { maraOrganiser } from '../testing/fixtures.js';
import { renderApp } from '../testing/render-app.js';

// Mara Ellsworth and the Larkfield yard come from DESIGN.md's invented demo scenario; the mix is
// the hand-built fixture of features/yard-mix/testing/mix-fixtures.ts.
const SAVED_ID = '7d0f1c9e-3b7a-4c1e-9a51-2f3e4d5c6b7a';
const saved: SavedMix = {
  id: SAVED_ID,
  name: 'Front bed by the porch',
  request: {
    site: { sun: 'full', moisture: 'medium', areaSqFt: 200, deerPressure: 'medium', goals: ['pollinators'] },
    region: { state: 'WI', ecoregionCode: '52' },
    options: { locked: [], excluded: [] },
  },
  chosen: fixtureSpecies.map((s) => s.slug),
  ownerFirstName: 'Mara',
  createdAt: '2026-03-14T15:00:00.000Z',
};

const mixApi = {
  'POST /api/mixes/balance': { body: fixtureMix() },
  'GET /api/ecoregions/52': { body: driftlessEcoregion },
  'GET /api/species/test-late': { body: { ...fixtureSpecies[3], cautions: [] } },
};

describe('saving and sharing a mix', { timeout: 30_000 }, () => {
  it('saves the mix for a signed-in person and shows its share link', async () => {
    const { user, api } = renderApp({
      path: FIXTURE_MIX_PATH,
      token: 'mara-token',
      api: { ...mixApi, 'GET /api/me': { body: maraOrganiser }, 'POST /api/mixes': { status: 201, body: saved } },
    });
    await user.click(await screen.findByRole('button', { name: 'Save this mix' }, { timeout: 5000 }));
    const name = screen.getByRole('textbox', { name: /Name of the mix/ });
    await user.clear(name);
    await user.type(name, 'Front bed by the porch');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByRole('link', { name: `/mixes/${SAVED_ID}` })).toHaveAttribute(
      'href',
      `/mixes/${SAVED_ID}`,
    );
    const body = api.callsTo('POST', '/api/mixes')[0].body as {
      name: string;
      chosen: string[];
      request: { options: unknown };
    };
    expect(body.name).toBe('Front bed by the porch');
    expect(body.chosen).toEqual(fixtureSpecies.map((s) => s.slug));
    expect(body.request.options).toEqual({ locked: [], excluded: [] });
    expect(api.callsTo('POST', '/api/mixes')[0].headers.authorization).toBe('Bearer mara-token');
  });

  it('opens a saved mix from its link with its name and who saved it, showing the same species', async () => {
    const { api } = renderApp({
      path: `/mixes/${SAVED_ID}`,
      api: { ...mixApi, [`GET /api/mixes/${SAVED_ID}`]: { body: saved } },
    });
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Front bed by the porch' }, { timeout: 5000 }),
    ).toBeInTheDocument();
    expect(screen.getByText(/saved by Mara on March 14, 2026/)).toBeInTheDocument();
    const table = await screen.findByRole('table', { name: /one species a row/ });
    expect(within(table).getAllByRole('rowheader')).toHaveLength(fixtureSpecies.length);
    await waitFor(() => expect(api.callsTo('POST', '/api/mixes/balance')).toHaveLength(1));
    expect(api.callsTo('POST', '/api/mixes/balance')[0].body).toMatchObject({
      options: { size: fixtureSpecies.length, locked: fixtureSpecies.map((s) => s.slug), excluded: [] },
    });
  });

  it('says so in words when there is no saved mix at the link', async () => {
    renderApp({ path: `/mixes/${SAVED_ID}` });
    expect(await screen.findByText('There is no saved mix at this link', {}, { timeout: 5000 })).toBeInTheDocument();
  });
});
