import { z } from 'zod';
import { isoDateSchema } from '../sowing-calendar/calendar-types.js';

/** An organiser's frost warning to the growers with batches outdoors. */
export const frostWarningRequestSchema = z
  .object({
    /** The night frost is forecast (today or within the next two weeks). */
    night: isoDateSchema,
    /** A line of the organiser's own, e.g. the forecast low. */
    note: z.string().trim().max(300, 'must be at most 300 characters').optional(),
  })
  .strict();
export type FrostWarningRequest = z.infer<typeof frostWarningRequestSchema>;

/** Who a frost warning went to (display names only; addresses stay on the server). */
export const frostWarningAnswerSchema = z.object({
  night: z.string(),
  growers: z.array(z.object({ userId: z.string(), displayName: z.string(), batches: z.number().int() })),
});
export type FrostWarningAnswer = z.infer<typeof frostWarningAnswerSchema>;

/** "Send the weekly summary now" takes nothing but an empty object (the week is today's). */
export const weeklySummaryRequestSchema = z.object({}).strict();
export type WeeklySummaryRequest = z.infer<typeof weeklySummaryRequestSchema>;

/** What "send the weekly summary now" did: each grower gets one per ISO week at most. */
export const weeklySummaryAnswerSchema = z.object({
  week: z.string(),
  sent: z.number().int(),
  alreadySent: z.number().int(),
});
export type WeeklySummaryAnswer = z.infer<typeof weeklySummaryAnswerSchema>;
