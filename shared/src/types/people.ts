import { z } from 'zod';
import type { User } from './auth.js';

/**
 * One account as the admin's people page shows it: the person, their groups, and how they sign in.
 * Never a password hash or a token.
 */
export interface PersonAccount extends User {
  /** When an admin switched the account off; null while it works. Its tokens stop working at once. */
  disabledAt: string | null;
  /** The last successful sign-in; null when never (or only through an invitation link). */
  lastSignInAt: string | null;
  /** True while sign-in for this address is held back after too many wrong passwords. */
  signInHeld: boolean;
}

/** `PATCH /api/users/:id/access`: an admin switches an account off or on again. */
export const setAccessRequestSchema = z.object({ disabled: z.boolean({ message: 'must be true or false' }) }).strict();
export type SetAccessRequest = z.infer<typeof setAccessRequestSchema>;
