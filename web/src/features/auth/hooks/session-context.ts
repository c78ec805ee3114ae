import type { AuthResponse, User } from '@homeground/shared';
import { createContext } from 'react';
import type { ApiRequestError } from '../../../lib/api-request-error.js';

/**
 * - `signed-out`: no token.
 * - `loading`: a token, profile on its way.
 * - `signed-in`: token and profile.
 * - `unavailable`: a token, but the profile could not be loaded (offline, server error).
 */
export type SessionStatus = 'signed-out' | 'loading' | 'signed-in' | 'unavailable';

export interface Session {
  status: SessionStatus;
  user: User | null;
  profileError: ApiRequestError | null;
  /** Keeps the token and the user from a login or register answer. */
  signIn: (auth: AuthResponse) => void;
  /** Forgets the token and every cached answer, so nothing of this person stays in the tab. */
  signOut: () => void;
  retryProfile: () => void;
}

export const SessionContext = createContext<Session | null>(null);
