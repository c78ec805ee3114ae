import { FluentProvider } from '@fluentui/react-components';
import { QueryClientProvider, type QueryClient, useQueryClient } from '@tanstack/react-query';
import type { i18n } from 'i18next';
import { type ReactNode, useEffect, useRef } from 'react';
import { SessionProvider } from '../features/auth/components/session-provider.js';
import { I18nProvider, useLocale } from '../lib/i18n/index.js';
import { homegroundTheme, useGlobalStyles } from '../theme/index.js';

function GlobalStyles() {
  useGlobalStyles();
  return null;
}

/** Answers already fetched carry the old language's words (reasons, messages): fetch them again on a switch. */
function RefetchOnLanguageChange() {
  const { locale } = useLocale();
  const queryClient = useQueryClient();
  const first = useRef(locale);
  useEffect(() => {
    if (locale === first.current) return;
    first.current = locale;
    void queryClient.invalidateQueries();
  }, [locale, queryClient]);
  return null;
}

/** Language, theme, server-state cache and session for everything below; tests wrap pages in the same. */
export function AppProviders({
  queryClient,
  i18n,
  children,
}: {
  queryClient: QueryClient;
  /** A language instance of the caller's (tests); by default the remembered or browser language. */
  i18n?: i18n;
  children: ReactNode;
}) {
  return (
    <I18nProvider instance={i18n}>
      <FluentProvider theme={homegroundTheme} applyStylesToPortals>
        <GlobalStyles />
        <QueryClientProvider client={queryClient}>
          <RefetchOnLanguageChange />
          <SessionProvider>{children}</SessionProvider>
        </QueryClientProvider>
      </FluentProvider>
    </I18nProvider>
  );
}
