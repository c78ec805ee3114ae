import { z } from 'zod';
import {
  CAUTION_KINDS,
  FLOWER_COLOURS,
  GROWTH_FORMS,
  MOISTURE_LEVELS,
  SOWING_METHODS,
  SUN_LEVELS,
  type FlowerColour,
  type GrowthForm,
  type Moisture,
  type SowingMethod,
  type Sun,
} from '../types/species.js';
import type { CautionKind } from '../vocabulary/caution-words.js';
import type { PlantLayer } from '../scoring/layers.js';
import { SHARE_STATUSES, type HouseholdLimits, type SharePlace, type ShareStatus } from './requests.js';

/**
 * What the plant-share routes answer: TypeScript types for the code and zod schemas for the OpenAPI
 * document, tied together with `satisfies` so neither can drift. Takers' names and e-mails appear only
 * in the organiser's pickup list and in the taker's own reservation; the report holds counts only.
 */

const isoDateTime = z.string().describe('ISO 8601 date and time');
const isoDate = z.string().describe('calendar date, YYYY-MM-DD');

/** A pickup slot with how many households it still takes. */
export interface PickupSlot {
  id: string;
  start: string;
  end: string;
  capacity: number;
  /** Households with a reservation in the slot (confirmed or picked up). */
  booked: number;
  left: number;
}

/** One species on offer, as the organiser manages it. */
export interface ShareStockLine {
  speciesSlug: string;
  commonName: string;
  scientificName: string;
  /** Plants put on offer so far (initial stock plus what was added). */
  offered: number;
  /** Plants nobody has reserved yet. */
  remaining: number;
  /** Plants on confirmed reservations, not yet picked up. */
  reserved: number;
  /** Plants handed over (picked up or walk-up). */
  given: number;
  /** Plants asked for on the waitlist and not yet offered. */
  waitlisted: number;
}

export const RESERVATION_STATUSES = ['confirmed', 'picked-up', 'no-show', 'cancelled'] as const;
export type ReservationStatus = (typeof RESERVATION_STATUSES)[number];

/** The share as its organisers see it. */
export interface PlantShare {
  id: string;
  groupSlug: string;
  groupName: string;
  seasonYear: number;
  date: string;
  place: SharePlace;
  status: ShareStatus;
  limits: HouseholdLimits;
  /** Days after the share date that takers' names and e-mails are kept. */
  retentionDays: number;
  /** The day names and e-mails are deleted (share date + retention days). */
  personalDataKeptUntil: string;
  slots: PickupSlot[];
  stock: ShareStockLine[];
  households: Record<ReservationStatus, number>;
  walkUps: number;
  /** What takers should bring to pickup, or null when the organiser has not said. */
  whatToBring: string | null;
}

export const WAITLIST_STATUSES = ['waiting', 'offered', 'claimed', 'expired'] as const;
export type WaitlistStatus = (typeof WAITLIST_STATUSES)[number];

/** One household on a species' waitlist, as the group's organisers see it. */
export interface ShareWaitlistEntry {
  /** 1 = first in line, in the order households joined. */
  position: number;
  /** Null once names and e-mails are past the share's retention. */
  name: string | null;
  email: string | null;
  /** Plants asked for. */
  count: number;
  status: WaitlistStatus;
  /** Plants held for the household while an offer stands. */
  held: number;
  /** While offered: when the hold ends (ISO date-time). */
  heldUntil: string | null;
  joinedAt: string;
}

/** The organiser's view of the waitlist, per species, in the order plants are offered. */
export interface ShareWaitlist {
  species: {
    speciesSlug: string;
    commonName: string;
    scientificName: string;
    /** Plants still on offer of the species (usually 0 while people wait). */
    remaining: number;
    entries: ShareWaitlistEntry[];
  }[];
}

/** A caution as the fact cards show it: the kind's heading and the record's own calm sentence. */
export interface ShareCaution {
  kind: CautionKind;
  title: string;
  text: string;
}

/** How a species on offer suits the taker's yard, in words (never a score). */
export const YARD_FITS = ['thrives', 'grows', 'near-miss', 'not-for-this-yard'] as const;
export type YardFit = (typeof YARD_FITS)[number];

