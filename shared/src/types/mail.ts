import { z } from 'zod';
import { emailSchema } from './auth.js';

/** A message in the local outbox, as organisers and admins read it. */
export interface OutboxMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  /** What it is for: invitation, frost-warning, reservation, … */
  kind: string;
  groupId: string | null;
  receivedAt: string;
}

export const outboxQuerySchema = z
  .object({
    kind: z
      .string()
      .regex(/^[a-z-]{1,40}$/, 'lower-case words joined by hyphens')
      .optional(),
    to: emailSchema.optional(),
  })
  .strict();
export type OutboxQuery = z.infer<typeof outboxQuerySchema>;
