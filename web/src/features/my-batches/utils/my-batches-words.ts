import type { Batch } from '@homeground/shared';
import type { TFunction } from 'i18next';

/** "50 plants in 5 covered containers", in the page's language (the batches catalogue). */
export function plantsInUnits(t: TFunction<'batches'>, batch: Pick<Batch, 'plants' | 'units' | 'unit'>): string {
  return t('batch.plantsInUnits', {
    plants: batch.plants,
    count: batch.units,
    unit: t(`units.${batch.unit}`, { count: 1 }),
    units: t(`units.${batch.unit}`, { count: batch.units }),
  });
}

/** "Winter sowing in covered containers", capitalised, for a batch heading. */
export function capitalise(phrase: string): string {
  return phrase.charAt(0).toUpperCase() + phrase.slice(1);
}

/** A short day for steps and the log: "Sat, Jun 12" / "sáb, 12 jun"; a calendar day, never shifted. */
export const SHORT_DAY: Intl.DateTimeFormatOptions = { weekday: 'short', month: 'short', day: 'numeric' };

/** Today on the grower's own calendar, as YYYY-MM-DD. */
export function localToday(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
