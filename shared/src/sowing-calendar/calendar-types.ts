import { z } from 'zod';
import { slugSchema, sowingMethodSchema, type SowingMethod, type Species } from '../types/species.js';
import { isIsoDate, type IsoDate } from './calendar-date.js';

/** Letters, digits, dot, dash and underscore, 1–64 characters: safe inside an iCalendar UID. */
export const planIdSchema = z
  .string()
  .regex(/^[A-Za-z0-9._-]{1,64}$/, { message: 'letters, digits, dot, dash or underscore, 1–64 characters' });

/** Years a calendar may use: wider than any planting plan, narrow enough for every calendar format. */
export const MIN_CALENDAR_YEAR = 1900;
export const MAX_CALENDAR_YEAR = 2200;

export const isoDateSchema = z
  .string()
  .max(10, 'a calendar date, YYYY-MM-DD')
  .refine(isIsoDate, { message: 'a calendar date, YYYY-MM-DD', abort: true })
  .refine(
    (d) => {
      const year = Number(d.slice(0, 4));
      return year >= MIN_CALENDAR_YEAR && year <= MAX_CALENDAR_YEAR;
    },
    { message: `a year from ${MIN_CALENDAR_YEAR} to ${MAX_CALENDAR_YEAR}` },
  );

/** A calendar request as the API receives it; it resolves the slugs to catalogue records. */
export const sowingCalendarRequestSchema = z
  .object({
    /** Average last spring frost for the place, e.g. "2027-05-10". */
    lastFrost: isoDateSchema,
    /** The plant share (or any date plants must be ready by). */
    targetDate: isoDateSchema.optional(),
    /** Today, so past start dates can be flagged (the caller reads the clock, not us). */
    today: isoDateSchema,
    plans: z
      .array(z.object({ slug: slugSchema, method: sowingMethodSchema, sowDate: isoDateSchema.optional() }).strict())
      .min(1)
      .max(200),
    /**
     * A stable name for this plan (a mix, a season plan, a batch): it goes into every iCalendar UID so
     * a re-imported, updated calendar replaces its events instead of duplicating them.
     */
    planId: planIdSchema.optional(),
  })
  .strict();
export type SowingCalendarRequest = z.infer<typeof sowingCalendarRequestSchema>;

export interface SowingPlan {
  species: Species;
  method: SowingMethod;
  /** A sowing date chosen by the grower; otherwise the calendar picks one for the method. */
  sowDate?: IsoDate;
}

export interface SowingCalendarInput {
  lastFrost: IsoDate;
  targetDate?: IsoDate;
  today: IsoDate;
  plans: readonly SowingPlan[];
}

/** Every step the calendar can date; the response schema and the exports read this list. */
export const CALENDAR_EVENT_KINDS = [
  'winter-sowing-window',
  'warm-moist-start',
  'cms-start',
  'check-sprouts',
  'sow',
  'vent-containers',
  'sprouts-expected',
  'pot-up',
  'harden-off',
  'plant-out',
  'frost-watch',
  // Window and frost-watch ends, holding before the share, the share itself.
  'winter-sowing-window-ends',
  'frost-watch-end',
  'pot-on',
  'collect-pots',
  'label-pots',
  'plant-share',
] as const;
export type CalendarEventKind = (typeof CALENDAR_EVENT_KINDS)[number];

export interface CalendarEvent {
  date: IsoDate;
  kind: CalendarEventKind;
  title: string;
  detail: string;
  /** Null for events that concern the whole calendar (the frost date, the winter-sowing window). */
  speciesSlug: string | null;
  /** The plan's method, on species events (absent on whole-calendar events). */
  method?: SowingMethod;
}

export const CALENDAR_WARNING_KINDS = [
  'target-too-early',
  'start-in-past',
  'method-unusual',
  'cold-too-short',
  'outside-window',
  'not-for-share',
  'late-start',
  'next-season',
  'second-season',
] as const;
export type CalendarWarningKind = (typeof CALENDAR_WARNING_KINDS)[number];

export interface CalendarWarning {
  kind: CalendarWarningKind;
  speciesSlug: string;
  /** The plan's method (absent only on warnings made before a method applies). */
  method?: SowingMethod;
  /** The day count the message gives (days late, days past, days of cold missing). */
  days?: number;
  message: string;
}

/** One species' schedule: its events, the day plants are ready (null when sown in place). */
export interface SpeciesSchedule {
  speciesSlug: string;
  method: SowingMethod;
  sowDate: IsoDate;
  readyDate: IsoDate | null;
  events: CalendarEvent[];
  warnings: CalendarWarning[];
}

export interface SowingCalendar {
  events: CalendarEvent[];
  warnings: CalendarWarning[];
  schedules: SpeciesSchedule[];
}
