import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { apiError, type FakeRoutes } from '../../../testing/fake-api.js';
import { juniperGrower, maraOrganiser, priyaMember } from '../../../testing/fixtures.js';
import { renderApp } from '../../../testing/render-app.js';
import { SEASON_PATH, season, seedList, shareList } from '../testing/season-fixtures.js';

// What each person may do follows the season API (api/src/seasons): organisers write, the group's
// growers and members read. Counts come from the fake answers in ../testing/season-fixtures.ts.
const seasonRoutes = (over: FakeRoutes = {}): FakeRoutes => ({
  [`GET ${SEASON_PATH}`]: { body: season },
  [`GET ${SEASON_PATH}/seed-list`]: { body: seedList },
  ...over,
});

function openSeason(me = maraOrganiser, over: FakeRoutes = {}) {
  return renderApp({ path: '/season', token: 'token', api: { 'GET /api/me': { body: me }, ...seasonRoutes(over) } });
}

/** The targets table's row for a species, found by its common name. */
function targetRow(name: string) {
  const table = within(screen.getByRole('region', { name: 'Targets table' }));
  return table.getByText(name).closest('tr') as HTMLElement;
}

describe('the season page', () => {
  it('speaks Spanish when the page is in Spanish: title, dates and the milkweed share', async () => {
    renderApp({
      path: '/season',
      token: 'token',
      locale: 'es',
      api: { 'GET /api/me': { body: maraOrganiser }, ...seasonRoutes() },
    });
    expect(await screen.findByRole('heading', { level: 1, name: 'Plan de temporada 2027' })).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Fechas y métodos' })).toBeInTheDocument();
    expect(screen.getByText('lunes, 10 de mayo de 2027')).toBeInTheDocument(); // CLDR es-US via Intl
    expect(screen.getByText(/^25\s?%\s+de las plantas$/)).toBeInTheDocument();
    // Targets and seed list in Spanish too, the numbers as the fixture gives them.
    expect(screen.getByRole('heading', { name: 'Objetivos' })).toBeInTheDocument();
    const targets = within(screen.getByRole('region', { name: 'Tabla de objetivos' }));
    expect(targets.getByRole('textbox', { name: 'Plantas objetivo de Butterfly milkweed' })).toHaveValue('60');
    expect(screen.getByRole('button', { name: 'Guardar los objetivos' })).toBeInTheDocument();
    expect(await screen.findByRole('heading', { name: 'Lista de semillas' })).toBeInTheDocument();
    // 0.2 of seedlings lost is "20 %" in es-US (CLDR percent pattern via Intl).
    expect(
      await screen.findByText(
        /Calculada para 2027 contando un 20\s?% de plántulas perdidas y 100 semillas por sobre\./,
      ),
    ).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Tabla de la lista de semillas' })).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Antes de recolectar o sembrar' })).toBeInTheDocument();
  });

  it("shows an organiser the season's dates, targets and seed list with its cautions", async () => {
    openSeason();
    expect(await screen.findByRole('heading', { level: 1, name: 'Season plan 2027' })).toBeInTheDocument();
    expect(screen.getByText('Monday, May 10, 2027')).toBeInTheDocument();
    expect(screen.getByText('Saturday, June 12, 2027')).toBeInTheDocument();
    expect(within(targetRow('Butterfly milkweed')).getByRole('textbox', { name: /Target plants/ })).toHaveValue('60');
    expect(within(targetRow('Wild bergamot')).getByRole('textbox', { name: /germination/ })).toHaveValue('70');

    const seeds = within(await screen.findByRole('region', { name: 'Seed list table' }));
    const milkweed = within(seeds.getByText('Butterfly milkweed').closest('tr') as HTMLElement);
    expect(milkweed.getByText('150')).toBeInTheDocument();
    expect(milkweed.getByText('0.97 g / 0.034 oz')).toBeInTheDocument();
    expect(milkweed.getByText('Collect locally instead')).toBeInTheDocument();
    expect(screen.getByText(/Pods split in September/)).toBeInTheDocument();
    expect(screen.getByText(/Milky sap irritates eyes/)).toBeInTheDocument();
    expect(screen.getByText(/landowner's permission/)).toBeInTheDocument();
    expect(screen.getByText(/Dry potting mix is dusty/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Download the seed list (CSV)' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Print the seed list' })).toBeInTheDocument();
  });

  it('checks an edited target, then saves the whole list and works the seed list out again', async () => {
    const { user, api } = openSeason(maraOrganiser, {
      [`PUT ${SEASON_PATH}/targets`]: (req) => {
        const body = req.body as { targets: { slug: string; targetPlants: number }[] };
        return { body: { ...season, targets: season.targets.map((t, i) => ({ ...t, ...body.targets[i] })) } };
      },
    });
    const plants = within(await waitForRow('Butterfly milkweed')).getByRole('textbox', { name: /Target plants/ });

    // targetsRequestSchema: at least 1 plant per target; nothing is sent while a row is wrong.
    await user.clear(plants);
    await user.type(plants, '0');
    await user.click(screen.getByRole('button', { name: 'Save targets' }));
    expect(await within(targetRow('Butterfly milkweed')).findByText('Must be at least 1')).toBeInTheDocument();
    expect(api.callsTo('PUT', `${SEASON_PATH}/targets`)).toHaveLength(0);

    await user.clear(plants);
    await user.type(plants, '90');
    await user.type(within(targetRow('Butterfly milkweed')).getByRole('textbox', { name: /germination/ }), '55');
    await user.click(screen.getByRole('button', { name: 'Save targets' }));

    expect(await screen.findByText('Targets saved.')).toBeInTheDocument();
    expect(api.callsTo('PUT', `${SEASON_PATH}/targets`)[0].body).toEqual({
      targets: [
        { slug: 'asclepias-tuberosa', targetPlants: 90, germinationRatePct: 55 },
        { slug: 'monarda-fistulosa', targetPlants: 80, germinationRatePct: 70 },
      ],
    });
    expect(api.callsTo('GET', `${SEASON_PATH}/seed-list`).length).toBeGreaterThanOrEqual(2);
  });

  it('removes a target and saves the shorter list', async () => {
    const { user, api } = openSeason(maraOrganiser, { [`PUT ${SEASON_PATH}/targets`]: { body: season } });
    await waitForRow('Wild bergamot');
    await user.click(screen.getByRole('button', { name: 'Remove Wild bergamot' }));
    expect(screen.getByText('You have changes that are not saved yet.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save targets' }));
    await screen.findByText('Targets saved.');
    expect(api.callsTo('PUT', `${SEASON_PATH}/targets`)[0].body).toEqual({
      targets: [{ slug: 'asclepias-tuberosa', targetPlants: 60 }],
    });
  });

  it('proposes species at the milkweed share the organiser sets, and adds one to the targets', async () => {
    const { user, api } = openSeason(maraOrganiser, {
      [`POST ${SEASON_PATH}/share-list/propose`]: { body: shareList },
      [`PUT ${SEASON_PATH}/targets`]: { body: season },
    });
    const share = await screen.findByRole('textbox', { name: 'Milkweeds for monarchs (% of the plants)' });
    expect(share).toHaveValue('25');
    await user.clear(share);
    await user.type(share, '40');
    await user.click(screen.getByRole('button', { name: 'Propose species' }));

    expect(await screen.findByText('Blooms in May, when the list has least in flower.')).toBeInTheDocument();
    expect(screen.getByText('Host plant of the black swallowtail caterpillar.')).toBeInTheDocument();
    expect(
      screen.getByText(/Bloom period: early\. Suits: Full sun or part shade; medium-moist or wet soil\./),
    ).toBeInTheDocument();
    expect(api.callsTo('POST', `${SEASON_PATH}/share-list/propose`)[0].body).toEqual({ milkweedShare: 0.4 });

    await user.click(screen.getByRole('button', { name: 'Add Golden alexanders to targets' }));
    expect(within(targetRow('Golden alexanders')).getByRole('textbox', { name: /Target plants/ })).toHaveValue('40');
    expect(screen.getByRole('button', { name: 'Golden alexanders is on your targets' })).toBeDisabled();

    await user.click(screen.getByRole('button', { name: 'Save targets' }));
    await screen.findByText('Targets saved.');
    expect(api.callsTo('PUT', `${SEASON_PATH}/targets`)[0].body).toEqual({
      targets: [
        { slug: 'asclepias-tuberosa', targetPlants: 60 },
        { slug: 'monarda-fistulosa', targetPlants: 80, germinationRatePct: 70 },
        { slug: 'zizia-aurea', targetPlants: 40 },
      ],
    });
  });

  it('shows a 400 naming one target beside that row and changes nothing else', async () => {
    // The API's answer for a species no longer in the catalogue (MixContextService.assertKnown).
    const { user, api } = openSeason(maraOrganiser, {
      [`PUT ${SEASON_PATH}/targets`]: apiError(400, 'Not in the catalogue: monarda-fistulosa', {
        error: 'Bad Request',
        fields: [{ field: 'targets.1.slug', message: '"monarda-fistulosa" is not in the catalogue' }],
      }),
    });
    const plants = within(await waitForRow('Butterfly milkweed')).getByRole('textbox', { name: /Target plants/ });
    await user.clear(plants);
    await user.type(plants, '75');
    await user.click(screen.getByRole('button', { name: 'Save targets' }));

    expect(
      await within(targetRow('Wild bergamot')).findByText('"monarda-fistulosa" is not in the catalogue'),
    ).toBeInTheDocument();
    expect(within(targetRow('Butterfly milkweed')).queryByRole('alert')).not.toBeInTheDocument();
    expect(within(targetRow('Butterfly milkweed')).getByRole('textbox', { name: /Target plants/ })).toHaveValue('75');
    expect(screen.queryByText('Targets saved.')).not.toBeInTheDocument();
    expect(screen.getByText('You have changes that are not saved yet.')).toBeInTheDocument();
    // Nothing was written, so the season and seed list are not fetched again.
    expect(api.callsTo('GET', SEASON_PATH)).toHaveLength(1);
    expect(api.callsTo('GET', `${SEASON_PATH}/seed-list`)).toHaveLength(1);
  });

  it('shows a grower the plan read only', async () => {
    openSeason(juniperGrower);
    expect(await screen.findByRole('heading', { level: 1, name: 'Season plan 2027' })).toBeInTheDocument();
    const targets = within(screen.getByRole('region', { name: 'Targets table' }));
    expect(targets.getByText('Butterfly milkweed')).toBeInTheDocument();
    expect(targets.getByText('70% (tested)')).toBeInTheDocument();
    expect(await screen.findByRole('region', { name: 'Seed list table' })).toBeInTheDocument();
    expect(screen.queryByRole('textbox')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Save targets' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Propose species' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Remove / })).not.toBeInTheDocument();
  });

  it('downloads the seed list CSV with the sign-in token, and prints', async () => {
    const createObjectURL = vi.fn(() => 'blob:seed-list');
    // jsdom has no object URLs; a stand-in URL class keeps the real one untouched for other tests.
    vi.stubGlobal('URL', Object.assign(class extends URL {}, { createObjectURL, revokeObjectURL: vi.fn() }));
    const print = vi.spyOn(window, 'print').mockImplementation(() => undefined);
    const { user, api } = openSeason(maraOrganiser, { [`GET ${SEASON_PATH}/seed-list.csv`]: { body: 'csv' } });
    await user.click(await screen.findByRole('button', { name: 'Download the seed list (CSV)' }));
    await vi.waitFor(() => expect(createObjectURL).toHaveBeenCalledTimes(1));
    expect(api.callsTo('GET', `${SEASON_PATH}/seed-list.csv`)[0].headers.authorization).toBe('Bearer token');
    await user.click(screen.getByRole('button', { name: 'Print the seed list' }));
    expect(print).toHaveBeenCalledTimes(1);
  });

  it("lets an organiser move the season's dates, checked as the API checks them", async () => {
    const { user, api } = openSeason(maraOrganiser, {
      [`PUT ${SEASON_PATH}`]: (req) => ({ body: { ...season, ...(req.body as object) } }),
    });
    const form = within(await screen.findByRole('form', { name: "Change the season's dates" }));
    const share = form.getByLabelText('Plant share');
    // seasonRequestSchema: the plant share falls after the last frost.
    await user.clear(share);
    await user.type(share, '2027-04-01');
    await user.click(form.getByRole('button', { name: 'Save the dates' }));
    expect(await form.findByText('Must be after the last frost')).toBeInTheDocument();
    expect(api.callsTo('PUT', SEASON_PATH)).toHaveLength(0);
    await user.clear(share);
    await user.type(share, '2027-06-19');
    await user.click(form.getByRole('button', { name: 'Save the dates' }));
    expect(await form.findByText(/Dates saved/)).toBeInTheDocument();
    expect(api.callsTo('PUT', SEASON_PATH)[0].body).toEqual({
      year: 2027,
      lastFrost: '2027-05-10',
      plantShareDate: '2027-06-19',
    });
  });

  it('tells someone in no growing group what the page is for', async () => {
    const { api } = openSeason(priyaMember);
    expect(await screen.findByText(/You are not in a growing group yet/)).toBeInTheDocument();
    expect(api.callsTo('GET', SEASON_PATH)).toHaveLength(0);
  });
});

async function waitForRow(name: string) {
  await screen.findByRole('region', { name: 'Targets table' });
  return targetRow(name);
}
