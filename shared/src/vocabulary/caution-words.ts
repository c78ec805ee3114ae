import type { CAUTION_KINDS } from '../types/species.js';

export type CautionKind = (typeof CAUTION_KINDS)[number];

export interface CautionWords {
  /** Short heading; the record's own calm, specific sentence follows it. */
  title: string;
  /** A general sentence for when the record's own is not at hand (e.g. a list row). */
  sentence: string;
}

/** One heading and one fallback sentence per caution kind, on cards, pages, tables and the mix. */
export const CAUTION_WORDS = {
  'toxic-if-eaten': { title: 'Toxic if eaten', sentence: 'Poisonous if eaten.' },
  'sap-irritant': { title: 'Irritating sap', sentence: 'Its sap can irritate skin and eyes.' },
  'skin-irritant': { title: 'Irritates skin', sentence: 'Can irritate skin; wear gloves.' },
  'eye-irritant': { title: 'Irritates eyes', sentence: 'Can irritate eyes.' },
  pets: { title: 'Harmful to pets', sentence: 'Harmful to pets that chew it.' },
  livestock: { title: 'Harmful to livestock', sentence: 'Harmful to grazing animals.' },
  'aggressive-spreader': { title: 'Spreads fast', sentence: 'Spreads fast and can take over a small bed.' },
  'look-alike': { title: 'Has a look-alike', sentence: 'Has a look-alike: check the label when you buy.' },
  protected: {
    title: 'Protected species',
    sentence: 'Protected in some states: grow from bought seed, never dig from the wild.',
  },
  thorns: { title: 'Thorns', sentence: 'Has thorns or prickles.' },
  regulated: {
    title: 'Restricted in some states',
    sentence: "Some states restrict planting it: check your state's rules before you buy or plant.",
  },
} as const satisfies Record<CautionKind, CautionWords>;

/** ['pets', 'thorns'] → "harmful to pets, thorns": a compact list for a row or reminder. */
export function cautionList(kinds: readonly CautionKind[]): string {
  return kinds.map((k) => CAUTION_WORDS[k].title.toLowerCase()).join(', ');
}
