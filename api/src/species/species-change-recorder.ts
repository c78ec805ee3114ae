import { diffSpecies, type Species, type SpeciesChangeKind } from '@homeground/shared';
import type { EntityManager } from 'typeorm';
import { SpeciesChangeRow } from './species-change.entity.js';

/**
 * Writes one history row inside the caller's transaction, so a change and its record in the history
 * land together or not at all. A change that changes nothing leaves no row.
 */
export async function recordChange(
  tx: EntityManager,
  c: {
    kind: SpeciesChangeKind;
    before: Species | null;
    after: Species;
    userId: string | null;
    fileName?: string | null;
    revertOf?: string;
  },
): Promise<void> {
  const changes = diffSpecies(c.before, c.after);
  if (changes.length === 0) return;
  await tx.insert(SpeciesChangeRow, {
    slug: c.after.slug,
    kind: c.kind,
    changedAt: new Date(),
    changedById: c.userId,
    fileName: c.fileName ?? null,
    revertOf: c.revertOf ?? null,
    beforeRecord: c.before,
    afterRecord: c.after,
    changes,
  });
}
