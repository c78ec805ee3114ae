import type { TFunction } from 'i18next';
import type { MixQuantity } from '@homeground/shared';
import type { Formatters } from '../../../lib/i18n/index.js';

/** Two significant figures, as seed weights are estimates: 0.043 g, 1.2 g, 15 g. */
function sig(n: number): number {
  return n === 0 ? 0 : Number(n.toPrecision(2));
}

/** One species' quantities as the table and the cards show them, in the page's language and number style. */
export interface QuantityWords {
  plants: string;
  spacing: string;
  seeds: string;
  weight: string;
}

export function quantityWords(q: MixQuantity | undefined, t: TFunction<'mix'>, f: Formatters): QuantityWords {
  if (!q) return { plants: t('quantity.notWorkedOut'), spacing: '—', seeds: '—', weight: '—' };
  return {
    plants: t('quantity.plants', { count: q.plants, number: f.number(q.plants) }),
    spacing: f.spacing(q.spacingIn),
    seeds: t('quantity.seeds', { count: q.seedsToSow, number: f.number(q.seedsToSow) }),
    weight: q.seedWeight
      ? t('quantity.weight', {
          grams: f.number(sig(q.seedWeight.grams), { maximumSignificantDigits: 2 }),
          ounces: f.number(sig(q.seedWeight.ounces), { maximumSignificantDigits: 2 }),
        })
      : t('quantity.weightUnknown'),
  };
}
