import {
  batchSplitRequestSchema,
  type BatchSplitProposalAnswer,
  type BatchSplitRequest,
  type SeasonBatches,
} from '@homeground/shared';
import { useState } from 'react';
import { asSentence } from '../../../lib/forms/field-errors.js';

/** One batch as the organiser edits it: plants as typed. */
export interface DraftBatch {
  id?: string;
  growerId: string;
  growerName: string;
  slug: string;
  commonName: string;
  method: BatchSplitRequest['batches'][number]['method'];
  plants: string;
  /** The batch has log entries, so it must stay. */
  logged: boolean;
}

const fromSaved = (answer: SeasonBatches): DraftBatch[] =>
  answer.batches.map((b) => ({
    id: b.id,
    growerId: b.growerId,
    growerName: b.growerName,
    slug: b.slug,
    commonName: b.commonName,
    method: b.method,
    plants: String(b.plants),
    logged: b.log.length > 0,
  }));

/**
 * A proposal as a draft: a proposed batch takes the id of a saved batch of the same grower, species
 * and method (so its log stays), and saved batches with log entries the proposal left out are kept.
 */
export function draftFromProposal(saved: SeasonBatches, proposal: BatchSplitProposalAnswer): DraftBatch[] {
  const current = fromSaved(saved);
  const used = new Set<string>();
  const rows: DraftBatch[] = proposal.batches.map((p) => {
    const same = current.find(
      (c) => c.id && !used.has(c.id) && c.growerId === p.growerId && c.slug === p.slug && c.method === p.method,
    );
    if (same?.id) used.add(same.id);
    return { ...p, id: same?.id, plants: String(p.plants), logged: same?.logged ?? false };
  });
  return [...rows, ...current.filter((c) => c.logged && c.id && !used.has(c.id))];
}

/** The organiser's working copy of the split, its row messages, and the body to save. */
export function useSplitDraft(saved: SeasonBatches) {
  const [rows, setRows] = useState<DraftBatch[]>(() => fromSaved(saved));
  const [errors, setErrors] = useState<Record<number, string>>({});
  const [isDirty, setDirty] = useState(false);
  const update = (next: DraftBatch[]) => {
    setRows(next);
    setErrors({});
    setDirty(true);
  };
  return {
    rows,
    errors,
    isDirty,
    setErrors,
    replace: update,
    change: (i: number, plants: string) => update(rows.map((r, j) => (j === i ? { ...r, plants } : r))),
    remove: (i: number) => update(rows.filter((_, j) => j !== i)),
    reset: (answer: SeasonBatches) => {
      setRows(fromSaved(answer));
      setErrors({});
      setDirty(false);
    },
    /** The body, checked with the shared schema; or messages by row. */
    body(): { body: BatchSplitRequest } | { errors: Record<number, string> } {
      const parsed = batchSplitRequestSchema.safeParse({
        batches: rows.map((r) => ({
          ...(r.id && { id: r.id }),
          growerId: r.growerId,
          slug: r.slug,
          method: r.method,
          plants: /^\d+$/.test(r.plants.trim()) ? Number(r.plants) : Number.NaN,
        })),
      });
      if (parsed.success) return { body: parsed.data };
      return { errors: rowErrors(parsed.error.issues.map((i) => ({ field: i.path.join('.'), message: i.message }))) };
    },
  };
}

/** 400 fields ("batches.3.plants") as messages by row; others under -1. */
export function rowErrors(fields: readonly { field: string; message: string }[]): Record<number, string> {
  const out: Record<number, string> = {};
  for (const f of fields) {
    const m = /^batches\.(\d+)/.exec(f.field);
    const row = m ? Number(m[1]) : -1;
    out[row] ??= asSentence(f.message);
  }
  return out;
}

export type SplitDraft = ReturnType<typeof useSplitDraft>;
