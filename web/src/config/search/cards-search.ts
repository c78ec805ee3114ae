import { slugList } from './query-values.js';

/**
 * What the cards-and-labels page prints: `?species=slug1,slug2` (from a species page or a yard mix)
 * and/or `?mix=<saved mix id>`, whose species join the list once they load.
 */
export interface CardsSelection {
  species: string[];
  mix?: string;
}

export function parseCardsSelection(params: URLSearchParams): CardsSelection {
  const mix = params.get('mix');
  return { species: slugList(params.get('species')), ...(mix ? { mix } : {}) };
}

export function cardsSelectionToSearchParams(selection: Partial<CardsSelection>): URLSearchParams {
  const out = new URLSearchParams();
  if (selection.species && selection.species.length > 0) out.set('species', selection.species.join(','));
  if (selection.mix) out.set('mix', selection.mix);
  return out;
}
