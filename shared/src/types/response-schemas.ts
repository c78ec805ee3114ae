import { z } from 'zod';
import {
  CALENDAR_EVENT_KINDS,
  CALENDAR_WARNING_KINDS,
  type SowingCalendar,
} from '../sowing-calendar/calendar-types.js';
import {
  type AuthResponse,
  type RegisterAccepted,
  GLOBAL_ROLES,
  GROUP_ROLES,
  type Group,
  type GroupMember,
  type HealthResponse,
  type StatsResponse,
  type SiteInfoResponse,
  type User,
} from './auth.js';
import { ecoregionSchema } from './ecoregion.js';
import type { Invitation, InvitationPreview } from './invitation.js';
import type { OutboxMessage } from './mail.js';
import type { PersonAccount } from './people.js';
import { PHOTO_LICENCES } from './photo-credit.js';
import { SPECIES_CHANGE_KINDS, type SpeciesChange } from './species-history.js';
import { BLOOM_PERIODS, paletteRequestSchema, type PaletteResult, type ScoredSpecies } from './recommendation.js';
import type { Season, ShareList } from './season.js';
import type { SeedList } from '../season-planning/seed-list.js';
import type { AlternativesResponse, MixQuantity, MixResponse, RecommendationsResponse, SavedMix } from './mix-api.js';
import type { EcoregionOutline, PlaceLookup } from './place.js';
import { siteSchema } from './site.js';
import {
  CAUTION_KINDS,
  FLOWER_COLOURS,
  GROWTH_FORMS,
  MOISTURE_LEVELS,
  SOWING_METHODS,
  speciesSchema,
  stateCodeSchema,
  SUN_LEVELS,
} from './species.js';
import type { CsvImportResult, SpeciesPage, SpeciesSummary } from './species-query.js';

/**
 * What the API answers, as zod schemas, so the OpenAPI document describes each answer from the same
 * source as the requests. Each `satisfies` ties a schema to the TypeScript type the code returns, so
 * a field the answer does not have, or of another type, fails the build.
 */

const isoDateTime = z.string().describe('ISO 8601 date and time');
const isoDate = z.string().describe('calendar date, YYYY-MM-DD');

export const userResponseSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  role: z.enum(GLOBAL_ROLES),
  groups: z.array(
    z.object({ groupId: z.string(), groupSlug: z.string(), groupName: z.string(), role: z.enum(GROUP_ROLES) }),
  ),
  createdAt: isoDateTime,
}) satisfies z.ZodType<User>;

export const personAccountResponseSchema = userResponseSchema.extend({
  disabledAt: isoDateTime.nullable(),
  lastSignInAt: isoDateTime.nullable(),
  signInHeld: z.boolean().describe('sign-in for this address is held back after too many wrong passwords'),
}) satisfies z.ZodType<PersonAccount>;

export const speciesChangeResponseSchema = z.object({
  id: z.string(),
  slug: z.string(),
  kind: z.enum(SPECIES_CHANGE_KINDS),
  changedAt: isoDateTime,
  changedBy: z.object({ id: z.string(), displayName: z.string() }).nullable(),
  fileName: z.string().nullable(),
  revertOf: z.string().nullable(),
  changes: z.array(
    z.object({
      field: z.string(),
      before: z.string().nullable().describe('the value before, as JSON text'),
      after: z.string().nullable().describe('the value after, as JSON text'),
      source: z.string().nullable().describe('the source the record gives for this field after the change'),
    }),
  ),
}) satisfies z.ZodType<SpeciesChange>;

export const authResponseSchema = z.object({
  accessToken: z.string().describe('a JWT to send as Authorization: Bearer <token>'),
  expiresIn: z.number().describe('seconds until the token expires'),
  user: userResponseSchema,
}) satisfies z.ZodType<AuthResponse>;

export const registerAcceptedSchema = z.object({
  status: z.literal('check-your-email'),
  email: z.string().describe('the address the confirmation was sent to'),
  expiresInHours: z.number().describe('how long the link in the e-mail works'),
}) satisfies z.ZodType<RegisterAccepted>;

/** A confirmed sign-up: the new account's sign-in, and the page the person came from, if any. */
export const confirmRegistrationResponseSchema = authResponseSchema.extend({
  next: z.string().nullable().describe('a path on this site to return to, if the sign-up form had one'),
});

export const groupResponseSchema = z.object({
  id: z.string(),
  slug: z.string(),
  name: z.string(),
  town: z.string(),
  state: z.string(),
  ecoregionCode: z.string().nullable(),
  members: z.number().int(),
}) satisfies z.ZodType<Group>;

