import { z } from 'zod';
import type { BatchSchedule } from '../batch-planning/batch-schedule.js';
import type { LogTotals } from '../batch-planning/batch-log.js';
import type { ReadyForecast } from '../batch-planning/ready-forecast.js';
import { SUPPLY_ITEMS, type SupplyList } from '../batch-planning/supply-list.js';
import { BATCH_STEP_KINDS } from '../vocabulary/batch-words.js';
import { GROUP_ROLES } from './auth.js';
import { GROWER_METHODS, LOG_KINDS, LOSS_REASONS } from './batch.js';
import { TREATMENT_KINDS } from './species.js';

/**
 * What the batch routes answer, as zod schemas (the API publishes them with @ZodResponse) and the
 * types inferred from them. Names are the growers' display names; no e-mail address is ever here.
 */

const method = z.enum(GROWER_METHODS);
const capacity = z.object({ method, capacity: z.number().int() });

export const seasonGrowerSchema = z.object({
  userId: z.string(),
  displayName: z.string(),
  role: z.enum(GROUP_ROLES),
  /** What the grower stated; empty until they (or an organiser) say. */
  methods: z.array(capacity),
  /** Units the season's batches already take, per method. */
  used: z.array(z.object({ method, units: z.number().int() })),
});
export type SeasonGrower = z.infer<typeof seasonGrowerSchema>;
export const seasonGrowerListSchema = z.array(seasonGrowerSchema);

const step = z.object({ kind: z.enum(BATCH_STEP_KINDS), date: z.string(), title: z.string(), detail: z.string() });
const treatment = z.object({
  kind: z.enum(TREATMENT_KINDS),
  days: z.number().nullable(),
  where: z.enum(['refrigerator', 'outdoors']).nullable(),
  title: z.string(),
  how: z.string(),
});
const totals = z.object({
  sown: z.number(),
  germinated: z.number(),
  pottedUp: z.number(),
  lost: z.number(),
  ready: z.number(),
  alive: z.number(),
}) satisfies z.ZodType<LogTotals>;
const range = { expected: z.number(), low: z.number(), high: z.number() };
const forecast = z.object({
  ...range,
  basis: z.enum(['planned', 'sown', 'germinated', 'after-share']),
}) satisfies z.ZodType<ReadyForecast>;

export const batchLogEntrySchema = z.object({
  id: z.string(),
  kind: z.enum(LOG_KINDS),
  count: z.number().int(),
  date: z.string(),
  reason: z.enum(LOSS_REASONS).nullable(),
  note: z.string().nullable(),
  clientId: z.string().nullable(),
  createdAt: z.string(),
});
export type BatchLogEntry = z.infer<typeof batchLogEntrySchema>;

export const batchSchema = z.object({
  id: z.string(),
  growerId: z.string(),
  growerName: z.string(),
  slug: z.string(),
  commonName: z.string(),
  scientificName: z.string(),
  method,
  unit: z.enum(['pot', 'container', 'block']),
  plants: z.number().int(),
  units: z.number().int(),
  seedsToSow: z.number().int(),
  germinationRatePct: z.number(),
  sowDate: z.string(),
  readyDate: z.string().nullable(),
  readyAfterShare: z.boolean(),
  treatments: z.array(treatment),
  steps: z.array(step),
  /** The first step from today on, or null when all are past. */
  nextStep: step.nullable(),
  /** Plain words when the batch is behind its usual dates (e.g. not sown yet), else null. */
  behind: z.string().nullable(),
  warnings: z.array(z.string()),
  /** What to do on frosty nights while the frost watch applies to this batch's seedlings, else null. */
  frostWarning: z.string().nullable(),
  /** The species' cautions, in words. */
  cautions: z.array(z.object({ title: z.string(), text: z.string() })),
  log: z.array(batchLogEntrySchema),
  totals,
  forecast,
}) satisfies z.ZodType<Pick<BatchSchedule, 'sowDate' | 'readyDate' | 'readyAfterShare'>>;
export type Batch = z.infer<typeof batchSchema>;

/**
 * The answer to a new log entry: the entry as stored (the first one when the same clientId came
 * before) and the batch's totals after it. Its size does not grow with the log; the whole batch is
 * read with GET.
 */
export const logEntryAnswerSchema = z.object({
  batchId: z.string(),
  entry: batchLogEntrySchema,
  totals,
});
export type LogEntryAnswer = z.infer<typeof logEntryAnswerSchema>;

const supplyList = z.object({
  lines: z.array(
    z.object({
      item: z.enum(SUPPLY_ITEMS),
      name: z.string(),
      count: z.number().nullable(),
      litres: z.number().nullable(),
      quarts: z.number().nullable(),
      note: z.string(),
    }),
  ),
  cautions: z.array(z.string()),
}) satisfies z.ZodType<SupplyList>;

export const seasonBatchesSchema = z.object({
  groupSlug: z.string(),
  year: z.number().int(),
  plantShareDate: z.string(),
  batches: z.array(batchSchema),
  supplies: z.object({
    byGrower: z.array(z.object({ growerId: z.string(), growerName: z.string(), list: supplyList })),
    /** The whole group's list: organisers only (null for a grower, who sees their own). */
    group: supplyList.nullable(),
  }),
});
export type SeasonBatches = z.infer<typeof seasonBatchesSchema>;

export const batchSplitProposalSchema = z.object({
  batches: z.array(
    z.object({
      growerId: z.string(),
      growerName: z.string(),
      slug: z.string(),
      commonName: z.string(),
      method,
      plants: z.number().int(),
      units: z.number().int(),
      why: z.string(),
    }),
  ),
  unassigned: z.array(z.object({ slug: z.string(), commonName: z.string(), plants: z.number(), reason: z.string() })),
});
export type BatchSplitProposalAnswer = z.infer<typeof batchSplitProposalSchema>;

const counts = {
  sown: z.number(),
  germinated: z.number(),
  pottedUp: z.number(),
  lost: z.number(),
  ready: z.number(),
};

export const seasonProgressSchema = z.object({
  groupSlug: z.string(),
  year: z.number().int(),
  plantShareDate: z.string(),
  today: z.string(),
  species: z.array(
    z.object({
      slug: z.string(),
      commonName: z.string(),
      scientificName: z.string(),
      targetPlants: z.number(),
      /** Plants the batches are meant to give. */
      plannedPlants: z.number(),
      ...counts,
      forecast: z.object(range),
      /** Plants short of the target at the expected forecast (0 when on track). */
      shortBy: z.number(),
      /** While there is time: how many more to sow and by when, in words; else null. */
      nudge: z.string().nullable(),
    }),
  ),
  growers: z.array(
    z.object({
      growerId: z.string(),
      growerName: z.string(),
      batches: z.number(),
      behind: z.number(),
      ...counts,
    }),
  ),
  /** How the forecast is worked out, in words. */
  method: z.array(z.string()),
});
export type SeasonProgress = z.infer<typeof seasonProgressSchema>;

/** Plants logged ready per species: the plant share's starting stock. */
export const readyCountSchema = z.object({
  slug: z.string(),
  commonName: z.string(),
  scientificName: z.string(),
  readyPlants: z.number().int(),
});
export type ReadyCount = z.infer<typeof readyCountSchema>;
