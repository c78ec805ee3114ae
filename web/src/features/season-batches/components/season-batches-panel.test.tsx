import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, type FakeRoutes } from '../../../testing/fake-api.js';
import { juniperGrower, maraOrganiser } from '../../../testing/fixtures.js';
import { renderApp } from '../../../testing/render-app.js';
import {
  batches,
  growers,
  progress,
  proposal,
  season,
  SEASON_PATH,
  seedList,
} from '../testing/season-batches-fixtures.js';

// Who sees what follows the batches API (api/src/batches): organisers split and watch progress.
// The forecast words show the API's own numbers with their range (DESIGN.md: no bare scores).
function openSeason(me = maraOrganiser, over: FakeRoutes = {}, locale?: 'en' | 'es') {
  return renderApp({
    path: '/season',
    token: 'token',
    ...(locale && { locale }),
    api: {
      'GET /api/me': { body: me },
      [`GET ${SEASON_PATH}`]: { body: season },
      [`GET ${SEASON_PATH}/seed-list`]: { body: seedList },
      [`GET ${SEASON_PATH}/growers`]: { body: growers },
      [`GET ${SEASON_PATH}/batches`]: { body: batches },
      [`GET ${SEASON_PATH}/progress`]: { body: progress },
      ...over,
    },
  });
}

