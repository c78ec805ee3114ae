import { z } from 'zod';
import { displayNameSchema, emailSchema } from '../types/auth.js';
import { moistureSchema, slugSchema, sunSchema } from '../types/species.js';
import { isoDateSchema } from '../sowing-calendar/calendar-types.js';

/**
 * What organisers and takers send about a plant share. Every object is strict (an unknown key is a
 * 400 naming it) and every string and array has a maximum. Rules that need the share or the clock
 * (a slot in the past, a household limit, stock left) are checked by the API, which names the field.
 */

export const SHARE_STATUSES = ['open', 'paused', 'closed'] as const;
export const shareStatusSchema = z.enum(SHARE_STATUSES, { message: `must be one of ${SHARE_STATUSES.join(', ')}` });
export type ShareStatus = z.infer<typeof shareStatusSchema>;

/** Most plants one line of a reservation, a walk-up or a stock edit may name (a big tray of one species). */
export const MAX_LINE_PLANTS = 500;
/** Most plants of one species on offer at one share. */
export const MAX_STOCK_PLANTS = 10_000;
/** Most households one pickup slot may take. */
export const MAX_SLOT_HOUSEHOLDS = 500;
/** Most pickup slots one share may have (a long day in 10-minute slots). */
export const MAX_SLOTS = 60;
/** Most species one reservation or walk-up may list. */
export const MAX_LINES = 40;
/** Days after the share that takers' names and e-mails are kept when the organiser does not say. */
export const DEFAULT_RETENTION_DAYS = 30;
/** Longest the organiser may keep names and e-mails after the share. */
export const MAX_RETENTION_DAYS = 365;

/**
 * A moment with its UTC offset, e.g. `2027-06-12T09:00:00-05:00`: a pickup slot is a time at a place,
 * so the offset says which clock the organiser meant and "in the past" means the same on every server.
 */
export const slotTimeSchema = z.iso.datetime({
  offset: true,
  message: 'must be a date and time with its offset, e.g. 2027-06-12T09:00:00-05:00',
});

/** A pickup slot as the organiser writes it. */
export const pickupSlotRequestSchema = z
  .object({
    start: slotTimeSchema,
    end: slotTimeSchema,
    /** Households the volunteers can serve in the slot. */
    capacity: z
      .number()
      .int('must be a whole number')
      .min(1, 'must be at least 1')
      .max(MAX_SLOT_HOUSEHOLDS, `must be at most ${MAX_SLOT_HOUSEHOLDS}`),
  })
  .strict()
  .refine((s) => Date.parse(s.end) > Date.parse(s.start), { message: 'must be after the start', path: ['end'] });
export type PickupSlotRequest = z.infer<typeof pickupSlotRequestSchema>;

/** Plants one household may take: of any one species, and in all. */
export const householdLimitsSchema = z
  .object({
    perSpecies: z
      .number()
      .int('must be a whole number')
      .min(1, 'must be at least 1')
      .max(MAX_LINE_PLANTS, `must be at most ${MAX_LINE_PLANTS}`),
    total: z
      .number()
      .int('must be a whole number')
      .min(1, 'must be at least 1')
      .max(MAX_LINE_PLANTS * 4, `must be at most ${MAX_LINE_PLANTS * 4}`),
  })
  .strict()
  .refine((l) => l.total >= l.perSpecies, { message: 'must be at least the limit per species', path: ['total'] });
export type HouseholdLimits = z.infer<typeof householdLimitsSchema>;

/** Where the share is held: a name people know and the street address. */
export const sharePlaceSchema = z
  .object({
    name: z.string().trim().min(1, 'must not be empty').max(120, 'must be at most 120 characters'),
    address: z.string().trim().min(1, 'must not be empty').max(300, 'must be at most 300 characters'),
    /** How pickup works there, e.g. "Stay in your car; volunteers bring the plants to you." */
    directions: z.string().trim().max(1000, 'must be at most 1000 characters').optional(),
  })
  .strict();
export type SharePlace = z.infer<typeof sharePlaceSchema>;

const retentionDaysSchema = z
  .number()
  .int('must be a whole number')
  .min(1, 'must be at least 1')
  .max(MAX_RETENTION_DAYS, `must be at most ${MAX_RETENTION_DAYS}`);

