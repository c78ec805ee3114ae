import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '../testing/render-app.js';

// Every section of the product design guide (shared/DESIGN.md beside the project) "Layout" is built now; what stays
// here is how the shell answers an unknown address and its skip link.
describe('the shell around every page', () => {
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
