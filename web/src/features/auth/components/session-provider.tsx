import type { AuthResponse } from '@homeground/shared';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useMemo, useState, type ReactNode } from 'react';
import { authKeys, meQueryOptions } from '../../../api/auth/auth.queries.js';
import {
  ACCESS_TOKEN_STORAGE_KEY,
  clearAccessToken,
  readAccessToken,
  writeAccessToken,
} from '../../../lib/access-token.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { forgetSavedAnswers } from '../../../lib/offline/saved-answers.js';
import { SessionContext, type Session, type SessionStatus } from '../hooks/session-context.js';

/** Holds the signed-in person: token in localStorage, profile from GET /api/me. */
export function SessionProvider({ children }: { children: ReactNode }) {
  const queryClient = useQueryClient();
  const [token, setToken] = useState<string | null>(readAccessToken);

  const me = useQuery({ ...meQueryOptions(token ?? ''), enabled: token !== null });

  const signOut = useCallback(() => {
    clearAccessToken();
    setToken(null);
    queryClient.clear();
    // Answers kept for reading with no signal belong to this person: the next one on the device sees none.
    void forgetSavedAnswers();
  }, [queryClient]);

  const signIn = useCallback(
    (auth: AuthResponse) => {
      writeAccessToken(auth.accessToken);
      queryClient.setQueryData(authKeys.me(auth.accessToken), auth.user);
      setToken(auth.accessToken);
    },
    [queryClient],
  );

  // A token the API refuses (expired, signed with an old key) is as good as none.
  const isTokenRejected = isApiRequestError(me.error) && me.error.statusCode === 401;
  useEffect(() => {
    if (isTokenRejected) signOut();
  }, [isTokenRejected, signOut]);

  // Signing in or out in another tab changes this one too.
  useEffect(() => {
    const onStorage = (event: StorageEvent) => {
      if (event.key === ACCESS_TOKEN_STORAGE_KEY || event.key === null) setToken(readAccessToken());
    };
    window.addEventListener('storage', onStorage);
    return () => window.removeEventListener('storage', onStorage);
  }, []);

  const { refetch } = me;
  const retryProfile = useCallback(() => void refetch(), [refetch]);

  const user = token ? (me.data ?? null) : null;
  let status: SessionStatus = 'signed-out';
  if (token && user) status = 'signed-in';
  else if (token && me.isError && !isTokenRejected) status = 'unavailable';
  else if (token) status = 'loading';

  const profileError = status === 'unavailable' && isApiRequestError(me.error) ? me.error : null;
  const value = useMemo<Session>(
    () => ({ status, user, profileError, signIn, signOut, retryProfile }),
    [status, user, profileError, signIn, signOut, retryProfile],
  );
  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}
