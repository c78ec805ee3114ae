import { QueryClient } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProviders } from '../app/providers.js';
import { createRoutes } from '../app/router.js';
import { writeAccessToken } from '../lib/access-token.js';
import { createI18n, type Locale } from '../lib/i18n/index.js';
import { installFakeApi, type FakeRoutes } from './fake-api.js';

export interface RenderAppOptions {
  /** The URL to open, e.g. "/sign-in?next=/account". */
  path?: string;
  /** A token already stored, as if the person signed in on an earlier visit. */
  token?: string;
  api?: FakeRoutes;
  /** Start in this language; by default the browser's (jsdom says en-US), as a first visit would. */
  locale?: Locale;
}

/** The whole app (real routes, providers and shell) over the fake API, as a person would meet it. */
export function renderApp({ path = '/', token, api, locale }: RenderAppOptions = {}) {
  const fakeApi = installFakeApi(api);
  if (token) writeAccessToken(token);
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [path] });
  const user = userEvent.setup();
  const view = render(
    <AppProviders queryClient={queryClient} i18n={locale ? createI18n(locale) : undefined}>
      <RouterProvider router={router} />
    </AppProviders>,
  );
  return { ...view, user, router, queryClient, api: fakeApi };
}
