import type { TFunction } from 'i18next';
import {
  isFloweringSpecies,
  MONTH_NUMBERS,
  type MonthNumber,
  type SpeciesSummary,
  type Vocabulary,
} from '@homeground/shared';

/**
 * CP42 bloom periods run from April (early) to October (late) (CP42-IN, via shared
 * bloom-periods.ts); a month there with fewer than 3 flowering species in bloom is a gap.
 */
export const CP42_SEASON_MONTHS: readonly number[] = [4, 5, 6, 7, 8, 9, 10];
export const MIN_IN_BLOOM = 3;

export interface MonthBloom {
  month: number;
  /** Common names of the mix's flowering species (not grasses, sedges or ferns) in bloom. */
  inBloom: string[];
  isInSeason: boolean;
  isGap: boolean;
}

type BloomSpecies = Pick<SpeciesSummary, 'commonName' | 'growthForm' | 'bloomMonths'>;

/** Per month of the year: which flowering species of the mix bloom, and whether the month is a gap. */
export function monthlyBloom(species: readonly BloomSpecies[]): MonthBloom[] {
  return MONTH_NUMBERS.map((month) => {
    const inBloom = species
      .filter((s) => isFloweringSpecies(s) && s.bloomMonths.includes(month))
      .map((s) => s.commonName);
    const isInSeason = CP42_SEASON_MONTHS.includes(month);
    return { month, inBloom, isInSeason, isGap: isInSeason && inBloom.length < MIN_IN_BLOOM };
  });
}

/**
 * The gaps in one or two sentences, for everyone who cannot see the chart's colours and patterns,
 * in the page's language (`t` of the mix catalogue, `words` of the same language).
 */
export function describeGaps(months: readonly MonthBloom[], t: TFunction<'mix'>, words: Vocabulary): string {
  const gaps = months.filter((m) => m.isGap);
  if (gaps.length === 0) return t('bloom.noGaps', { min: MIN_IN_BLOOM });
  const monthName = (m: MonthBloom) => words.month[m.month as MonthNumber].long;
  const list = gaps.map((m) =>
    m.inBloom.length === 0
      ? t('bloom.monthEmpty', { month: monthName(m) })
      : t('bloom.monthFew', { month: monthName(m), count: m.inBloom.length, names: words.join(m.inBloom) }),
  );
  return t('bloom.gaps', { count: gaps.length, min: MIN_IN_BLOOM, list: words.join(list) });
}
