import { screen, within } from '@testing-library/react';
import type { PersonAccount, User } from '@homeground/shared';
import { describe, expect, it } from 'vitest';
import { apiError } from '../testing/fake-api.js';
import { juniperGrower, maraOrganiser } from '../testing/fixtures.js';
import { renderApp } from '../testing/render-app.js';

// People from the invented demo scenario (shared/DESIGN.md beside the project): Wes Hollenbeck is the admin.
const wes: User = {
  id: 'u-wes',
  email: 'wes.hollenbeck@example.org',
  displayName: 'Wes Hollenbeck',
  role: 'admin',
  groups: [],
  createdAt: '2025-09-01T15:00:00.000Z',
};
const account = (u: User, extra: Partial<PersonAccount> = {}): PersonAccount => ({
  ...u,
  disabledAt: null,
  lastSignInAt: '2026-11-30T14:05:00.000Z',
  signInHeld: false,
  ...extra,
});
const people = [
  account(wes),
  account(maraOrganiser, { signInHeld: true }),
  account(juniperGrower, { lastSignInAt: null, disabledAt: '2026-12-01T10:00:00.000Z' }),
];

describe('people page (admins)', () => {
  it('lists accounts with role, groups and sign-in activity, and offers no change to your own row', async () => {
    renderApp({
      path: '/people',
      token: 'wes-token',
      api: { 'GET /api/me': { body: wes }, 'GET /api/users': { body: people } },
    });
    const table = within(await screen.findByRole('table', { name: 'Everyone with an account' }));
    const rows = table.getAllByRole('row');
    expect(rows).toHaveLength(4);
    expect(within(rows[1]).getByText('Wes Hollenbeck (you)')).toBeInTheDocument();
    expect(within(rows[1]).getByRole('combobox', { name: 'Role of Wes Hollenbeck' })).toBeDisabled();
    expect(within(rows[1]).queryByRole('button', { name: /Switch/ })).toBeNull();
    expect(within(rows[2]).getByText('Larkfield Commons Growers (Organiser)')).toBeInTheDocument();
    expect(within(rows[2]).getByText(/held back after too many wrong passwords/)).toBeInTheDocument();
    expect(within(rows[3]).getByText('Never')).toBeInTheDocument();
    expect(within(rows[3]).getByText(/Switched off/)).toBeInTheDocument();
  });

  it('switches an account off and shows a refusal from the API in words', async () => {
    const { user, api } = renderApp({
      path: '/people',
      token: 'wes-token',
      api: {
        'GET /api/me': { body: wes },
        'GET /api/users': { body: people },
        'PATCH /api/users/u-mara/access': apiError(409, 'You cannot switch off this account right now.'),
      },
    });
    await user.click(await screen.findByRole('button', { name: 'Switch off the account of Mara Ellsworth' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('You cannot switch off this account right now.');
    expect(api.calls.find((c) => c.method === 'PATCH')).toMatchObject({
      path: '/api/users/u-mara/access',
      body: { disabled: true },
    });
  });

  it('tells a signed-in non-admin whose page this is, without asking the API for the list', async () => {
    const { api } = renderApp({
      path: '/people',
      token: 'mara-token',
      api: { 'GET /api/me': { body: maraOrganiser } },
    });
    expect(await screen.findByText('This page is for Homeground admins.')).toBeInTheDocument();
    expect(api.calls.some((c) => c.path === '/api/users')).toBe(false);
  });
});
