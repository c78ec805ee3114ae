import { queryOptions } from '@tanstack/react-query';
import { isApiRequestError } from '../../lib/api-request-error.js';
import { getMe } from './auth.api.js';

export const authKeys = {
  all: ['auth'] as const,
  // The token is in the key because the fetcher sends it: a new session never reads the
  // previous person's cached profile.
  me: (token: string) => [...authKeys.all, 'me', token] as const,
};

export function meQueryOptions(token: string) {
  return queryOptions({
    queryKey: authKeys.me(token),
    queryFn: ({ signal }) => getMe(token, signal),
    staleTime: 5 * 60_000,
    // A 401 means the token is dead; asking again cannot help.
    retry: (failures, error) => !(isApiRequestError(error) && error.statusCode === 401) && failures < 2,
  });
}
