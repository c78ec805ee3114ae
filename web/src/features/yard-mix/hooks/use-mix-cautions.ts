import { type Caution, CAUTION_WORDS, type SpeciesSummary } from '@homeground/shared';
import { useQueries } from '@tanstack/react-query';
import { speciesDetailQueryOptions } from '../../../api/species/species.queries.js';

export interface SpeciesCaution {
  kind: Caution['kind'];
  text: string;
}

/**
 * The calm, specific caution sentences of each species in the mix. The list answer carries only
 * the kinds, so the species records are fetched for the few species that have any.
 */
export function useMixCautions(species: readonly SpeciesSummary[]): Record<string, SpeciesCaution[]> {
  const withCautions = species.filter((s) => s.cautionKinds.length > 0);
  const details = useQueries({ queries: withCautions.map((s) => speciesDetailQueryOptions(s.slug)) });
  const out: Record<string, SpeciesCaution[]> = {};
  withCautions.forEach((s, i) => {
    const record = details[i]?.data;
    out[s.slug] = record
      ? record.cautions.map((c) => ({ kind: c.kind, text: c.text }))
      : s.cautionKinds.map((kind) => ({ kind, text: CAUTION_WORDS[kind].sentence }));
  });
  return out;
}
