import { QueryClient } from '@tanstack/react-query';
import { isApiRequestError } from '../lib/api-request-error.js';

/**
 * One client per app (and a fresh one per test). Client errors (4xx) are answers, not hiccups,
 * so they are never retried; network and server errors get two more tries.
 */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry: (failures, error) => {
          if (isApiRequestError(error) && error.statusCode >= 400 && error.statusCode < 500) return false;
          return failures < 2;
        },
      },
      mutations: { retry: false },
    },
  });
}