export interface ShareSpeciesFit {
  fit: YardFit;
  /** 1 = best for this yard; the list is sorted by it. */
  rank: number;
  /** Why it fits (or does not), in plain sentences. */
  why: string[];
}

/** A species on the public page: its fact-card summary, plants left and cautions. */
export interface ShareSpecies {
  slug: string;
  commonName: string;
  scientificName: string;
  growthForm: GrowthForm;
  heightCm: { min: number; max: number };
  bloomMonths: number[];
  /** E.g. "blooms June to August". */
  bloomWords: string;
  flowerColours: FlowerColour[];
  sun: Sun[];
  moisture: Moisture[];
  isMilkweed: boolean;
  remaining: number;
  wildlife: { caterpillars: string | null; bees: string | null; monarchs: string | null; birds: string | null };
  cautions: ShareCaution[];
  /** Present when the taker gave their sun and moisture. */
  fit: ShareSpeciesFit | null;
}

/** A slot as takers see it (no counts of other people, only whether there is room). */
export interface PublicPickupSlot {
  id: string;
  start: string;
  end: string;
  left: number;
  /** Started already (by the server's clock): it can no longer be chosen. */
  past: boolean;
}

export const SHARE_YARD_SOURCES = ['answers', 'zip', 'mix'] as const;
/** Where the yard came from: the taker's two answers, those with a ZIP, or a saved mix. */
export type ShareYardSource = (typeof SHARE_YARD_SOURCES)[number];

/** The yard "fits my yard" ranked for, and the place it ranked for, in words. */
export interface ShareYard {
  sun: Sun;
  moisture: Moisture;
  from: ShareYardSource;
  /** E.g. "Viroqua, WI, in the Driftless Area (EPA Level III ecoregion 52)"; the group's own place for answers alone. */
  place: string;
  /** The saved mix's name, when the yard came from one. */
  mixName: string | null;
}

/** The public page of a group's open share. */
export interface PublicPlantShare {
  groupSlug: string;
  groupName: string;
  town: string;
  state: string;
  date: string;
  place: SharePlace;
  status: ShareStatus;
  limits: HouseholdLimits;
  slots: PublicPickupSlot[];
  species: ShareSpecies[];
  /** The yard the list is ranked for, when given. */
  yard: ShareYard | null;
  /** General safety words shown under the list; local rules come first. */
  notes: string[];
  /** What takers should bring to pickup, or null when the organiser has not said. */
  whatToBring: string | null;
}

/** One species of a care sheet, in words: sun, moisture, spacing and cautions. */
export interface CareSheetEntry {
  speciesSlug: string;
  commonName: string;
  scientificName: string;
  sun: string;
  moisture: string;
  spacing: string;
  cautions: string[];
}

export interface ReservationLine {
  speciesSlug: string;
  commonName: string;
  scientificName: string;
  count: number;
}

/** A reservation as its taker sees it through the private link. */
export interface TakerReservation {
  id: string;
  status: ReservationStatus;
  name: string;
  email: string;
  zip: string;
  slot: { id: string; start: string; end: string };
  lines: ReservationLine[];
  share: {
    groupSlug: string;
    groupName: string;
    date: string;
    place: SharePlace;
    status: ShareStatus;
    whatToBring: string | null;
  };
  /** True while the share is open and the slot has not started. */
  canChange: boolean;
  careSheet: CareSheetEntry[];
}

/** The answer to a new reservation: the reservation and its private change/cancel link (also e-mailed). */
export interface ReservationCreated extends TakerReservation {
  manageUrl: string;
}

/** What the 409 "all taken" answer offers: the species that ran out, and where to join their waitlist. */
export interface WaitlistOffer {
  speciesSlugs: string[];
  /** The API path to POST a waitlist request to. */
  path: string;
}

export interface WaitlistJoined {
  entries: { speciesSlug: string; commonName: string; count: number; position: number }[];
}

/** A household on the pickup list: names and e-mails are for the group's organisers only. */
export interface PickupHousehold {
  reservationId: string;
  /** Null once the retention period has passed. */
  name: string | null;
  email: string | null;
  zip: string;
  status: ReservationStatus;
  plants: number;
  lines: ReservationLine[];
}

