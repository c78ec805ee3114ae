import type { Season, ShareListProposal } from '@homeground/shared';
import { useState } from 'react';
import { type RowErrors, rowsFromSeason, type TargetField, type TargetRow } from '../utils/target-rows.js';

/**
 * The organiser's unsaved target list: edits, removals and proposals added from the share list,
 * kept until "Save targets" replaces the season's list. Messages clear when their row changes.
 */
export function useTargetDraft(season: Season) {
  const [rows, setRows] = useState<TargetRow[]>(() => rowsFromSeason(season.targets));
  const [errors, setErrors] = useState<RowErrors>({});
  const [isDirty, setDirty] = useState(false);

  const change = (index: number, field: Exclude<TargetField, 'slug'>, value: string) => {
    setRows((all) => all.map((r, i) => (i === index ? { ...r, [field]: value } : r)));
    setErrors((e) => ({ ...e, [index]: { ...e[index], [field]: undefined } }));
    setDirty(true);
  };

  /** Removing a row moves the rows below up, so their messages no longer match: clear them all. */
  const remove = (index: number) => {
    setRows((all) => all.filter((_, i) => i !== index));
    setErrors({});
    setDirty(true);
  };

  const add = (p: ShareListProposal) => {
    setRows((all) =>
      all.some((r) => r.slug === p.slug)
        ? all
        : [
            ...all,
            {
              slug: p.slug,
              commonName: p.commonName,
              scientificName: p.scientificName,
              targetPlants: String(p.suggestedPlants),
              germinationRatePct: '',
            },
          ],
    );
    setDirty(true);
  };

  /** After a save, the season as the API answered it. */
  const reset = (saved: Season) => {
    setRows(rowsFromSeason(saved.targets));
    setErrors({});
    setDirty(false);
  };

  const has = (slug: string) => rows.some((r) => r.slug === slug);

  return { rows, errors, isDirty, change, remove, add, reset, has, setErrors };
}

export type TargetDraft = ReturnType<typeof useTargetDraft>;