/** One species and a number of plants: a reservation line, a walk-up line, a stock edit. */
export const plantLineSchema = z
  .object({
    speciesSlug: slugSchema,
    count: z
      .number()
      .int('must be a whole number')
      .min(1, 'must be at least 1')
      .max(MAX_LINE_PLANTS, `must be at most ${MAX_LINE_PLANTS}`),
  })
  .strict();
export type PlantLine = z.infer<typeof plantLineSchema>;

/** Lines naming each species once. */
const linesSchema = (min: number) =>
  z
    .array(plantLineSchema)
    .min(min, 'must name at least one species')
    .max(MAX_LINES, `must list at most ${MAX_LINES} species`)
    .superRefine((lines, ctx) => {
      const seen = new Set<string>();
      lines.forEach((l, i) => {
        if (seen.has(l.speciesSlug))
          ctx.addIssue({ code: 'custom', message: `"${l.speciesSlug}" is listed twice`, path: [i, 'speciesSlug'] });
        seen.add(l.speciesSlug);
      });
    });

/** A stock line: plants of a species on offer (0 takes it off the list). */
export const stockLineSchema = z
  .object({
    speciesSlug: slugSchema,
    count: z
      .number()
      .int('must be a whole number')
      .min(0, 'must be 0 or more')
      .max(MAX_STOCK_PLANTS, `must be at most ${MAX_STOCK_PLANTS}`),
  })
  .strict();
export type StockLine = z.infer<typeof stockLineSchema>;

const stockLinesSchema = (min: number) =>
  z
    .array(stockLineSchema)
    .min(min, 'must name at least one species')
    .max(200, 'must list at most 200 species')
    .superRefine((lines, ctx) => {
      const seen = new Set<string>();
      lines.forEach((l, i) => {
        if (seen.has(l.speciesSlug))
          ctx.addIssue({ code: 'custom', message: `"${l.speciesSlug}" is listed twice`, path: [i, 'speciesSlug'] });
        seen.add(l.speciesSlug);
      });
    });

/** Most characters of the "what to bring" note. */
export const MAX_WHAT_TO_BRING = 500;

/**
 * What takers should bring to pickup, in the organiser's words (e.g. "A box or tray for your pots; we
 * reuse returned pots."). Shown on the public page, the confirmation page and in the confirmation e-mail.
 */
export const whatToBringSchema = z
  .string()
  .trim()
  .max(MAX_WHAT_TO_BRING, `must be at most ${MAX_WHAT_TO_BRING} characters`);

/** Opens the season's plant share. Stock left out is taken from the season (see the API). */
export const openShareRequestSchema = z
  .object({
    date: isoDateSchema,
    place: sharePlaceSchema,
    slots: z
      .array(pickupSlotRequestSchema)
      .min(1, 'must have at least one pickup slot')
      .max(MAX_SLOTS, `must have at most ${MAX_SLOTS} slots`),
    limits: householdLimitsSchema,
    /** Days after the share date that takers' names and e-mails are kept. */
    retentionDays: retentionDaysSchema.optional(),
    stock: stockLinesSchema(0).optional(),
    whatToBring: whatToBringSchema.optional(),
  })
  .strict();
export type OpenShareRequest = z.infer<typeof openShareRequestSchema>;

/**
 * Changes the share's date, place, limits, retention or what to bring; what is left out stays (an empty
 * "what to bring" clears it). A new date moves every pickup slot to the same times on the new day.
 */
export const editShareRequestSchema = z
  .object({
    date: isoDateSchema.optional(),
    place: sharePlaceSchema.optional(),
    limits: householdLimitsSchema.optional(),
    retentionDays: retentionDaysSchema.optional(),
    whatToBring: whatToBringSchema.optional(),
  })
  .strict();
export type EditShareRequest = z.infer<typeof editShareRequestSchema>;

/** Sets the plants on offer of each species listed (species not listed keep theirs). */
export const setStockRequestSchema = z.object({ stock: stockLinesSchema(1) }).strict();
export type SetStockRequest = z.infer<typeof setStockRequestSchema>;

/** Adds plants that became ready; they go to the waitlist first, in order. */
export const addStockRequestSchema = z.object({ lines: linesSchema(1) }).strict();
export type AddStockRequest = z.infer<typeof addStockRequestSchema>;

