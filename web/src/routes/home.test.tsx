import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError } from '../testing/fake-api.js';
import { renderApp } from '../testing/render-app.js';

// The figures are whatever the fake API answers (src/testing/fixtures.ts: 412 species, 3 groups,
// 7 ecoregions, version 0.1.0-test); the page must show those, not numbers of its own, and no developer text.
describe('home page', () => {
  it('shows the figures from /api/stats and no API version', async () => {
    renderApp();
    const figures = within(await screen.findByRole('region', { name: 'In the catalogue today' }));
    const species = await figures.findByText('412');
    expect(species.previousElementSibling ?? species.parentElement).toHaveTextContent(/native species/);
    expect(figures.getByText('3')).toBeInTheDocument();
    expect(figures.getByText('7')).toBeInTheDocument();
    expect(document.body).not.toHaveTextContent(/0\.1\.0-test|API version|\bAPI\b/);
  });

  it('says calmly when the catalogue database is not answering', async () => {
    renderApp({
      api: {
        'GET /api/health': {
          body: { status: 'ok', version: '0.1.0-test', database: { status: 'down', migrations: 0 }, uptimeSeconds: 5 },
        },
      },
    });
    expect(await screen.findByText(/The catalogue is not answering right now/)).toBeInTheDocument();
    expect(document.body).not.toHaveTextContent(/0\.1\.0-test|API version/);
  });

  it('says what Homeground does and offers one primary action', async () => {
    renderApp();
    expect(await screen.findByRole('heading', { level: 1, name: /native plants/ })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Find plants for your ground' })).toHaveAttribute('href', '/find-plants');
  });

  it('lists the growing groups from /api/groups', async () => {
    renderApp();
    expect(await screen.findByText('Larkfield Commons Growers')).toBeInTheDocument();
    expect(screen.getByText(/Larkfield, WI · ecoregion 52 · 7 members/)).toBeInTheDocument();
  });

  it('explains in words when the figures do not load, and retries', async () => {
    const { user, api } = renderApp({ api: { 'GET /api/stats': apiError(503, 'The catalogue is being updated') } });
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The catalogue figures did not load.');
    expect(alert).toHaveTextContent('The catalogue is being updated');
    await user.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(api.callsTo('GET', '/api/stats').length).toBeGreaterThanOrEqual(2);
  });

  // Spanish written for this page (from-memory, plain "tú" voice); thousands in es-US per CLDR.
  it('speaks Spanish when Spanish is chosen, plurals included', async () => {
    renderApp({ locale: 'es' });
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Cultiva las plantas nativas que son de tu terreno' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Busca plantas para tu terreno' })).toHaveAttribute('href', '/find-plants');
    expect(await screen.findByText(/Larkfield, WI · ecorregión 52 · 7 miembros/)).toBeInTheDocument();
    expect(within(screen.getByRole('region', { name: 'Hoy en el catálogo' })).getByText('412')).toBeInTheDocument();
  });
});
