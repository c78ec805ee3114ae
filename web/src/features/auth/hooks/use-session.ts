import { useContext } from 'react';
import { SessionContext, type Session } from './session-context.js';

export function useSession(): Session {
  const session = useContext(SessionContext);
  if (!session) throw new Error('useSession needs a <SessionProvider> above it (src/app/providers.tsx).');
  return session;
}
