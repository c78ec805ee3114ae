import { FluentProvider } from '@fluentui/react-components';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { SessionProvider } from '../features/auth/components/session-provider.js';
import { homegroundTheme, useGlobalStyles } from '../theme/index.js';

function GlobalStyles() {
  useGlobalStyles();
  return null;
}

/** Theme, server-state cache and session for everything below; tests wrap pages in the same. */
export function AppProviders({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <FluentProvider theme={homegroundTheme} applyStylesToPortals>
      <GlobalStyles />
      <QueryClientProvider client={queryClient}>
        <SessionProvider>{children}</SessionProvider>
      </QueryClientProvider>
    </FluentProvider>
  );
}
