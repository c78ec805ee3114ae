import type { LogTotals } from './batch-log.js';

/** Plants expected ready at the plant share, with a low–high range. */
export interface ReadyForecast {
  expected: number;
  low: number;
  high: number;
  /** What the forecast rests on: the plan, seeds sown, seedlings logged, or too late for the share. */
  basis: 'planned' | 'sown' | 'germinated' | 'after-share';
}

export interface BatchForecastInput {
  /** Seeds the batch is meant to sow (from its plants, germination and losses). */
  seedsToSow: number;
  /** Germination of this seed, percent: the organiser's tested rate or the species record's. */
  germinationRatePct: number;
  /** The season's allowance for seedlings lost before planting out, 0–0.9. */
  lossFactor: number;
  totals: LogTotals;
  /** The batch's plants are fit to give only after the share date. */
  readyAfterShare: boolean;
  /** Seedlings may still come up (today is before the batch's pot-up date). */
  stillSprouting: boolean;
}

/**
 * How the forecast is worked out, in words for the dashboard. Homeground's rule of thumb: the
 * usual losses are the season's loss allowance (0.2 by default, common practice); the low end
 * doubles them (a bad year, capped at 90 %), the high end assumes no more losses.
 */
export const FORECAST_METHOD: readonly string[] = [
  'Before sowing: the seeds planned × germination × (1 − the usual losses).',
  'Sown, nothing up yet: the seeds sown × germination × (1 − the usual losses).',
  'Seedlings up: those alive now, less the usual losses still to come; while seed is still sprouting, whichever is higher of that and the sown estimate.',
  'Plants logged ready always count. A batch ready only after the share date counts nothing for the share.',
  'The low end doubles the usual losses (a bad year); the high end assumes no more are lost.',
];

const atMost = (share: number) => Math.min(0.9, share);

/** The ready forecast of one batch at the plant share (see FORECAST_METHOD). */
export function batchForecast(input: BatchForecastInput): ReadyForecast {
  const { totals } = input;
  if (input.readyAfterShare) return { expected: 0, low: 0, high: 0, basis: 'after-share' };
  const g = input.germinationRatePct / 100;
  const usual = input.lossFactor;
  const bad = atMost(2 * usual);
  const fromSeeds = (seeds: number) => ({
    expected: seeds * g * (1 - usual),
    low: seeds * g * (1 - bad),
    high: seeds * g,
  });

  let basis: ReadyForecast['basis'];
  let f: { expected: number; low: number; high: number };
  if (totals.germinated > 0 || (totals.sown > 0 && !input.stillSprouting)) {
    basis = 'germinated';
    // Losses logged so far count against the usual allowance; what is alive now is the ceiling.
    const stillToLose = (share: number) => Math.max(0, totals.germinated * share - totals.lost);
    f = {
      expected: totals.alive - stillToLose(usual),
      low: totals.alive - stillToLose(bad),
      high: totals.alive,
    };
    if (input.stillSprouting) {
      const sown = fromSeeds(totals.sown);
      f = { expected: Math.max(f.expected, sown.expected), low: f.low, high: Math.max(f.high, sown.high) };
    }
  } else if (totals.sown > 0) {
    basis = 'sown';
    f = fromSeeds(totals.sown);
  } else {
    basis = 'planned';
    f = fromSeeds(input.seedsToSow);
  }
  const expected = Math.max(Math.round(f.expected), totals.ready);
  const low = Math.min(Math.max(Math.floor(f.low), totals.ready), expected);
  const high = Math.max(Math.ceil(f.high), expected);
  return { expected: Math.max(0, expected), low: Math.max(0, low), high: Math.max(0, high), basis };
}

/** Sums batch forecasts (a species' batches, or the season's). */
export function sumForecasts(forecasts: readonly ReadyForecast[]): Omit<ReadyForecast, 'basis'> {
  return forecasts.reduce(
    (a, f) => ({ expected: a.expected + f.expected, low: a.low + f.low, high: a.high + f.high }),
    {
      expected: 0,
      low: 0,
      high: 0,
    },
  );
}
