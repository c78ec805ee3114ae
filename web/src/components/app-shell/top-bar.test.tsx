import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError } from '../../testing/fake-api.js';
import { juniperGrower, maraOrganiser, priyaMember } from '../../testing/fixtures.js';
import { renderApp } from '../../testing/render-app.js';
import type { User } from '@homeground/shared';

// Who sees which entry: the product design guide (shared/DESIGN.md beside the project) "Layout"; the groups come from GET /api/me.
function signedInAs(user: User) {
  return renderApp({ token: 'stored-token', api: { 'GET /api/me': { body: user } } });
}

async function mainNav() {
  return within(await screen.findByRole('navigation', { name: 'Main' }));
}

describe('main navigation', () => {
  it('hides Season for a member without a group', async () => {
    signedInAs(priyaMember);
    expect(await screen.findByText('Priya Vantongeren')).toBeInTheDocument();
    const nav = await mainNav();
    expect(nav.getByRole('link', { name: 'Find plants' })).toBeInTheDocument();
    expect(nav.queryByRole('link', { name: 'Season' })).not.toBeInTheDocument();
    expect(nav.queryByRole('link', { name: 'My batches' })).not.toBeInTheDocument();
  });

  it('shows Season for an organiser', async () => {
    signedInAs(maraOrganiser);
    expect(await screen.findByText('Mara Ellsworth')).toBeInTheDocument();
    const nav = await mainNav();
    expect(nav.getByRole('link', { name: 'Season' })).toHaveAttribute('href', '/season');
  });

  it('shows My batches for a grower', async () => {
    signedInAs(juniperGrower);
    expect(await screen.findByText('Juniper Okafor')).toBeInTheDocument();
    const nav = await mainNav();
    expect(nav.getByRole('link', { name: 'My batches' })).toBeInTheDocument();
  });

  it('forgets a token the API refuses and offers sign-in instead', async () => {
    const { api } = renderApp({ token: 'expired', api: { 'GET /api/me': apiError(401, 'Unauthorized') } });
    const banner = within(screen.getByRole('banner'));
    expect(await banner.findByRole('link', { name: 'Sign in' })).toBeInTheDocument();
    expect(window.localStorage.getItem('homeground.accessToken')).toBeNull();
    expect(api.callsTo('GET', '/api/me')[0].headers.authorization).toBe('Bearer expired');
  });

  it('opens the folded menu on narrow screens with the same entries', async () => {
    const { user } = signedInAs(maraOrganiser);
    await screen.findByText('Mara Ellsworth');
    await user.click(screen.getByRole('button', { name: 'Main menu' }));
    const menu = within(await screen.findByRole('menu', { name: 'Main menu' }));
    expect(menu.getByRole('menuitem', { name: 'Season' })).toBeInTheDocument();
    await user.click(menu.getByRole('menuitem', { name: 'Species' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Species' })).toBeInTheDocument();
  });
});