describe("the organiser's growers, batches and progress", () => {
  it('shows progress per species and grower with the ready forecast and how it is worked out', async () => {
    openSeason();
    const bySpecies = within(await screen.findByRole('region', { name: 'Progress by species' }));
    const row = within(bySpecies.getByText('Wild bergamot').closest('tr') as HTMLElement);
    expect(row.getByText('about 36 (29–45)')).toBeInTheDocument();
    expect(row.getByText(/14 short of the target/)).toBeInTheDocument();
    expect(row.getByText(/sow about 24 more seeds \(14 more pots\), starting by 2026-12-02/)).toBeInTheDocument();
    const byGrower = within(screen.getByRole('region', { name: 'Progress by grower' }));
    expect(within(byGrower.getByText('Amara Reyes').closest('tr') as HTMLElement).getAllByText('1')).toHaveLength(2);
    expect(screen.getByText(/seeds planned × germination/)).toBeInTheDocument();
    const room = within(screen.getByRole('list', { name: 'Growers and their room' }));
    expect(room.getByText(/winter sowing in covered containers: 5 of 24 covered containers used/)).toBeInTheDocument();
    expect(room.getByText(/Has not said yet/)).toBeInTheDocument();
    expect(within(screen.getByRole('region', { name: "The group's supply list" })).getByText('50')).toBeInTheDocument();
  });

  it('proposes a split, keeps the logged batch by id, says what was not placed, and saves an edit', async () => {
    const { user, api } = openSeason(maraOrganiser, {
      [`POST ${SEASON_PATH}/batches/propose`]: { body: proposal },
      [`PUT ${SEASON_PATH}/batches`]: { body: batches },
    });
    await user.click(await screen.findByRole('button', { name: 'Propose a split' }));
    expect(
      await screen.findByText(/20 Canada violet: The growers who can raise it have no room left/),
    ).toBeInTheDocument();
    const plants = screen.getByRole('textbox', { name: 'Plants of Showy goldenrod for Juniper Okafor' });
    await user.clear(plants);
    await user.type(plants, '45');
    await user.click(screen.getByRole('button', { name: 'Save the batches' }));
    expect(await screen.findByText('Batches saved.')).toBeInTheDocument();
    expect(api.callsTo('PUT', `${SEASON_PATH}/batches`)[0].body).toEqual({
      batches: [
        {
          id: '7b0f5d62-2f7c-4c1e-9a57-6d3f1c2b8e01',
          growerId: '3f6b3a00-0000-4000-8000-00000000a3a1',
          slug: 'monarda-fistulosa',
          method: 'outdoor-pot-winter',
          plants: 50,
        },
        {
          growerId: '3f6b3a00-0000-4000-8000-00000000a3a2',
          slug: 'solidago-speciosa',
          method: 'winter-sowing',
          plants: 45,
        },
      ],
    });
  });

  it('shows a 400 over a grower’s capacity beside that batch and keeps the draft', async () => {
    const { user } = openSeason(maraOrganiser, {
      [`PUT ${SEASON_PATH}/batches`]: apiError(400, 'Please check', {
        error: 'Bad Request',
        fields: [{ field: 'batches.0.plants', message: 'takes Amara Reyes to 500 pots, over the 120 they can tend' }],
      }),
    });
    const plants = await screen.findByRole('textbox', { name: 'Plants of Wild bergamot for Amara Reyes' });
    await user.clear(plants);
    await user.type(plants, '500');
    await user.click(screen.getByRole('button', { name: 'Save the batches' }));
    expect(await screen.findByText('Takes Amara Reyes to 500 pots, over the 120 they can tend')).toBeInTheDocument();
    expect(plants).toHaveValue('500');
    expect(screen.getByText('You have changes that are not saved yet.')).toBeInTheDocument();
    // A batch with a log cannot be removed.
    expect(screen.getByRole('button', { name: 'Wild bergamot has a log and stays' })).toBeDisabled();
  });

  it('shows a grower none of it, and asks the API for none of it', async () => {
    const { api } = openSeason(juniperGrower);
    expect(await screen.findByRole('heading', { level: 1, name: 'Season plan 2027' })).toBeInTheDocument();
    expect(screen.queryByRole('heading', { name: 'Progress and ready forecast' })).not.toBeInTheDocument();
    expect(api.callsTo('GET', `${SEASON_PATH}/progress`)).toHaveLength(0);
    expect(api.callsTo('GET', `${SEASON_PATH}/batches`)).toHaveLength(0);
  });

  it('speaks Spanish when the page is in Spanish: progress, the forecast range and the e-mail card', async () => {
    openSeason(maraOrganiser, {}, 'es');
    const bySpecies = within(await screen.findByRole('region', { name: 'Avance por especie' }));
    const row = within(bySpecies.getByText('Wild bergamot').closest('tr') as HTMLElement);
    expect(row.getByText('unas 36 (29–45)')).toBeInTheDocument();
    expect(row.getByText(/faltan 14 para el objetivo/)).toBeInTheDocument();
    expect(screen.getByRole('form', { name: 'Enviar un aviso de helada' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Enviar ahora el resumen de esta semana' })).toBeInTheDocument();
  });

  it('sends a frost warning for a night with a note, and this week’s summary, saying who got them', async () => {
    const { user, api } = openSeason(maraOrganiser, {
      [`POST ${SEASON_PATH}/frost-warning`]: {
        body: { night: '2027-04-27', growers: [{ userId: 'u-amara', displayName: 'Amara Reyes', batches: 2 }] },
      },
      [`POST ${SEASON_PATH}/weekly-summary`]: { body: { week: '2027-W17', sent: 2, alreadySent: 1 } },
    });
    const form = within(await screen.findByRole('form', { name: 'Send a frost warning' }));
    const night = form.getByLabelText('Night of the frost');
    await user.clear(night);
    await user.type(night, '2027-04-27');
    await user.type(form.getByRole('textbox', { name: /A line from you/ }), 'Low of 28 °F.');
    await user.click(form.getByRole('button', { name: 'Send the frost warning' }));
    expect(await screen.findByText('Sent to Amara Reyes (2 batches).')).toBeInTheDocument();
    expect(api.callsTo('POST', `${SEASON_PATH}/frost-warning`)[0].body).toEqual({
      night: '2027-04-27',
      note: 'Low of 28 °F.',
    });

    await user.click(screen.getByRole('button', { name: 'Send this week’s summary now' }));
    expect(await screen.findByText('Sent to 2 growers. 1 had this week’s already.')).toBeInTheDocument();
  });

  it('shows the API’s 400 beside the night and says nothing was sent', async () => {
    const { user } = openSeason(maraOrganiser, {
      [`POST ${SEASON_PATH}/frost-warning`]: apiError(400, 'Please check: night', {
        error: 'Bad Request',
        fields: [{ field: 'night', message: 'must be from 2027-04-20 to 2027-05-04' }],
      }),
    });
    const form = within(await screen.findByRole('form', { name: 'Send a frost warning' }));
    await user.click(form.getByRole('button', { name: 'Send the frost warning' }));
    expect(await form.findByText('Must be from 2027-04-20 to 2027-05-04')).toBeInTheDocument();
    expect(screen.queryByText(/^Sent to/)).not.toBeInTheDocument();
  });
});
