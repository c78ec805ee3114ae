import { emailSchema, type Moisture, type Sun } from '@homeground/shared';
import { z } from 'zod';

// Provisional: the plant-share contract as the web expects it, until the shared schemas land.

export type ShareStatus = 'draft' | 'open' | 'paused' | 'closed';

export interface ShareCaution {
  kind: string;
  title: string;
  text: string;
}

export interface ShareSpecies {
  slug: string;
  commonName: string;
  scientificName: string;
  sun: Sun[];
  moisture: Moisture[];
  heightMinCm: number;
  heightMaxCm: number;
  bloomMonths: number[];
  isMilkweed: boolean;
  wildlife: string[];
  cautions: ShareCaution[];
  stock: number;
  left: number;
}

export interface ShareSlot {
  id: string;
  start: string;
  end: string;
  capacity: number;
  left: number;
}

export interface PublicShare {
  id: string;
  groupSlug: string;
  groupName: string;
  date: string;
  place: string;
  whatToBring: string;
  status: ShareStatus;
  limitPerSpecies: number;
  limitTotal: number;
  slots: ShareSlot[];
  species: ShareSpecies[];
}

export interface FitResult {
  ranked: { slug: string; why: string[] }[];
  notSuited: { slug: string; why: string }[];
}

export interface ReservationItem {
  slug: string;
  count: number;
}

export const reservationRequestSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter your name').max(120),
    email: emailSchema,
    zip: z.string().regex(/^\d{5}$/, 'Enter a 5-digit ZIP code'),
    slotId: z.string().min(1, 'Choose a pickup slot'),
    items: z.array(z.object({ slug: z.string(), count: z.number().int().min(1).max(50) })).min(1, 'Choose plants'),
  })
  .strict();
export type ReservationRequest = z.infer<typeof reservationRequestSchema>;

export interface Reservation {
  token: string;
  groupSlug: string;
  groupName: string;
  date: string;
  place: string;
  whatToBring: string;
  name: string;
  email: string;
  slot: ShareSlot;
  items: (ReservationItem & { commonName: string; careSheet: string[] })[];
  status: 'confirmed' | 'cancelled' | 'checked-in' | 'no-show';
}