export interface PickupList {
  slot: PickupSlot;
  households: PickupHousehold[];
  totals: {
    households: number;
    plants: number;
    bySpecies: { speciesSlug: string; commonName: string; count: number }[];
  };
}

/** The answer to a check-in: the household, and where released plants went. */
export interface CheckInResult {
  household: PickupHousehold;
  released: { speciesSlug: string; toWaitlist: number; toStock: number }[];
}

export interface WalkUpGift {
  id: string;
  lines: ReservationLine[];
  givenAt: string;
}

/**
 * Germination by method and grower from the batch logs: seeds sown, seedlings up ("germinated") and
 * plants ready. Growers by first name only; counts only.
 */
export interface GerminationReport {
  byMethod: { method: SowingMethod; sown: number; germinated: number; ready: number }[];
  byGrower: { grower: string; sown: number; germinated: number; ready: number }[];
}

/** The season report: counts only, never names, e-mails or full ZIP codes. */
export interface ShareReport {
  groupSlug: string;
  groupName: string;
  seasonYear: number;
  shareDate: string;
  totals: {
    plantsGiven: number;
    households: number;
    walkUps: number;
    milkweedPlants: number;
    species: number;
    targetPlants: number;
    /** Plants given as a share of the season's targets, 0–1 (null without targets). */
    shareOfTargets: number | null;
  };
  bySpecies: {
    speciesSlug: string;
    commonName: string;
    scientificName: string;
    layer: PlantLayer;
    isMilkweed: boolean;
    plantsGiven: number;
    targetPlants: number | null;
  }[];
  /** Plants given that flower in each month, January to December. */
  floweringByMonth: { month: number; monthName: string; species: number; plants: number }[];
  /** Caterpillar host value of what was given, in words, per layer. */
  caterpillarHosts: { layer: PlantLayer; plants: number; words: string[] }[];
  /** Households reached per 3-digit ZIP area (counts only). */
  zipAreas: { area: string; households: number }[];
  germination: GerminationReport | null;
  /** The impact summary in plain sentences. */
  summary: string[];
}

const sharePlaceAnswer = z.object({ name: z.string(), address: z.string(), directions: z.string().optional() });
const limitsAnswer = z.object({ perSpecies: z.number().int(), total: z.number().int() });
const reservationLineAnswer = z.object({
  speciesSlug: z.string(),
  commonName: z.string(),
  scientificName: z.string(),
  count: z.number().int(),
}) satisfies z.ZodType<ReservationLine>;

export const pickupSlotSchema = z.object({
  id: z.string(),
  start: isoDateTime,
  end: isoDateTime,
  capacity: z.number().int(),
  booked: z.number().int(),
  left: z.number().int(),
}) satisfies z.ZodType<PickupSlot>;

export const plantShareSchema = z.object({
  id: z.string(),
  groupSlug: z.string(),
  groupName: z.string(),
  seasonYear: z.number().int(),
  date: isoDate,
  place: sharePlaceAnswer,
  status: z.enum(SHARE_STATUSES),
  limits: limitsAnswer,
  retentionDays: z.number().int(),
  personalDataKeptUntil: isoDate,
  slots: z.array(pickupSlotSchema),
  stock: z.array(
    z.object({
      speciesSlug: z.string(),
      commonName: z.string(),
      scientificName: z.string(),
      offered: z.number().int(),
      remaining: z.number().int(),
      reserved: z.number().int(),
      given: z.number().int(),
      waitlisted: z.number().int(),
    }),
  ),
  households: z.object({
    confirmed: z.number().int(),
    'picked-up': z.number().int(),
    'no-show': z.number().int(),
    cancelled: z.number().int(),
  }),
  walkUps: z.number().int(),
  whatToBring: z.string().nullable(),
}) satisfies z.ZodType<PlantShare>;

export const shareWaitlistSchema = z.object({
  species: z.array(
    z.object({
      speciesSlug: z.string(),
      commonName: z.string(),
      scientificName: z.string(),
      remaining: z.number().int(),
      entries: z.array(
        z.object({
          position: z.number().int(),
          name: z.string().nullable(),
          email: z.string().nullable(),
          count: z.number().int(),
          status: z.enum(WAITLIST_STATUSES),
          held: z.number().int(),
          heldUntil: isoDateTime.nullable(),
          joinedAt: isoDateTime,
        }),
      ),
    }),
  ),
}) satisfies z.ZodType<ShareWaitlist>;

