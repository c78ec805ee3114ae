import { isoDateSchema, sowingCalendarRequestSchema } from '@homeground/shared';
import { z } from 'zod';

/** The shared calendar request; `today` may be left out, and the server's date is used. */
export const calendarRequestSchema = sowingCalendarRequestSchema.extend({ today: isoDateSchema.optional() }).strict();
export type CalendarRequest = z.infer<typeof calendarRequestSchema>;
