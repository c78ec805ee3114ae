import { z } from 'zod';
import { groupRoleSchema, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, type GroupRole } from './auth.js';

/** Days an invitation link stays valid (common practice for e-mailed sign-up links: one to two weeks). */
export const INVITATION_DAYS = 14;

export const inviteRequestSchema = z
  .object({
    email: z.string().trim().toLowerCase().email('must be an e-mail address').max(254),
    role: groupRoleSchema,
  })
  .strict();
export type InviteRequest = z.infer<typeof inviteRequestSchema>;

/** The secret part of an invitation link: 43 base64url characters (32 random bytes). */
export const invitationTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'is not an invitation link we sent');

/** Accepting with a new account names the person and sets a password; an account holder sends nothing. */
export const acceptInvitationRequestSchema = z
  .object({
    displayName: z.string().trim().min(1, 'must not be empty').max(80, 'must be at most 80 characters'),
    password: z
      .string()
      .min(PASSWORD_MIN_LENGTH, `must be at least ${PASSWORD_MIN_LENGTH} characters`)
      .max(PASSWORD_MAX_LENGTH, `must be at most ${PASSWORD_MAX_LENGTH} characters`),
  })
  .strict()
  .partial();
export type AcceptInvitationRequest = z.infer<typeof acceptInvitationRequestSchema>;

/** What an organiser sees of an invitation they sent (never the link's secret). */
export interface Invitation {
  id: string;
  email: string;
  role: GroupRole;
  expiresAt: string;
  acceptedAt: string | null;
}

/** What the invited person sees when they open the link. */
export interface InvitationPreview {
  groupSlug: string;
  groupName: string;
  town: string;
  state: string;
  role: GroupRole;
  email: string;
  /** True when an account already uses the address: the person signs in, then accepts. */
  accountExists: boolean;
  expiresAt: string;
}
