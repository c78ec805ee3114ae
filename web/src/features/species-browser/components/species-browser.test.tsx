import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, type installFakeApi } from '../../../testing/fake-api.js';
import { renderApp } from '../../../testing/render-app.js';
import { COLUMNS_STORAGE_KEY } from '../hooks/use-column-choice.js';
import { wisconsinEcoregions } from '../testing/ecoregion-fixtures.js';
import { butterflyMilkweed, speciesPage, yellowWildIndigo } from '../testing/species-summaries.js';

type FakeApi = ReturnType<typeof installFakeApi>;

/** The query strings of every GET /api/species the page sent (the fake API records only paths). */
function speciesQueries(api: FakeApi): URLSearchParams[] {
  return api.fetch.mock.calls
    .map(([input]) => new URL(String(input), 'http://homeground.test'))
    .filter((url) => url.pathname === '/api/species')
    .map((url) => url.searchParams);
}

const lastQuery = (api: FakeApi) => speciesQueries(api).at(-1)!;
/** The first render loads the page's lazy chunk; under a busy parallel test run that can pass 1 s. */
const FIRST_PAINT = { timeout: 5000 };

function openBrowser(path = '/species', page = speciesPage([butterflyMilkweed, yellowWildIndigo])) {
  return renderApp({
    path,
    api: {
      'GET /api/species': { body: page },
      'GET /api/ecoregions': { body: wisconsinEcoregions },
    },
  });
}

