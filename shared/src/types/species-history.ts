import { z } from 'zod';
import type { FieldChange } from '../catalogue/species-diff.js';

/** How a change came about. */
export const SPECIES_CHANGE_KINDS = ['create', 'edit', 'import', 'revert'] as const;
export type SpeciesChangeKind = (typeof SPECIES_CHANGE_KINDS)[number];

/** One change to a species record, as `GET /api/species/:slug/history` lists it (newest first). */
export interface SpeciesChange {
  id: string;
  slug: string;
  kind: SpeciesChangeKind;
  /** ISO date and time. */
  changedAt: string;
  /** Who made it; null for the catalogue files loaded at start. */
  changedBy: { id: string; displayName: string } | null;
  /** For an import: the uploaded file's name. */
  fileName: string | null;
  /** For a revert: the change it undid. */
  revertOf: string | null;
  changes: FieldChange[];
}

/** `POST /api/species/:slug/history/:changeId/revert` takes an empty object: the change named in the path says it all. */
export const revertChangeRequestSchema = z.object({}).strict();
export type RevertChangeRequest = z.infer<typeof revertChangeRequestSchema>;