/** A member of a group as its members see them (names and e-mails only for people in the group). */
export const groupMemberResponseSchema = z.object({
  userId: z.string(),
  displayName: z.string(),
  email: z.string().nullable(),
  role: z.enum(GROUP_ROLES),
}) satisfies z.ZodType<GroupMember>;
export type GroupMemberResponse = z.infer<typeof groupMemberResponseSchema>;

export const healthResponseSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  version: z.string(),
  database: z.object({ status: z.enum(['up', 'down']), migrations: z.number().int() }),
  uptimeSeconds: z.number(),
}) satisfies z.ZodType<HealthResponse>;

export const siteInfoResponseSchema = z.object({
  publicUrl: z.string().url(),
}) satisfies z.ZodType<SiteInfoResponse>;

export const statsResponseSchema = z.object({
  species: z.number().int(),
  groups: z.number().int(),
  ecoregions: z.number().int(),
  users: z.number().int(),
}) satisfies z.ZodType<StatsResponse>;

export const speciesSummarySchema = z.object({
  slug: z.string(),
  scientificName: z.string(),
  commonName: z.string(),
  family: z.string(),
  growthForm: z.enum(GROWTH_FORMS),
  heightCm: z.object({ min: z.number(), max: z.number() }),
  bloomMonths: z.array(z.number().int()),
  flowerColours: z.array(z.enum(FLOWER_COLOURS)),
  sun: z.array(z.enum(SUN_LEVELS)),
  moisture: z.array(z.enum(MOISTURE_LEVELS)),
  monarchHost: z.boolean(),
  lepidopteraGenusCount: z.number().int().nullable(),
  cautionKinds: z.array(z.enum(CAUTION_KINDS)),
  hasPhoto: z.boolean(),
}) satisfies z.ZodType<SpeciesSummary>;

