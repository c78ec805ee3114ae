import { queryOptions } from '@tanstack/react-query';
import { isApiRequestError } from '../../lib/api-request-error.js';
import { tokenOwner, withSavedCopy } from '../../lib/offline/saved-answers.js';
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
    // The profile is kept on the device, so a signed-in page opens with no signal (My batches in the garden).
    queryFn: async ({ signal }) => {
      const owner = await tokenOwner(token);
      if (!owner) return getMe(token, signal);
      return (await withSavedCopy(owner, 'me', () => getMe(token, signal))).data;
    },
    // Ask even when the browser says it is offline, so the kept copy answers instead of waiting.
    networkMode: 'offlineFirst',
    staleTime: 5 * 60_000,
    // A 401 means the token is dead; asking again cannot help.
    retry: (failures, error) => !(isApiRequestError(error) && error.statusCode === 401) && failures < 2,
  });
}