const cautionAnswer = z.object({ kind: z.enum(CAUTION_KINDS), title: z.string(), text: z.string() });

export const publicPlantShareSchema = z.object({
  groupSlug: z.string(),
  groupName: z.string(),
  town: z.string(),
  state: z.string(),
  date: isoDate,
  place: sharePlaceAnswer,
  status: z.enum(SHARE_STATUSES),
  limits: limitsAnswer,
  slots: z.array(
    z.object({ id: z.string(), start: isoDateTime, end: isoDateTime, left: z.number().int(), past: z.boolean() }),
  ),
  species: z.array(
    z.object({
      slug: z.string(),
      commonName: z.string(),
      scientificName: z.string(),
      growthForm: z.enum(GROWTH_FORMS),
      heightCm: z.object({ min: z.number(), max: z.number() }),
      bloomMonths: z.array(z.number().int()),
      bloomWords: z.string(),
      flowerColours: z.array(z.enum(FLOWER_COLOURS)),
      sun: z.array(z.enum(SUN_LEVELS)),
      moisture: z.array(z.enum(MOISTURE_LEVELS)),
      isMilkweed: z.boolean(),
      remaining: z.number().int(),
      wildlife: z.object({
        caterpillars: z.string().nullable(),
        bees: z.string().nullable(),
        monarchs: z.string().nullable(),
        birds: z.string().nullable(),
      }),
      cautions: z.array(cautionAnswer),
      fit: z.object({ fit: z.enum(YARD_FITS), rank: z.number().int(), why: z.array(z.string()) }).nullable(),
    }),
  ),
  yard: z
    .object({
      sun: z.enum(SUN_LEVELS),
      moisture: z.enum(MOISTURE_LEVELS),
      from: z.enum(SHARE_YARD_SOURCES),
      place: z.string(),
      mixName: z.string().nullable(),
    })
    .nullable(),
  notes: z.array(z.string()),
  whatToBring: z.string().nullable(),
}) satisfies z.ZodType<PublicPlantShare>;

const careSheetAnswer = z.object({
  speciesSlug: z.string(),
  commonName: z.string(),
  scientificName: z.string(),
  sun: z.string(),
  moisture: z.string(),
  spacing: z.string(),
  cautions: z.array(z.string()),
}) satisfies z.ZodType<CareSheetEntry>;

export const takerReservationSchema = z.object({
  id: z.string(),
  status: z.enum(RESERVATION_STATUSES),
  name: z.string(),
  email: z.string(),
  zip: z.string(),
  slot: z.object({ id: z.string(), start: isoDateTime, end: isoDateTime }),
  lines: z.array(reservationLineAnswer),
  share: z.object({
    groupSlug: z.string(),
    groupName: z.string(),
    date: isoDate,
    place: sharePlaceAnswer,
    status: z.enum(SHARE_STATUSES),
    whatToBring: z.string().nullable(),
  }),
  canChange: z.boolean(),
  careSheet: z.array(careSheetAnswer),
}) satisfies z.ZodType<TakerReservation>;

export const reservationCreatedSchema = takerReservationSchema.extend({
  manageUrl: z.string().describe('the private change/cancel link, also e-mailed'),
}) satisfies z.ZodType<ReservationCreated>;

export const waitlistOfferSchema = z.object({
  speciesSlugs: z.array(z.string()),
  path: z.string(),
}) satisfies z.ZodType<WaitlistOffer>;

export const waitlistJoinedSchema = z.object({
  entries: z.array(
    z.object({ speciesSlug: z.string(), commonName: z.string(), count: z.number().int(), position: z.number().int() }),
  ),
}) satisfies z.ZodType<WaitlistJoined>;

export const pickupHouseholdSchema = z.object({
  reservationId: z.string(),
  name: z.string().nullable(),
  email: z.string().nullable(),
  zip: z.string(),
  status: z.enum(RESERVATION_STATUSES),
  plants: z.number().int(),
  lines: z.array(reservationLineAnswer),
}) satisfies z.ZodType<PickupHousehold>;

