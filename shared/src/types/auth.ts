import { z } from 'zod';

export const GLOBAL_ROLES = ['member', 'curator', 'admin'] as const;
export const globalRoleSchema = z.enum(GLOBAL_ROLES, { message: `must be one of ${GLOBAL_ROLES.join(', ')}` });
export type GlobalRole = z.infer<typeof globalRoleSchema>;

/** A group's people: members reserve plants, growers raise batches, organisers run the season. */
export const GROUP_ROLES = ['member', 'grower', 'organiser'] as const;
export const groupRoleSchema = z.enum(GROUP_ROLES, { message: `must be one of ${GROUP_ROLES.join(', ')}` });
export type GroupRole = z.infer<typeof groupRoleSchema>;

/** Passwords: at least 10 characters (NIST SP 800-63B asks for 8 or more; we ask a little more). */
export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 200;

/** An e-mail address as every form takes it: trimmed, lower-cased, at most 254 characters (RFC 5321). */
export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'must be at most 254 characters')
  .email('must be an e-mail address');

/** A new password: the length rules above. */
export const newPasswordSchema = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `must be at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(PASSWORD_MAX_LENGTH, `must be at most ${PASSWORD_MAX_LENGTH} characters`);

/** The name a person's group sees. */
export const displayNameSchema = z.string().trim().min(1, 'must not be empty').max(80, 'must be at most 80 characters');

/** A path on this site to return to after a link in an e-mail (never another site: no `//host`). */
export const returnPathSchema = z
  .string()
  .max(300, 'must be at most 300 characters')
  .regex(/^\/(?![/\\])[^\s]*$/, 'must be a path on this site, starting with /');

export const registerRequestSchema = z
  .object({
    email: emailSchema,
    password: newPasswordSchema,
    displayName: displayNameSchema,
    /** Where the confirmation link brings the person back to (e.g. the page that sent them to register). */
    next: returnPathSchema.optional(),
  })
  .strict();
export type RegisterRequest = z.infer<typeof registerRequestSchema>;

/** Hours a sign-up confirmation link stays valid (common practice: one to two days). */
export const REGISTRATION_HOURS = 48;

/**
 * What `POST /api/auth/register` answers, the same whether or not the address already has an account,
 * so the form tells a stranger nothing about who uses Homeground. The e-mail says the rest.
 */
export interface RegisterAccepted {
  status: 'check-your-email';
  email: string;
  expiresInHours: number;
}

/** The secret part of a sign-up confirmation link: 43 base64url characters (32 random bytes). */
export const registrationTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'is not a confirmation link we sent');

/** `POST /api/auth/register/confirm`: the secret from the e-mailed link. */
export const confirmRegistrationRequestSchema = z.object({ token: registrationTokenSchema }).strict();
export type ConfirmRegistrationRequest = z.infer<typeof confirmRegistrationRequestSchema>;

export const loginRequestSchema = z
  .object({
    email: emailSchema,
    password: z
      .string()
      .min(1, 'must not be empty')
      .max(PASSWORD_MAX_LENGTH, `must be at most ${PASSWORD_MAX_LENGTH} characters`),
  })
  .strict();
export type LoginRequest = z.infer<typeof loginRequestSchema>;

/** `PATCH /api/users/:id/role`: an admin sets a person's global role. */
export const setRoleRequestSchema = z.object({ role: globalRoleSchema }).strict();
export type SetRoleRequest = z.infer<typeof setRoleRequestSchema>;

/** `PUT /api/groups/:slug/members`: an organiser adds a person (by e-mail) or changes their role. */
export const setMemberRequestSchema = z
  .object({
    email: emailSchema,
    role: groupRoleSchema,
  })
  .strict();
export type SetMemberRequest = z.infer<typeof setMemberRequestSchema>;

export interface GroupMembership {
  groupId: string;
  groupSlug: string;
  groupName: string;
  role: GroupRole;
}

export interface User {
  id: string;
  email: string;
  displayName: string;
  role: GlobalRole;
  groups: GroupMembership[];
  createdAt: string;
}

export interface AuthResponse {
  /** A JWT to send as `Authorization: Bearer <token>`. */
  accessToken: string;
  /** Seconds until the token expires. */
  expiresIn: number;
  user: User;
}

/** The one error shape every API error uses. */
export interface ApiError {
  statusCode: number;
  error: string;
  message: string;
  /** For 400s: each bad field with the reason. */
  fields?: { field: string; message: string }[];
  /** For CSV imports: each bad row with its line number (header = line 1), field and reason. */
  rows?: { row: number; field: string; message: string }[];
  /** For a plant share's 409 "all taken": the species that ran out and where to join their waitlist. */
  waitlist?: { speciesSlugs: string[]; path: string };
}

export interface HealthResponse {
  status: 'ok' | 'degraded';
  version: string;
  database: { status: 'up' | 'down'; migrations: number };
  uptimeSeconds: number;
}

/** Public facts about this site that the web needs, e.g. the address printed on paper. */
export interface SiteInfoResponse {
  /** The public address of the site (no trailing slash); QR codes and printed links point here. */
  publicUrl: string;
}

/** Live counts for the home page. */
export interface StatsResponse {
  species: number;
  groups: number;
  ecoregions: number;
  users: number;
}

export interface Group {
  id: string;
  slug: string;
  name: string;
  town: string;
  state: string;
  ecoregionCode: string | null;
  members: number;
}

/** One person in a group's member list. */
export interface GroupMember {
  userId: string;
  displayName: string;
  /** Only organisers (and admins) see the addresses; everyone else gets null. */
  email: string | null;
  role: GroupRole;
}
