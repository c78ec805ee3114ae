import type { SeasonRequest } from '../types/season.js';

/**
 * Season dates the calendar cannot use: a plant share already past (the caller passes today; shared
 * code never reads the clock). The last frost may have passed in a season under way. Returns 400
 * fields, empty when the dates are fine.
 */
export function pastSeasonDateFields(
  season: Pick<SeasonRequest, 'plantShareDate'>,
  today: string,
): { field: string; message: string }[] {
  return season.plantShareDate < today
    ? [{ field: 'plantShareDate', message: `must not be in the past (today is ${today})` }]
    : [];
}
