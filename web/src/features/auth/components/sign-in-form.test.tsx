import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError } from '../../../testing/fake-api.js';
import { authFor, maraOrganiser } from '../../../testing/fixtures.js';
import { renderApp } from '../../../testing/render-app.js';

// Field messages: the shared loginRequestSchema (shared/src/types/auth.ts). Server messages for
// 401 and 429: the API's sign-in answers (api/src/auth). People: the product design guide (shared/DESIGN.md beside the project) demo scenario.
async function openSignIn(api = {}, path = '/sign-in') {
  const view = renderApp({ path, api });
  await screen.findByRole('heading', { level: 1, name: 'Sign in' });
  return view;
}

describe('sign-in form', () => {
  it('shows field messages for a bad e-mail and an empty password without calling the API', async () => {
    const { user, api } = await openSignIn();
    await user.type(screen.getByLabelText(/E-mail/), 'mara.ellsworth-at-example.org');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Must be an e-mail address')).toBeInTheDocument();
    expect(screen.getByText('Must not be empty')).toBeInTheDocument();
    expect(screen.getByLabelText(/E-mail/)).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByLabelText(/E-mail/)).toHaveFocus();
    expect(api.callsTo('POST', '/api/auth/login')).toHaveLength(0);
  });

  it("shows the server's answer to wrong credentials", async () => {
    const { user } = await openSignIn({ 'POST /api/auth/login': apiError(401, 'Unauthorized') });
    await user.type(screen.getByLabelText(/E-mail/), 'mara.ellsworth@example.org');
    await user.type(screen.getByLabelText(/Password/), 'not-her-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(await within(alert).findByText('E-mail or password is wrong')).toBeInTheDocument();
    expect(window.localStorage.getItem('homeground.accessToken')).toBeNull();
  });

  it('asks to wait when sign-in is throttled', async () => {
    const { user } = await openSignIn({ 'POST /api/auth/login': apiError(429, 'Too Many Requests') });
    await user.type(screen.getByLabelText(/E-mail/), 'mara.ellsworth@example.org');
    await user.type(screen.getByLabelText(/Password/), 'larkfield-mara');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Too many attempts: wait a minute and try again')).toBeInTheDocument();
  });

  it('on success stores the token, shows the name in the header and returns to where the user came from', async () => {
    const auth = authFor(maraOrganiser, 'mara-token');
    const { user, api, router } = await openSignIn(
      { 'POST /api/auth/login': { body: auth }, 'GET /api/me': { body: maraOrganiser } },
      '/sign-in?next=%2Faccount',
    );
    await user.type(screen.getByLabelText(/E-mail/), '  Mara.Ellsworth@example.org ');
    await user.type(screen.getByLabelText(/Password/), 'larkfield-mara');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const banner = within(screen.getByRole('banner'));
    expect(await banner.findByText('Mara Ellsworth')).toBeInTheDocument();
    expect(window.localStorage.getItem('homeground.accessToken')).toBe('mara-token');
    // The shared schema trims and lower-cases the address before it is sent.
    expect(api.callsTo('POST', '/api/auth/login')[0].body).toEqual({
      email: 'mara.ellsworth@example.org',
      password: 'larkfield-mara',
    });
    expect(await screen.findByRole('heading', { level: 1, name: 'Your account' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/account');
  });

  it('goes home after signing in when there is nowhere to return to', async () => {
    const { user, router } = await openSignIn({ 'POST /api/auth/login': { body: authFor(maraOrganiser) } });
    await user.type(screen.getByLabelText(/E-mail/), 'mara.ellsworth@example.org');
    await user.type(screen.getByLabelText(/Password/), 'larkfield-mara');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('heading', { level: 1, name: /Grow the native plants/ })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/');
  });

  it('ignores a next address on another site', async () => {
    const { user, router } = await openSignIn(
      { 'POST /api/auth/login': { body: authFor(maraOrganiser) } },
      '/sign-in?next=%2F%2Fevil.example.com',
    );
    await user.type(screen.getByLabelText(/E-mail/), 'mara.ellsworth@example.org');
    await user.type(screen.getByLabelText(/Password/), 'larkfield-mara');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    await screen.findByRole('heading', { level: 1, name: /Grow the native plants/ });
    expect(router.state.location.pathname).toBe('/');
  });
});

// Spanish words for the same checks: this project's forms catalogue (locales/es/forms.ts), from-memory.
describe('sign-in form in Spanish', () => {
  it('says the schema checks and the server answers in Spanish', async () => {
    const { user } = renderApp({
      path: '/sign-in',
      locale: 'es',
      api: { 'POST /api/auth/login': apiError(401, 'Unauthorized') },
    });
    await screen.findByRole('heading', { level: 1, name: 'Entrar' });
    await user.type(screen.getByLabelText(/Correo electrónico/), 'mara.ellsworth-at-example.org');
    await user.click(screen.getByRole('button', { name: 'Entrar' }));
    expect(await screen.findByText('Debe ser una dirección de correo electrónico')).toBeInTheDocument();
    expect(screen.getByText('No puede quedar vacío')).toBeInTheDocument();

    await user.clear(screen.getByLabelText(/Correo electrónico/));
    await user.type(screen.getByLabelText(/Correo electrónico/), 'mara.ellsworth@example.org');
    await user.type(screen.getByLabelText(/Contraseña/), 'not-her-password');
    await user.click(screen.getByRole('button', { name: 'Entrar' }));
    const alert = await screen.findByRole('alert');
    expect(await within(alert).findByText('El correo o la contraseña no son correctos')).toBeInTheDocument();
  });
});
