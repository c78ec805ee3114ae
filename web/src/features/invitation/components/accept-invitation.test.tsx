import type { InvitationPreview } from '@homeground/shared';
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError } from '../../../testing/fake-api.js';
import { authFor, juniperGrower, priyaMember } from '../../../testing/fixtures.js';
import { renderApp } from '../../../testing/render-app.js';

// The invented demo group (shared/DESIGN.md beside the project, "Demo scenario"); the rules under test are the
// invitation API's: a new address makes an account with a name and password, an existing one signs in first.
const TOKEN = 'a'.repeat(43);
const PREVIEW_PATH = `/api/invitations/${TOKEN}`;
const preview = (over: Partial<InvitationPreview> = {}): InvitationPreview => ({
  groupSlug: 'larkfield-commons-growers',
  groupName: 'Larkfield Commons Growers',
  town: 'Larkfield',
  state: 'WI',
  role: 'grower',
  email: 'juniper.okafor@example.org',
  accountExists: false,
  expiresAt: '2027-01-15T00:00:00.000Z',
  ...over,
});

describe('accepting an invitation', () => {
  it('makes a new account from the invited address, checking name and password first', async () => {
    const { user, api } = renderApp({
      path: `/invitations/${TOKEN}`,
      api: {
        [`GET ${PREVIEW_PATH}`]: { body: preview() },
        [`POST ${PREVIEW_PATH}/accept`]: { body: authFor(juniperGrower, 'juniper-token') },
        'GET /api/groups/larkfield-commons-growers': {
          body: {
            id: 'g',
            slug: 'larkfield-commons-growers',
            name: 'Larkfield Commons Growers',
            town: 'Larkfield',
            state: 'WI',
            ecoregionCode: '52',
            members: 9,
          },
        },
        'GET /api/groups/larkfield-commons-growers/members': { body: [] },
      },
    });
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Join Larkfield Commons Growers' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/raises a batch of plants over winter/)).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Make my account and join' }));
    expect(await screen.findByText('Must not be empty')).toBeInTheDocument();
    expect(api.callsTo('POST', `${PREVIEW_PATH}/accept`)).toHaveLength(0);

    await user.type(screen.getByLabelText(/Your name/), 'Juniper Okafor');
    await user.type(screen.getByLabelText(/^Password/), 'winter-sowing-jugs');
    await user.click(screen.getByRole('button', { name: 'Make my account and join' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Larkfield Commons Growers' })).toBeInTheDocument();
    expect(window.localStorage.getItem('homeground.accessToken')).toBe('juniper-token');
    expect(api.callsTo('POST', `${PREVIEW_PATH}/accept`)[0].body).toEqual({
      displayName: 'Juniper Okafor',
      password: 'winter-sowing-jugs',
    });
  });

  it('asks an existing account holder to sign in and come back', async () => {
    renderApp({
      path: `/invitations/${TOKEN}`,
      api: { [`GET ${PREVIEW_PATH}`]: { body: preview({ accountExists: true }) } },
    });
    const link = await screen.findByRole('link', { name: 'Sign in to join' });
    expect(link).toHaveAttribute('href', `/sign-in?next=${encodeURIComponent(`/invitations/${TOKEN}`)}`);
  });

  it('tells someone signed in with another address what to do', async () => {
    renderApp({
      path: `/invitations/${TOKEN}`,
      token: 'priya-token',
      api: { 'GET /api/me': { body: priyaMember }, [`GET ${PREVIEW_PATH}`]: { body: preview() } },
    });
    expect(
      await screen.findByText(/was sent to juniper\.okafor@example\.org, but you are signed in as/),
    ).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Join/ })).not.toBeInTheDocument();
  });

  it('says plainly when a link has been used', async () => {
    renderApp({
      path: `/invitations/${TOKEN}`,
      api: { [`GET ${PREVIEW_PATH}`]: apiError(410, 'This invitation has already been used.') },
    });
    expect(await screen.findByText('This invitation cannot be used.')).toBeInTheDocument();
    expect(screen.getByText('This invitation has already been used.')).toBeInTheDocument();
  });

  // The invited person may read the page in Spanish: the page's own words come from the groups catalogue,
  // the name and password checks from the shared schema said in the page's language, and the API's
  // refusals as the API words them for Accept-Language es.
  it('checks the name and password in Spanish and shows the API refusal beside the field', async () => {
    const weak =
      'es demasiado fácil de adivinar (una contraseña común o un patrón sencillo): prueba con tres o cuatro palabras sin relación entre sí';
    const { user, api } = renderApp({
      path: `/invitations/${TOKEN}`,
      locale: 'es',
      api: {
        [`GET ${PREVIEW_PATH}`]: { body: preview() },
        [`POST ${PREVIEW_PATH}/accept`]: apiError(400, `Revisa esto: password ${weak}`, {
          fields: [{ field: 'password', message: weak }],
        }),
      },
    });
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Únete a Larkfield Commons Growers' }),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Crear mi cuenta y unirme' }));
    expect(await screen.findByText('No puede quedar vacío')).toBeInTheDocument();

    await user.type(screen.getByLabelText(/Tu nombre/), 'Juniper Okafor');
    await user.type(screen.getByLabelText(/^Contraseña/), 'corta');
    await user.click(screen.getByRole('button', { name: 'Crear mi cuenta y unirme' }));
    expect(await screen.findByText('Debe tener al menos 10 caracteres')).toBeInTheDocument();
    expect(api.callsTo('POST', `${PREVIEW_PATH}/accept`)).toHaveLength(0);

    await user.clear(screen.getByLabelText(/^Contraseña/));
    await user.type(screen.getByLabelText(/^Contraseña/), 'password123');
    await user.click(screen.getByRole('button', { name: 'Crear mi cuenta y unirme' }));
    expect(await screen.findByText(/^Es demasiado fácil de adivinar/)).toBeInTheDocument();
    expect(api.callsTo('POST', `${PREVIEW_PATH}/accept`)[0].headers['accept-language']).toBe('es');
  });

  it('says in Spanish when a link cannot be used', async () => {
    renderApp({
      path: `/invitations/${TOKEN}`,
      locale: 'es',
      api: { [`GET ${PREVIEW_PATH}`]: apiError(410, 'Esta invitación ya se usó.') },
    });
    expect(await screen.findByText('Esta invitación no se puede usar.')).toBeInTheDocument();
    expect(screen.getByText('Esta invitación ya se usó.')).toBeInTheDocument();
  });
});