export const speciesPageSchema = z.object({
  items: z.array(speciesSummarySchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
}) satisfies z.ZodType<SpeciesPage>;

export const speciesDetailSchema = speciesSchema.extend({
  hasPhoto: z.boolean(),
  /** Who took the photo, its licence and source; null when there is no photo or it predates credits. */
  photoCredit: z
    .object({ photographer: z.string(), licence: z.enum(PHOTO_LICENCES), sourceUrl: z.string() })
    .nullable(),
});

export const csvImportResultSchema = z.object({
  created: z.number().int(),
  updated: z.number().int(),
  dryRun: z.boolean(),
  preview: z.array(
    z.object({
      line: z.number().int(),
      slug: z.string(),
      scientificName: z.string(),
      action: z.enum(['create', 'change', 'unchanged']),
      fields: z.array(z.string()),
    }),
  ),
}) satisfies z.ZodType<CsvImportResult>;

export const photoUploadResultSchema = z.object({
  slug: z.string(),
  photographer: z.string(),
  licence: z.enum(PHOTO_LICENCES),
  sourceUrl: z.string(),
  mime: z.string(),
  bytes: z.number().int(),
  width: z.number().int(),
  height: z.number().int(),
});

export const ecoregionListSchema = z.array(ecoregionSchema);

const ringSchema = z.array(z.array(z.number()));
export const ecoregionOutlineSchema = z.object({
  code: z.string(),
  outline: z
    .discriminatedUnion('type', [
      z.object({ type: z.literal('Polygon'), coordinates: z.array(ringSchema) }),
      z.object({ type: z.literal('MultiPolygon'), coordinates: z.array(z.array(ringSchema)) }),
    ])
    .nullable(),
}) satisfies z.ZodType<EcoregionOutline>;

export const boundaryImportResultSchema = z.object({ regions: z.number().int(), vertices: z.number().int() });

const ecoregionBriefSchema = z.object({
  code: z.string(),
  name: z.string(),
  share: z.number().nullable(),
  description: z.string(),
  level1: z.string(),
  level2: z.string(),
});
export const placeLookupSchema = z.object({
  point: z.object({ lat: z.number(), lon: z.number() }),
  zip: z.object({ code: z.string(), city: z.string(), state: z.string() }).nullable(),
  state: stateCodeSchema,
  county: z.object({ fips: z.string(), name: z.string() }),
  ecoregion: ecoregionBriefSchema.extend({ method: z.enum(['boundary', 'county-crosswalk']) }),
  otherEcoregions: z.array(ecoregionBriefSchema),
}) satisfies z.ZodType<PlaceLookup>;

const scorePartSchema = z.object({
  name: z.enum([
    'native',
    'sun',
    'moisture',
    'soil',
    'habitat',
    'host-plant',
    'monarch-host',
    'pollinators',
    'birds',
    'bloom-gap',
    'height',
    'room',
    'deer',
    'spread',
    'rain-garden',
    'shade-garden',
    'thrives',
    'community',
    'wetland-class',
    'acid-soil',
    'bees',
    'availability',
    'seed-ease',
    'garden-use',
    'fern',
    'ecoregion',
  ]),
  points: z.number(),
  reason: z.string(),
});
const scoredSpeciesSchema = z.object({
  slug: z.string(),
  score: z.number(),
  parts: z.array(scorePartSchema),
  eligible: z.boolean(),
  ineligibleReason: z.string().optional(),
  nearMiss: z.boolean(),
  tieBreak: z.number().optional(),
}) satisfies z.ZodType<ScoredSpecies>;
const coverageSchema = z.object({ covered: z.boolean(), message: z.string().optional() });
const scoredWithSpeciesSchema = scoredSpeciesSchema.extend({ species: speciesSummarySchema });

export const recommendationsResponseSchema = z.object({
  site: siteSchema,
  ranked: z.array(scoredWithSpeciesSchema),
  alsoConsider: z.array(scoredWithSpeciesSchema),
  coverage: coverageSchema,
}) satisfies z.ZodType<RecommendationsResponse>;

const paletteResultSchema = z.object({
  size: z.number().int(),
  coverage: coverageSchema,
  plantingMethod: z.enum(['plugs', 'seeding']),
  sizeReason: z.string(),
  chosen: z.array(
    z.object({
      slug: z.string(),
      score: z.number(),
      parts: z.array(scorePartSchema),
      roles: z.array(z.string()),
      locked: z.boolean(),
    }),
  ),
  objective: z.number(),
  terms: z.array(
    z.object({
      name: z.enum([
        'fit',
        'host-plants',
        'bloom-periods',
        'bloom-months',
        'flowering-count',
        'milkweed',
        'grasses',
        'height-tiers',
        'colours',
        'genus-variety',
      ]),
      value: z.number(),
    }),
  ),
  constraints: z.array(
    z.object({
      id: z.enum([
        'cp42-early',
        'cp42-mid',
        'cp42-late',
        'cp42-flowering',
        'monarch-milkweed',
        'grass-share',
        'height-spread',
      ]),
      rule: z.string(),
      applies: z.boolean(),
      met: z.boolean(),
      detail: z.string(),
      source: z.string(),
    }),
  ),
  notices: z.array(z.string()),
}) satisfies z.ZodType<PaletteResult>;

export const mixQuantitySchema = z.object({
  slug: z.string(),
  plants: z.number().int(),
  spacingIn: z.number(),
  spacingCm: z.number(),
  areaSqFt: z.number(),
  areaSqM: z.number(),
  seedsToSow: z.number().int(),
  seedWeight: z.object({ grams: z.number(), ounces: z.number() }).nullable(),
}) satisfies z.ZodType<MixQuantity>;

export const mixResponseSchema = z.object({
  site: siteSchema,
  palette: paletteResultSchema,
  species: z.record(z.string(), speciesSummarySchema),
  quantities: z.array(mixQuantitySchema),
  lossFactor: z.number(),
  totalFootprintSqFt: z.number(),
  seeding: z
    .array(
      z.object({
        slug: z.string(),
        seedsPerSqFt: z.number(),
        seedsPerSqM: z.number(),
        seed: z.object({ grams: z.number(), ounces: z.number(), pounds: z.number() }).nullable(),
      }),
    )
    .nullable(),
}) satisfies z.ZodType<MixResponse>;

export const alternativesResponseSchema = z.object({
  alternatives: z.array(
    z.object({
      slug: z.string(),
      objectiveChange: z.number(),
      score: z.number(),
      parts: z.array(scorePartSchema),
      species: speciesSummarySchema,
    }),
  ),
}) satisfies z.ZodType<AlternativesResponse>;

export const savedMixSchema = z.object({
  id: z.string(),
  name: z.string(),
  request: paletteRequestSchema,
  chosen: z.array(z.string()),
  ownerFirstName: z.string().regex(/^\S*$/, 'must be a first name only'),
  createdAt: isoDateTime,
}) satisfies z.ZodType<SavedMix, unknown>;

const calendarEventSchema = z.object({
  date: isoDate,
  kind: z.enum(CALENDAR_EVENT_KINDS),
  title: z.string(),
  detail: z.string(),
  speciesSlug: z.string().nullable(),
  method: z.enum(SOWING_METHODS).optional(),
});
const calendarWarningSchema = z.object({
  kind: z.enum(CALENDAR_WARNING_KINDS),
  speciesSlug: z.string(),
  days: z.number().optional(),
  message: z.string(),
  method: z.enum(SOWING_METHODS).optional(),
});
export const sowingCalendarSchema = z.object({
  events: z.array(calendarEventSchema),
  warnings: z.array(calendarWarningSchema),
  schedules: z.array(
    z.object({
      speciesSlug: z.string(),
      method: z.enum(SOWING_METHODS),
      sowDate: isoDate,
      readyDate: isoDate.nullable(),
      events: z.array(calendarEventSchema),
      warnings: z.array(calendarWarningSchema),
    }),
  ),
}) satisfies z.ZodType<SowingCalendar>;

/** The error every route may answer: 400s name each bad field. */
export const apiErrorSchema = z.object({
  statusCode: z.number().int(),
  error: z.string(),
  message: z.string(),
  fields: z.array(z.object({ field: z.string(), message: z.string() })).optional(),
  rows: z.array(z.object({ row: z.number().int(), field: z.string(), message: z.string() })).optional(),
  waitlist: z.object({ speciesSlugs: z.array(z.string()), path: z.string() }).optional(),
});

export const outboxMessageSchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  kind: z.string(),
  groupId: z.string().nullable(),
  receivedAt: z.string(),
}) satisfies z.ZodType<OutboxMessage>;

