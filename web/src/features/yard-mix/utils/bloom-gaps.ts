import { isFloweringSpecies, MONTH_NUMBERS, monthLong, type SpeciesSummary } from '@homeground/shared';

/** January … December, in the shared vocabulary's words. */
export const MONTH_NAMES: readonly string[] = MONTH_NUMBERS.map(monthLong);

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
  return MONTH_NAMES.map((_, i) => {
    const month = i + 1;
    const inBloom = species
      .filter((s) => isFloweringSpecies(s) && s.bloomMonths.includes(month))
      .map((s) => s.commonName);
    const isInSeason = CP42_SEASON_MONTHS.includes(month);
    return { month, inBloom, isInSeason, isGap: isInSeason && inBloom.length < MIN_IN_BLOOM };
  });
}

function joinWords(words: readonly string[]): string {
  if (words.length <= 1) return words.join('');
  return `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

function gapWords(m: MonthBloom): string {
  const name = MONTH_NAMES[m.month - 1];
  if (m.inBloom.length === 0) return `${name} has no species in flower`;
  return `${name} has only ${m.inBloom.length} (${joinWords(m.inBloom)})`;
}

/** The gaps in one or two sentences, for everyone who cannot see the chart's colours and patterns. */
export function describeGaps(months: readonly MonthBloom[]): string {
  const gaps = months.filter((m) => m.isGap);
  if (gaps.length === 0) {
    return `No gaps: every month from April to October has at least ${MIN_IN_BLOOM} species in flower.`;
  }
  const noun = gaps.length === 1 ? 'gap' : 'gaps';
  return `${gaps.length} ${noun} from April to October, where fewer than ${MIN_IN_BLOOM} species flower: ${joinWords(gaps.map(gapWords))}.`;
}
