import {
  type EditShareRequest,
  householdLimitsSchema,
  isoDateSchema,
  MAX_SLOTS,
  type OpenShareRequest,
  pickupSlotRequestSchema,
  sharePlaceSchema,
  whatToBringSchema,
} from '@homeground/shared';
import { z } from 'zod';
import { slotTime } from './slot-time.js';

/** A number typed into a text box: empty is "missing", anything else goes to the shared rule. */
const typedNumber = (rule: z.ZodNumber) =>
  z.preprocess((v) => (v === '' ? undefined : Number(v)), z.number({ error: 'must be a number' }).pipe(rule));

const limits = householdLimitsSchema.shape;

/**
 * The share's day, place and limits as text boxes, each checked by the shared request schema's own
 * rule for that field, so the form says what the API would (`toOpenShare` builds the body).
 */
export const shareSettingsSchema = z
  .object({
    date: isoDateSchema,
    placeName: sharePlaceSchema.shape.name,
    address: sharePlaceSchema.shape.address,
    directions: sharePlaceSchema.shape.directions,
    perSpecies: typedNumber(limits.perSpecies),
    total: typedNumber(limits.total),
    whatToBring: whatToBringSchema,
  })
  .refine((v) => v.total >= v.perSpecies, { message: 'must be at least the limit per species', path: ['total'] });
export type ShareSettings = z.output<typeof shareSettingsSchema>;

/** One pickup slot row as typed: clock times on the share's date and a number of households. */
export interface SlotRow {
  start: string;
  end: string;
  capacity: string;
}

export type SlotRowErrors = Partial<Record<keyof SlotRow, string>>;

/** The messages `checkSlots` gives, in the page's language; `say` words a shared schema's message the same way. */
export interface SlotCheckWords {
  none: string;
  tooMany: string;
  start: string;
  end: string;
  capacity: string;
  say: (message: string) => string;
}

/** The slot rows as the API's slots, or each bad row's messages (field by field) and nothing else. */
export function checkSlots(
  date: string,
  rows: readonly SlotRow[],
  words: SlotCheckWords,
): { slots: OpenShareRequest['slots'] } | { errors: SlotRowErrors[]; message?: string } {
  if (rows.length === 0) return { errors: [], message: words.none };
  if (rows.length > MAX_SLOTS) return { errors: [], message: words.tooMany };
  const slots: OpenShareRequest['slots'] = [];
  const errors: SlotRowErrors[] = rows.map((row) => {
    const start = slotTime(date, row.start);
    const end = slotTime(date, row.end);
    const out: SlotRowErrors = {};
    if (!start) out.start = words.start;
    if (!end) out.end = words.end;
    const parsed = pickupSlotRequestSchema.safeParse({
      start: start ?? '',
      end: end ?? '',
      capacity: row.capacity.trim() === '' ? Number.NaN : Number(row.capacity),
    });
    if (parsed.success) slots.push(parsed.data);
    else
      for (const issue of parsed.error.issues) {
        const key = issue.path[0] as keyof SlotRow;
        const text = key === 'capacity' && row.capacity.trim() === '' ? words.capacity : words.say(issue.message);
        out[key] ??= text.charAt(0).toUpperCase() + text.slice(1);
      }
    return out;
  });
  return errors.some((e) => Object.keys(e).length > 0) ? { errors } : { slots };
}

/** The open-share body from the checked settings and slots; stock is left to the API (the season's ready counts). */
export function toOpenShare(settings: ShareSettings, slots: OpenShareRequest['slots']): OpenShareRequest {
  const directions = settings.directions?.trim();
  return {
    date: settings.date,
    place: { name: settings.placeName, address: settings.address, ...(directions ? { directions } : {}) },
    slots,
    limits: { perSpecies: settings.perSpecies, total: settings.total },
    ...(settings.whatToBring ? { whatToBring: settings.whatToBring } : {}),
  };
}

/** The edit body from the checked settings: every field is sent, so an emptied "what to bring" clears it. */
export function toEditShare(settings: ShareSettings): EditShareRequest {
  const directions = settings.directions?.trim();
  return {
    date: settings.date,
    place: { name: settings.placeName, address: settings.address, ...(directions ? { directions } : {}) },
    limits: { perSpecies: settings.perSpecies, total: settings.total },
    whatToBring: settings.whatToBring,
  };
}