export const invitationSchema = z.object({
  id: z.string(),
  email: z.string(),
  role: z.enum(GROUP_ROLES),
  expiresAt: z.string(),
  acceptedAt: z.string().nullable(),
}) satisfies z.ZodType<Invitation>;

export const invitationPreviewSchema = z.object({
  groupSlug: z.string(),
  groupName: z.string(),
  town: z.string(),
  state: z.string(),
  role: z.enum(GROUP_ROLES),
  email: z.string(),
  accountExists: z.boolean(),
  expiresAt: z.string(),
}) satisfies z.ZodType<InvitationPreview>;

const seasonTargetAnswer = z.object({
  slug: z.string(),
  targetPlants: z.number().int(),
  germinationRatePct: z.number().optional(),
  commonName: z.string(),
  scientificName: z.string(),
});

export const seasonSchema = z.object({
  groupSlug: z.string(),
  groupName: z.string(),
  place: z.object({ town: z.string(), state: z.string(), ecoregionCode: z.string().nullable() }),
  year: z.number().int(),
  lastFrost: z.string(),
  plantShareDate: z.string(),
  methods: z.array(z.enum(SOWING_METHODS)),
  milkweedShare: z.number(),
  lossFactor: z.number(),
  seedsPerPacket: z.number(),
  targets: z.array(seasonTargetAnswer),
  updatedAt: z.string(),
}) satisfies z.ZodType<Season>;

export const shareListSchema = z.object({
  ecoregionCode: z.string(),
  state: z.string(),
  methods: z.array(z.enum(SOWING_METHODS)),
  milkweedShare: z.number(),
  totalPlants: z.number(),
  proposals: z.array(
    z.object({
      slug: z.string(),
      commonName: z.string(),
      scientificName: z.string(),
      isMilkweed: z.boolean(),
      layer: z.enum(['herbaceous', 'woody']),
      bloomPeriods: z.array(z.enum(BLOOM_PERIODS)),
      sunOptimum: z.array(z.enum(SUN_LEVELS)),
      moistureOptimum: z.array(z.enum(MOISTURE_LEVELS)),
      suggestedPlants: z.number(),
      why: z.array(z.string()),
    }),
  ),
  notes: z.array(z.string()),
}) satisfies z.ZodType<ShareList>;

export const seasonSeedListSchema = z.object({
  groupSlug: z.string(),
  year: z.number().int(),
  lossFactor: z.number(),
  seedsPerPacket: z.number(),
  rows: z.array(
    z.object({
      slug: z.string(),
      commonName: z.string(),
      scientificName: z.string(),
      targetPlants: z.number(),
      germinationRatePct: z.number(),
      germinationFrom: z.enum(['record', 'yours']),
      lossFactor: z.number(),
      seedsToSow: z.number(),
      seedsPerPound: z.number().nullable(),
      grams: z.number().nullable(),
      ounces: z.number().nullable(),
      packets: z.number(),
      buyBy: z.enum(['packets', 'weight']),
      collectLocally: z.boolean(),
      collectNotes: z.array(z.string()),
      neverCollectWild: z.boolean(),
      cautions: z.array(z.object({ kind: z.enum(CAUTION_KINDS), title: z.string(), text: z.string() })),
    }),
  ),
  totals: z.object({
    targetPlants: z.number(),
    seedsToSow: z.number(),
    grams: z.number(),
    ounces: z.number(),
    packets: z.number(),
  }),
  cautions: z.array(z.string()),
}) satisfies z.ZodType<SeedList & { groupSlug: string; year: number }>;