export const pickupListSchema = z.object({
  slot: pickupSlotSchema,
  households: z.array(pickupHouseholdSchema),
  totals: z.object({
    households: z.number().int(),
    plants: z.number().int(),
    bySpecies: z.array(z.object({ speciesSlug: z.string(), commonName: z.string(), count: z.number().int() })),
  }),
}) satisfies z.ZodType<PickupList>;

export const checkInResultSchema = z.object({
  household: pickupHouseholdSchema,
  released: z.array(z.object({ speciesSlug: z.string(), toWaitlist: z.number().int(), toStock: z.number().int() })),
}) satisfies z.ZodType<CheckInResult>;

export const walkUpGiftSchema = z.object({
  id: z.string(),
  lines: z.array(reservationLineAnswer),
  givenAt: isoDateTime,
}) satisfies z.ZodType<WalkUpGift>;

export const shareReportSchema = z.object({
  groupSlug: z.string(),
  groupName: z.string(),
  seasonYear: z.number().int(),
  shareDate: isoDate,
  totals: z.object({
    plantsGiven: z.number().int(),
    households: z.number().int(),
    walkUps: z.number().int(),
    milkweedPlants: z.number().int(),
    species: z.number().int(),
    targetPlants: z.number().int(),
    shareOfTargets: z.number().nullable(),
  }),
  bySpecies: z.array(
    z.object({
      speciesSlug: z.string(),
      commonName: z.string(),
      scientificName: z.string(),
      layer: z.enum(['herbaceous', 'woody']),
      isMilkweed: z.boolean(),
      plantsGiven: z.number().int(),
      targetPlants: z.number().int().nullable(),
    }),
  ),
  floweringByMonth: z.array(
    z.object({ month: z.number().int(), monthName: z.string(), species: z.number().int(), plants: z.number().int() }),
  ),
  caterpillarHosts: z.array(
    z.object({ layer: z.enum(['herbaceous', 'woody']), plants: z.number().int(), words: z.array(z.string()) }),
  ),
  zipAreas: z.array(z.object({ area: z.string(), households: z.number().int() })),
  germination: z
    .object({
      byMethod: z.array(
        z.object({
          method: z.enum(SOWING_METHODS),
          sown: z.number().int(),
          germinated: z.number().int(),
          ready: z.number().int(),
        }),
      ),
      byGrower: z.array(
        z.object({
          grower: z.string(),
          sown: z.number().int(),
          germinated: z.number().int(),
          ready: z.number().int(),
        }),
      ),
    })
    .nullable(),
  summary: z.array(z.string()),
}) satisfies z.ZodType<ShareReport>;

/** What a waitlist offer's private link shows: the plants held, and the slots to choose from. */
export interface WaitlistOfferView {
  speciesSlug: string;
  commonName: string;
  scientificName: string;
  count: number;
  /** `expired`: not claimed in time, the plants went on to the next household. */
  status: 'offered' | 'claimed' | 'expired';
  /** When the hold ends. */
  heldUntil: string | null;
  /** True when the household has a reservation already: the plants join it and no slot is needed. */
  joinsReservation: boolean;
  share: { groupSlug: string; groupName: string; date: string; place: SharePlace; status: ShareStatus };
  slots: PublicPickupSlot[];
}

export const waitlistOfferViewSchema = z.object({
  speciesSlug: z.string(),
  commonName: z.string(),
  scientificName: z.string(),
  count: z.number().int(),
  status: z.enum(['offered', 'claimed', 'expired']),
  heldUntil: isoDateTime.nullable(),
  joinsReservation: z.boolean(),
  share: z.object({
    groupSlug: z.string(),
    groupName: z.string(),
    date: isoDate,
    place: sharePlaceAnswer,
    status: z.enum(SHARE_STATUSES),
  }),
  slots: z.array(
    z.object({ id: z.string(), start: isoDateTime, end: isoDateTime, left: z.number().int(), past: z.boolean() }),
  ),
}) satisfies z.ZodType<WaitlistOfferView>;
