import type { Caution, SpeciesSummary } from '@homeground/shared';
import { useQueries } from '@tanstack/react-query';
import { speciesDetailQueryOptions } from '../../../api/species/species.queries.js';

/** Short words per caution kind, shown until (or if) the species record with its own sentence arrives. */
export const CAUTION_KIND_WORDS: Record<Caution['kind'], string> = {
  'toxic-if-eaten': 'Poisonous if eaten.',
  'sap-irritant': 'Its sap can irritate skin and eyes.',
  'skin-irritant': 'Can irritate skin; wear gloves.',
  'eye-irritant': 'Can irritate eyes.',
  pets: 'Harmful to pets that chew it.',
  livestock: 'Harmful to grazing animals.',
  'aggressive-spreader': 'Spreads fast and can take over a small bed.',
  'look-alike': 'Has a look-alike: check the label when you buy.',
  protected: 'Protected in some states: grow from bought seed, never dig from the wild.',
  thorns: 'Has thorns or prickles.',
  regulated: 'Some states restrict planting it: check your state’s rules first.',
};

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
      : s.cautionKinds.map((kind) => ({ kind, text: CAUTION_KIND_WORDS[kind] }));
  });
  return out;
}
