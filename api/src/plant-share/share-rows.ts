import type { ReservationStatus, ShareStatus, WordLocale } from '@homeground/shared';

/** Rows of the plant-share tables as SQL reads them (snake_case columns, as in the migration). */

export interface ShareRow {
  id: string;
  group_id: string;
  season_id: string;
  share_date: string;
  place_name: string;
  place_address: string;
  place_directions: string | null;
  status: ShareStatus;
  per_species_limit: number;
  total_limit: number;
  retention_days: number;
  personal_data_purged_at: string | null;
  what_to_bring: string | null;
}

export interface SlotRow {
  id: string;
  share_id: string;
  starts_at: string;
  ends_at: string;
  starts_at_ms: number;
  ends_at_ms: number;
  capacity: number;
  booked: number;
}

export interface StockRow {
  id: string;
  share_id: string;
  slug: string;
  offered: number;
  remaining: number;
  position: number;
}

export interface ReservationRow {
  id: string;
  share_id: string;
  slot_id: string;
  token_hash: string;
  status: ReservationStatus;
  name: string | null;
  email: string | null;
  zip: string;
  created_at: string;
  updated_at: string;
  /** The language the taker used, for their e-mails. */
  locale: WordLocale;
}

export interface LineRow {
  reservation_id: string;
  slug: string;
  count: number;
}

export interface WaitlistRow {
  id: string;
  share_id: string;
  slug: string;
  count: number;
  held: number;
  status: 'waiting' | 'offered' | 'claimed' | 'expired';
  /** While offered: when the hold ends (ms since 1970), after which the plants move on down the list. */
  offered_until: number | null;
  name: string | null;
  email: string | null;
  zip: string;
  seq: number;
  /** The language the household used when joining, for the offer e-mail. */
  locale: WordLocale;
}

export const SHARE_COLUMNS = `id, group_id, season_id, share_date, place_name, place_address, place_directions, status,
  per_species_limit, total_limit, retention_days, personal_data_purged_at, what_to_bring`;