export const shareStatusRequestSchema = z.object({ status: shareStatusSchema }).strict();
export type ShareStatusRequest = z.infer<typeof shareStatusRequestSchema>;

/** A US ZIP code: five digits (ZIP+4 is cut to five; only the first three are ever reported). */
export const zipSchema = z
  .string()
  .trim()
  .regex(/^\d{5}(-\d{4})?$/, 'must be a 5-digit ZIP code')
  .transform((z5) => z5.slice(0, 5));

/** A reservation as a taker makes it: name, e-mail and ZIP, nothing more; a slot and the plants. */
export const reservationRequestSchema = z
  .object({
    name: displayNameSchema,
    email: emailSchema,
    zip: zipSchema,
    slotId: z.uuid({ message: 'must be a pickup slot id' }),
    lines: linesSchema(1),
  })
  .strict();
export type ReservationRequest = z.input<typeof reservationRequestSchema>;
export type ParsedReservationRequest = z.output<typeof reservationRequestSchema>;

/** Changes a reservation by its private link: another slot, other plants, or both. */
export const changeReservationRequestSchema = z
  .object({
    slotId: z.uuid({ message: 'must be a pickup slot id' }).optional(),
    lines: linesSchema(1).optional(),
  })
  .strict()
  .refine((r) => r.slotId !== undefined || r.lines !== undefined, {
    message: 'give a new slot or new plants',
    path: ['slotId'],
  });
export type ChangeReservationRequest = z.infer<typeof changeReservationRequestSchema>;

export const CHECK_IN_OUTCOMES = ['picked-up', 'no-show'] as const;
/** Pickup day: the household came, or the slot is over and they did not (their plants are released). */
export const checkInRequestSchema = z
  .object({ outcome: z.enum(CHECK_IN_OUTCOMES, { message: `must be one of ${CHECK_IN_OUTCOMES.join(', ')}` }) })
  .strict();
export type CheckInRequest = z.infer<typeof checkInRequestSchema>;

/** Plants given without a reservation; the ZIP is asked only to count areas reached. */
export const walkUpRequestSchema = z
  .object({
    lines: linesSchema(1),
    zip: zipSchema.optional(),
  })
  .strict();
export type WalkUpRequest = z.input<typeof walkUpRequestSchema>;

/** Joining the waitlist of species that ran out. */
export const waitlistRequestSchema = z
  .object({
    name: displayNameSchema,
    email: emailSchema,
    zip: zipSchema,
    lines: linesSchema(1),
  })
  .strict();
export type WaitlistRequest = z.input<typeof waitlistRequestSchema>;

/**
 * The taker's yard for "fits my yard", one of three ways: their sun and moisture (ranked for the
 * group's region); the same with their ZIP (ranked for the place the ZIP is in); or a saved mix's
 * link id (its site and its place). Sun and moisture come both or neither.
 */
export const shareFitQuerySchema = z
  .object({
    sun: sunSchema.optional(),
    moisture: moistureSchema.optional(),
    zip: zipSchema.optional(),
    mix: z.uuid({ message: 'must be the id of a saved mix link' }).optional(),
  })
  .strict()
  .refine((q) => (q.sun === undefined) === (q.moisture === undefined), {
    message: 'give both sun and moisture, or neither',
    path: ['moisture'],
  })
  .refine((q) => q.mix === undefined || (q.sun === undefined && q.zip === undefined), {
    message: 'a saved mix brings its own site and place: give it alone',
    path: ['mix'],
  })
  .refine((q) => q.zip === undefined || q.sun !== undefined, {
    message: 'give your sun and moisture with your ZIP',
    path: ['sun'],
  });
export type ShareFitQuery = z.infer<typeof shareFitQuerySchema>;

/** The secret of a reservation's private link: 43 base64url characters (32 random bytes). */
export const reservationTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'is not a reservation link we sent');

/** The secret of a waitlist offer's private link: 43 base64url characters (32 random bytes). */
export const waitlistOfferTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'is not a waitlist link we sent');

/** Takes plants a waitlist offer holds: a pickup slot (ignored when the household already has a reservation). */
export const claimOfferRequestSchema = z.object({ slotId: z.uuid({ message: 'must be a pickup slot id' }) }).strict();
export type ClaimOfferRequest = z.infer<typeof claimOfferRequestSchema>;
