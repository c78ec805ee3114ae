import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { maraOrganiser } from '../testing/fixtures.js';
import { renderApp } from '../testing/render-app.js';

// Account facts: the GET /api/me answer in src/testing/fixtures.ts (Mara Ellsworth, organiser
// of the Larkfield Commons Growers, from the product design guide (shared/DESIGN.md beside the project)'s demo scenario).
describe('account page', () => {
  it('sends a signed-out visitor to sign in, and remembers where they were going', async () => {
    const { router } = renderApp({ path: '/account' });
    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('?next=%2Faccount');
  });

  it("shows the person's name, e-mail, role and groups with their group role", async () => {
    renderApp({ path: '/account', token: 'mara-token', api: { 'GET /api/me': { body: maraOrganiser } } });
    const main = within(screen.getByRole('main'));
    expect(await main.findByRole('heading', { level: 1, name: 'Your account' })).toBeInTheDocument();
    expect(main.getByText('Mara Ellsworth')).toBeInTheDocument();
    expect(main.getByText('mara.ellsworth@example.org')).toBeInTheDocument();
    expect(main.getByText(/^Member: finds plants/)).toBeInTheDocument();
    const group = main.getByRole('link', { name: 'Larkfield Commons Growers' });
    expect(group).toHaveAttribute('href', '/groups/larkfield-commons-growers');
    expect(group.parentElement).toHaveTextContent('Organiser');
  });

  it('signs out from the account menu: token and cached profile gone', async () => {
    const { user, queryClient } = renderApp({ token: 'mara-token', api: { 'GET /api/me': { body: maraOrganiser } } });
    await user.click(await screen.findByRole('button', { name: 'Your account: Mara Ellsworth' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Sign out' }));

    expect(await within(screen.getByRole('banner')).findByRole('link', { name: 'Sign in' })).toBeInTheDocument();
    expect(window.localStorage.getItem('homeground.accessToken')).toBeNull();
    expect(
      queryClient
        .getQueryCache()
        .findAll({ queryKey: ['auth'] })
        .filter((q) => q.state.data),
    ).toHaveLength(0);
    expect(screen.queryByText('Mara Ellsworth')).not.toBeInTheDocument();
  });
});
