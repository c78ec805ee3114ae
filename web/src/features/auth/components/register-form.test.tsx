import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError } from '../../../testing/fake-api.js';
import { authFor, priyaMember } from '../../../testing/fixtures.js';
import { renderApp } from '../../../testing/render-app.js';

// Field rules: the shared registerRequestSchema (shared/src/types/auth.ts: password at least 10
// characters). 409 for a taken e-mail: the web task's API contract.
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

  it('shows a taken e-mail beside the e-mail field', async () => {
    const { user } = await openRegister({ 'POST /api/auth/register': apiError(409, 'Conflict') });
    await user.type(screen.getByLabelText(/Your name/), 'Priya Vantongeren');
    await user.type(screen.getByLabelText(/E-mail/), 'priya.vantongeren@example.org');
    await user.type(screen.getByLabelText(/^Password/), 'plant-share-2026');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByText(/An account with this e-mail already exists/)).toBeInTheDocument();
    expect(screen.getByLabelText(/E-mail/)).toHaveAttribute('aria-invalid', 'true');
  });

  it('signs the new person in', async () => {
    const { user, api } = await openRegister({
      'POST /api/auth/register': { status: 201, body: authFor(priyaMember, 'priya-token') },
    });
    await user.type(screen.getByLabelText(/Your name/), 'Priya Vantongeren');
    await user.type(screen.getByLabelText(/E-mail/), 'priya.vantongeren@example.org');
    await user.type(screen.getByLabelText(/^Password/), 'plant-share-2026');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByText('Priya Vantongeren', { selector: 'header *' })).toBeInTheDocument();
    expect(window.localStorage.getItem('homeground.accessToken')).toBe('priya-token');
    expect(api.callsTo('POST', '/api/auth/register')[0].body).toEqual({
      displayName: 'Priya Vantongeren',
      email: 'priya.vantongeren@example.org',
      password: 'plant-share-2026',
    });
  });
});
