import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError } from '../../../testing/fake-api.js';
import { authFor, priyaMember } from '../../../testing/fixtures.js';
import { renderApp } from '../../../testing/render-app.js';

// Field rules: the shared registerRequestSchema (shared/src/types/auth.ts: password at least 10
// characters). Register answers 202 "check your e-mail" for every address (OWASP account enumeration).
async function openRegister(api = {}) {
  const view = renderApp({ path: '/register', api });
  await screen.findByRole('heading', { level: 1, name: 'Create an account' });
  return view;
}

describe('register form', () => {
  it('checks every field before sending anything', async () => {
    const { user, api } = await openRegister();
    await user.type(screen.getByLabelText(/E-mail/), 'priya@');
    await user.type(screen.getByLabelText(/^Password/), 'short');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByText('Must not be empty')).toBeInTheDocument();
    expect(screen.getByText('Must be an e-mail address')).toBeInTheDocument();
    expect(screen.getByText('Must be at least 10 characters')).toBeInTheDocument();
    expect(api.callsTo('POST', '/api/auth/register')).toHaveLength(0);
  });

  it('sends the form with where the person was going and says to check their e-mail', async () => {
    const view = renderApp({
      path: '/register?next=%2Ffind-plants',
      api: {
        'POST /api/auth/register': {
          status: 202,
          body: { status: 'check-your-email', email: 'priya.vantongeren@example.org', expiresInHours: 48 },
        },
      },
    });
    await screen.findByRole('heading', { level: 1, name: 'Create an account' });
    const { user, api } = view;
    await user.type(screen.getByLabelText(/Your name/), 'Priya Vantongeren');
    await user.type(screen.getByLabelText(/E-mail/), 'priya.vantongeren@example.org');
    await user.type(screen.getByLabelText(/^Password/), 'plant-share-2026');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    const heading = await screen.findByRole('heading', { name: 'Check your e-mail' });
    expect(heading).toHaveFocus();
    expect(screen.getByText(/We sent a message to priya.vantongeren@example.org/)).toHaveTextContent('48 hours');
    // Not signed in yet: the account is made by the e-mailed link.
    expect(window.localStorage.getItem('homeground.accessToken')).toBeNull();
    expect(api.callsTo('POST', '/api/auth/register')[0].body).toEqual({
      displayName: 'Priya Vantongeren',
      email: 'priya.vantongeren@example.org',
      password: 'plant-share-2026',
      next: '/find-plants',
    });
  });
});

describe('sign-up confirmation link', () => {
  it('makes the account, signs the person in and takes them where they were going', async () => {
    const { api, router } = renderApp({
      path: `/register/confirm/${'t'.repeat(43)}`,
      api: {
        'POST /api/auth/register/confirm': {
          status: 201,
          body: { ...authFor(priyaMember, 'priya-token'), next: '/find-plants' },
        },
      },
    });
    expect(await screen.findByText('Priya Vantongeren', { selector: 'header *' })).toBeInTheDocument();
    expect(window.localStorage.getItem('homeground.accessToken')).toBe('priya-token');
    expect(api.callsTo('POST', '/api/auth/register/confirm')).toEqual([
      expect.objectContaining({ body: { token: 't'.repeat(43) } }),
    ]);
    await waitFor(() => expect(router.state.location.pathname).toBe('/find-plants'));
  });

  it('says when a link was already used, with a way to sign up again', async () => {
    renderApp({
      path: `/register/confirm/${'u'.repeat(43)}`,
      api: {
        'POST /api/auth/register/confirm': apiError(
          404,
          'This confirmation link was already used or is not one we sent: sign in, or sign up again.',
        ),
      },
    });
    expect(await screen.findByText('This link did not work')).toBeInTheDocument();
    expect(screen.getByText(/already used/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Sign up again' })).toHaveAttribute('href', '/register');
  });
});
