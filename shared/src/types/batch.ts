import { z } from 'zod';
import { isoDateSchema } from '../sowing-calendar/calendar-types.js';
import { slugSchema, type SowingMethod } from './species.js';

/**
 * Growers, batches and batch logs of a season. Requests are strict (an unknown field is a 400
 * naming it); every number and list has its bounds.
 */

/** The methods a grower can raise plants to give by (direct seeding leaves nothing to give). */
export const GROWER_METHODS = ['outdoor-pot-winter', 'winter-sowing', 'indoor-lights', 'soil-blocks'] as const;
export type GrowerMethod = (typeof GROWER_METHODS)[number] & SowingMethod;
export const growerMethodSchema = z.enum(GROWER_METHODS, {
  message: `must be one of ${GROWER_METHODS.join(', ')}`,
});

/** Most pots, containers or blocks one grower may say they tend for one method. */
export const MAX_GROWER_CAPACITY = 2000;
/** Most plants one batch may hold: a season target's limit. */
export const MAX_BATCH_PLANTS = 5000;
/** Most batches on one season. */
export const MAX_BATCHES = 500;
/** Most plants or seeds one log entry may count. */
export const MAX_LOG_COUNT = 100_000;

const wholeCount = (max: number) =>
  z.number().int('must be a whole number').min(0, 'must be 0 or more').max(max, `must be at most ${max}`);

/** One method a grower uses and how many of its units (pots, containers, blocks) they can tend. */
export const growerCapacitySchema = z
  .object({
    method: growerMethodSchema,
    capacity: wholeCount(MAX_GROWER_CAPACITY).min(1, 'must be at least 1'),
  })
  .strict();
export type GrowerCapacity = z.infer<typeof growerCapacitySchema>;

/** A grower's methods and capacity for the season, as the grower (or an organiser) states them. */
export const growerSetupRequestSchema = z
  .object({ methods: z.array(growerCapacitySchema).min(1, 'must name at least one method').max(GROWER_METHODS.length) })
  .strict()
  .superRefine((r, ctx) => {
    const seen = new Set<string>();
    r.methods.forEach((m, i) => {
      if (seen.has(m.method))
        ctx.addIssue({ code: 'custom', message: `"${m.method}" is listed twice`, path: ['methods', i, 'method'] });
      seen.add(m.method);
    });
  });
export type GrowerSetupRequest = z.infer<typeof growerSetupRequestSchema>;

/** One batch of the split as the organiser saves it; `id` keeps an existing batch and its log. */
export const batchPlanSchema = z
  .object({
    id: z.uuidv4({ message: 'must be a UUID' }).optional(),
    growerId: z.uuidv4({ message: 'must be a UUID' }),
    slug: slugSchema.max(120),
    method: growerMethodSchema,
    plants: wholeCount(MAX_BATCH_PLANTS).min(1, 'must be at least 1'),
    /** A sowing date the organiser chose; otherwise the sowing calendar's. */
    sowDate: isoDateSchema.optional(),
  })
  .strict();
export type BatchPlan = z.infer<typeof batchPlanSchema>;

/** Replaces the season's split; batches with log entries must be kept (listed with their id). */
export const batchSplitRequestSchema = z
  .object({ batches: z.array(batchPlanSchema).max(MAX_BATCHES, `must list at most ${MAX_BATCHES} batches`) })
  .strict()
  .superRefine((r, ctx) => {
    const seen = new Set<string>();
    r.batches.forEach((b, i) => {
      if (!b.id) return;
      if (seen.has(b.id))
        ctx.addIssue({ code: 'custom', message: 'this batch is listed twice', path: ['batches', i, 'id'] });
      seen.add(b.id);
    });
  });
export type BatchSplitRequest = z.infer<typeof batchSplitRequestSchema>;

/** Asks for a proposed split; `growerIds` narrows it to some growers (all who stated methods by default). */
export const splitProposalRequestSchema = z
  .object({
    growerIds: z
      .array(z.uuidv4({ message: 'must be a UUID' }))
      .max(200)
      .optional(),
  })
  .strict();
