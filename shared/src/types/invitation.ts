import { z } from 'zod';
import { displayNameSchema, emailSchema, groupRoleSchema, newPasswordSchema, type GroupRole } from './auth.js';

/** Days an invitation link stays valid (common practice for e-mailed sign-up links: one to two weeks). */
export const INVITATION_DAYS = 14;

export const inviteRequestSchema = z
  .object({
    email: emailSchema,
    role: groupRoleSchema,
  })
  .strict();
export type InviteRequest = z.infer<typeof inviteRequestSchema>;

/** The secret part of an invitation link: 43 base64url characters (32 random bytes). */
export const invitationTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'is not an invitation link we sent');

/** Accepting with a new account names the person and sets a password; an account holder sends nothing. */
export const acceptInvitationRequestSchema = z
  .object({
    displayName: displayNameSchema,
    password: newPasswordSchema,
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
