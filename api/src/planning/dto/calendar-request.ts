/** The calendar request lives with the other request schemas in shared; re-exported for this folder's imports. */
export { type CalendarRequest, calendarRequestSchema } from '@homeground/shared';
