import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '../testing/render-app.js';

// Section names: the product design guide (shared/DESIGN.md beside the project) "Layout"; the sections are not built yet, so each page
// must say so instead of showing made-up data.
describe('sections not built yet', () => {
  it.each([['/my-batches', 'My batches']])(
    '%s says what it will do and that it is not available yet',
    async (path, title) => {
      renderApp({ path });
      expect(await screen.findByRole('heading', { level: 1, name: title })).toBeInTheDocument();
      expect(screen.getByText('It is not available yet.')).toBeInTheDocument();
      expect(screen.getByText(/^Here /)).toBeInTheDocument();
    },
  );

  it('answers an unknown address with a page-not-found page inside the shell', async () => {
    renderApp({ path: '/no-such-page' });
    expect(await screen.findByRole('heading', { level: 1, name: 'Page not found' })).toBeInTheDocument();
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeInTheDocument();
  });

  it('offers a skip link to the main content first', async () => {
    const { user } = renderApp({ path: '/species' });
    await screen.findByRole('heading', { level: 1, name: 'Species' });
    await user.tab();
    expect(screen.getByRole('link', { name: 'Skip to content' })).toHaveFocus();
    expect(screen.getByRole('link', { name: 'Skip to content' })).toHaveAttribute('href', '#main-content');
  });
});