export type SplitProposalRequest = z.infer<typeof splitProposalRequestSchema>;

/** What a batch log entry records. */
export const LOG_KINDS = ['sown', 'germinated', 'potted-up', 'lost', 'ready'] as const;
export type LogKind = (typeof LOG_KINDS)[number];

/** Why plants were lost, in the words growers use. */
export const LOSS_REASONS = [
  'late-frost',
  'slugs',
  'aphids',
  'rabbits-squirrels',
  'damping-off',
  'drying-out',
  'other',
] as const;
export type LossReason = (typeof LOSS_REASONS)[number];

/** One line of a batch log, as a grower sends it from the garden. */
export const logEntryRequestSchema = z
  .object({
    kind: z.enum(LOG_KINDS, { message: `must be one of ${LOG_KINDS.join(', ')}` }),
    /** Seeds sown, or plants that came up, were potted up, were lost or are ready (new since the last entry). */
    count: wholeCount(MAX_LOG_COUNT),
    date: isoDateSchema,
    /** Why plants were lost (losses only). */
    reason: z.enum(LOSS_REASONS, { message: `must be one of ${LOSS_REASONS.join(', ')}` }).optional(),
    note: z.string().max(500, 'must be at most 500 characters').optional(),
    /**
     * The device's own id for the entry, so an entry sent twice (a retry after a lost answer) is
     * written once.
     */
    clientId: z.uuid({ message: 'must be a UUID' }).optional(),
  })
  .strict()
  .refine((e) => e.kind !== 'lost' || e.reason !== undefined, {
    message: 'say why the plants were lost',
    path: ['reason'],
  })
  .refine((e) => e.kind === 'lost' || e.reason === undefined, {
    message: 'only a loss has a reason',
    path: ['reason'],
  });
export type LogEntryRequest = z.infer<typeof logEntryRequestSchema>;

/**
 * The batch-log form as a phone sends it: every field is text. Empty reason and note are left out,
 * then the entry is checked by `logEntryRequestSchema`, so the form says what the API would.
 */
export const logEntryFormSchema = z
  .object({
    kind: z.string().max(20),
    count: z
      .string()
      .trim()
      .regex(/^-?\d+$/, 'must be a whole number')
      .max(12),
    date: z.string().max(10),
    reason: z.string().max(40),
    note: z.string().max(500, 'must be at most 500 characters'),
  })
  .strict()
  .transform((f) => ({
    kind: f.kind,
    count: Number(f.count),
    date: f.date,
    ...(f.reason !== '' && { reason: f.reason }),
    ...(f.note.trim() !== '' && { note: f.note.trim() }),
  }))
  .pipe(logEntryRequestSchema);

const capacityText = z
  .string()
  .trim()
  .max(6, `must be at most ${MAX_GROWER_CAPACITY}`)
  .regex(/^([1-9]\d*)?$/, 'must be a whole number from 1, or empty if you do not use this method')
  .refine((v) => v === '' || Number(v) <= MAX_GROWER_CAPACITY, `must be at most ${MAX_GROWER_CAPACITY}`);

/**
 * A grower's methods as a form sends them: one text box per method, empty when the grower does not
 * use it. Becomes a `growerSetupRequestSchema` body.
 */
export const growerSetupFormSchema = z
  .object({
    'outdoor-pot-winter': capacityText,
    'winter-sowing': capacityText,
    'indoor-lights': capacityText,
    'soil-blocks': capacityText,
  })
  .strict()
  .refine((f) => GROWER_METHODS.some((m) => f[m] !== ''), {
    message: 'fill in at least one method',
    path: [GROWER_METHODS[0]],
  })
  .transform((f) => ({
    methods: GROWER_METHODS.filter((m) => f[m] !== '').map((method) => ({ method, capacity: Number(f[method]) })),
  }))
  .pipe(growerSetupRequestSchema);
