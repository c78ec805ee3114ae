import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { localeFromBrowser, LOCALE_STORAGE_KEY } from '../../lib/i18n/index.js';
import { renderApp } from '../../testing/render-app.js';

// Language tags: BCP 47 (RFC 5646), as navigator.languages gives them; `<html lang>` per WCAG 2.2
// SC 3.1.1 Language of Page.
describe('localeFromBrowser', () => {
  it.each([
    [['es-MX', 'en-US'], 'es'],
    [['fr-CA', 'es'], 'es'],
    [['en-GB'], 'en'],
    [['de-DE'], 'en'],
    [[], 'en'],
  ])('%j → %s', (languages, expected) => {
    expect(localeFromBrowser(languages)).toBe(expected);
  });
});

describe('language switch', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it('speaks the browser language on a first visit and sets <html lang>', async () => {
    vi.stubGlobal('navigator', { ...navigator, language: 'es-MX', languages: ['es-MX', 'en-US'] });
    renderApp({ path: '/species-missing-page' });
    const nav = within(await screen.findByRole('navigation', { name: 'Principal' }));
    expect(nav.getByRole('link', { name: 'Buscar plantas' })).toBeInTheDocument();
    expect(await screen.findByRole('heading', { level: 1, name: 'No encontramos la página' })).toBeInTheDocument();
    expect(document.documentElement.lang).toBe('es-US');
  });

  it('switches to Spanish when asked, remembers it and keeps it on the next visit', async () => {
    const first = renderApp({ path: '/page-that-is-not-here' });
    expect(await screen.findByRole('heading', { level: 1, name: 'Page not found' })).toBeInTheDocument();
    expect(document.documentElement.lang).toBe('en-US');
    const switcher = within(screen.getByRole('group', { name: 'Language' }));
    expect(switcher.getByRole('button', { name: 'English' })).toHaveAttribute('aria-pressed', 'true');

    await first.user.click(switcher.getByRole('button', { name: 'Español' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'No encontramos la página' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Español' })).toHaveAttribute('aria-pressed', 'true');
    expect(window.localStorage.getItem(LOCALE_STORAGE_KEY)).toBe('es');
    expect(document.documentElement.lang).toBe('es-US');
    first.unmount();

    renderApp({ path: '/page-that-is-not-here' });
    expect(await screen.findByRole('heading', { level: 1, name: 'No encontramos la página' })).toBeInTheDocument();
    expect(screen.getByRole('group', { name: 'Idioma' })).toBeInTheDocument();
  });
});