describe('species browser', () => {
  it('lists the species the API answers, with count, names, units and cautions', async () => {
    openBrowser();
    expect(await screen.findByRole('heading', { level: 2, name: '2 species' }, FIRST_PAINT)).toBeInTheDocument();
    const table = screen.getByRole('table');
    const row = within(table).getByRole('row', { name: /butterfly milkweed/ });
    expect(within(row).getByRole('link', { name: 'butterfly milkweed' })).toHaveAttribute(
      'href',
      '/species/asclepias-tuberosa',
    );
    expect(within(row).getByText('Asclepias tuberosa').closest('i')).not.toBeNull();
    // 30–75 cm is 1–2.5 ft (1 in = 2.54 cm).
    expect(within(row).getByText('1–2.5 ft')).toBeInTheDocument();
    expect(within(row).getByText('30–75 cm')).toBeInTheDocument();
    expect(within(row).getByRole('img', { name: 'Blooms Jun–Aug; orange flowers' })).toBeInTheDocument();
    expect(
      within(row).getByText('Irritating sap, Toxic if eaten, Has a look-alike, Harmful to livestock'),
    ).toBeInTheDocument();
    // Wildlife value in words, never the genus count: Asclepias 12 of the herbaceous list's top 115 (CHECK-VALUES §2, R).
    expect(within(row).getByText('a few caterpillars; monarch host')).toBeInTheDocument();
    expect(within(row).queryByText('12')).toBeNull();
  });

  it('searches as you type, after a pause, and puts the search in the URL', async () => {
    const { user, api, router } = openBrowser();
    await screen.findByRole('table', {}, FIRST_PAINT);
    await user.type(screen.getByRole('searchbox', { name: 'Search by name' }), 'buterfly weed');
    await waitFor(() => expect(lastQuery(api).get('q')).toBe('buterfly weed'));
    expect(router.state.location.search).toBe('?q=buterfly+weed');
    // Debounced: not one request per key.
    expect(speciesQueries(api).length).toBeLessThan(6);
    expect(
      await screen.findByRole('heading', { level: 2, name: '2 species match “buterfly weed”' }),
    ).toBeInTheDocument();
  });

  it('opens a shared link with its filters applied and shown', async () => {
    const { api } = openBrowser('/species?state=WI&ecoregion=52&sun=full&bloomMonth=7&monarchHost=true&minHeightCm=61');
    await screen.findByRole('table', {}, FIRST_PAINT);
    const q = lastQuery(api);
    expect(Object.fromEntries(q)).toMatchObject({
      state: 'WI',
      ecoregion: '52',
      sun: 'full',
      bloomMonth: '7',
      monarchHost: 'true',
      minHeightCm: '61',
    });
    expect(screen.getByRole('combobox', { name: 'Native to' })).toHaveValue('WI');
    await waitFor(() => expect(screen.getByRole('combobox', { name: 'Ecoregion (EPA Level III)' })).toHaveValue('52'));
    expect(screen.getByRole('checkbox', { name: 'Monarch caterpillar host plants only' })).toBeChecked();
    // 61 cm is 2 ft.
    expect(screen.getByRole('textbox', { name: 'From (ft)' })).toHaveValue('2');
    expect(api.callsTo('GET', '/api/ecoregions').length).toBeGreaterThan(0);
  });

  it('writes each filter to the URL, and asks for the chosen state’s ecoregions', async () => {
    const { user, api, router } = openBrowser();
    await screen.findByRole('table', {}, FIRST_PAINT);
    await user.selectOptions(screen.getByRole('combobox', { name: 'Native to' }), 'WI');
    await waitFor(() => expect(router.state.location.search).toBe('?state=WI'));
    await waitFor(() => expect(api.fetch.mock.calls.map(([i]) => String(i))).toContain('/api/ecoregions?state=WI'));
    const ecoregion = screen.getByRole('combobox', { name: 'Ecoregion (EPA Level III)' });
    await waitFor(() =>
      expect(within(ecoregion).getByRole('option', { name: '52 · Driftless Area' })).toBeInTheDocument(),
    );
    await user.selectOptions(ecoregion, '52');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Growth form' }), 'forb');
    await waitFor(() => expect(router.state.location.search).toBe('?state=WI&ecoregion=52&growthForm=forb'));
    expect(Object.fromEntries(lastQuery(api))).toMatchObject({ state: 'WI', ecoregion: '52', growthForm: 'forb' });
  });

  it('takes heights in feet and sends centimetres', async () => {
    const { user, api } = openBrowser();
    await screen.findByRole('table', {}, FIRST_PAINT);
    await user.type(screen.getByRole('textbox', { name: 'To (ft)' }), '3');
    await user.tab();
    // 3 ft = 36 in × 2.54 = 91.44 cm, sent rounded to whole centimetres.
    await waitFor(() => expect(lastQuery(api).get('maxHeightCm')).toBe('91'));
    expect(await screen.findByText('Up to 91 cm')).toBeInTheDocument();
  });

  it('sorts by a column header and says which way', async () => {
    const { user, api } = openBrowser();
    await screen.findByRole('table', {}, FIRST_PAINT);
    await user.click(screen.getByRole('button', { name: 'Wildlife value' }));
    await waitFor(() => expect(Object.fromEntries(lastQuery(api))).toMatchObject({ sort: 'hostValue', order: 'desc' }));
    await waitFor(() =>
      expect(screen.getByRole('columnheader', { name: /Wildlife value/ })).toHaveAttribute('aria-sort', 'descending'),
    );
    // Homeground's own words for the order (its several-part wildlife value), not a host count.
    expect(screen.getByRole('combobox', { name: 'Sort by' })).toHaveDisplayValue('Most wildlife value first');
    expect(screen.queryByRole('option', { name: /caterpillar hosts/i })).toBeNull();
  });

  it('hides a column and remembers the choice', async () => {
    const { user } = openBrowser();
    await screen.findByRole('table', {}, FIRST_PAINT);
    expect(screen.getByRole('columnheader', { name: 'Moisture' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Columns' }));
    await user.click(await screen.findByRole('menuitemcheckbox', { name: 'Moisture' }));
    await waitFor(() => expect(screen.queryByRole('columnheader', { name: 'Moisture' })).not.toBeInTheDocument());
    expect(JSON.parse(window.localStorage.getItem(COLUMNS_STORAGE_KEY)!)).toContain('moisture');
  });

  it('says so when nothing matches, and offers to clear the filters', async () => {
    const { user, router } = openBrowser('/species?state=WI&moisture=wet', speciesPage([]));
    expect(await screen.findByText('No species match: try fewer filters', {}, FIRST_PAINT)).toBeInTheDocument();
    await user.click(screen.getAllByRole('button', { name: 'Clear filters' }).at(-1)!);
    await waitFor(() => expect(router.state.location.search).toBe(''));
  });

  it('explains in words when the list does not load', async () => {
    renderApp({
      path: '/species',
      api: {
        'GET /api/species': apiError(503, 'The catalogue is being updated'),
        'GET /api/ecoregions': { body: wisconsinEcoregions },
      },
    });
    const alert = await screen.findByRole('alert', {}, FIRST_PAINT);
    expect(alert).toHaveTextContent('The species list did not load.');
    expect(alert).toHaveTextContent('The catalogue is being updated');
  });

  it('pages through results and offers the CSV export', async () => {
    const { user, api } = openBrowser('/species', speciesPage([butterflyMilkweed], 120, 1, 50));
    expect(await screen.findByText('Page 1 of 3', {}, FIRST_PAINT)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Next' }));
    await waitFor(() => expect(lastQuery(api).get('page')).toBe('2'));
    expect(screen.getByRole('link', { name: 'Whole catalogue (CSV)' })).toHaveAttribute(
      'href',
      '/api/species/export.csv',
    );
  });
});
