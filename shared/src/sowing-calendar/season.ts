import { addDays, isoDate, yearOf, type IsoDate } from './calendar-date.js';
import type { SpeciesSchedule } from './calendar-types.js';
import { DURATIONS } from './durations.js';

/** The growing season a schedule is worked out for. */
export interface Season {
  /** Average last spring frost of this season. */
  lastFrost: IsoDate;
  /**
   * First day to plant out or give plants: the average last frost plus the frost watch, since the
   * average date is a 50 % date and frost stays likely for about 2 weeks after it (M, from-memory).
   */
  plantOutFrom: IsoDate;
  /** Today, from the caller: no step is proposed before it unless the grower chose the date. */
  today: IsoDate;
}

/** Why a method cannot be done this season any more, in plain words. */
export interface SeasonPast {
  seasonPast: true;
  reason: string;
}

export type ScheduleOutcome = SpeciesSchedule | SeasonPast;

export const isSeasonPast = (o: ScheduleOutcome): o is SeasonPast => 'seasonPast' in o;

export function seasonOf(lastFrost: IsoDate, today: IsoDate): Season {
  return { lastFrost, plantOutFrom: addDays(lastFrost, DURATIONS.frostWatchDays), today };
}

/** The same month and day a year later (Feb 29 becomes Feb 28). */
export function sameDayNextYear(iso: IsoDate): IsoDate {
  const [m, d] = [Number(iso.slice(5, 7)), Number(iso.slice(8, 10))];
  const y = yearOf(iso) + 1;
  return m === 2 && d === 29 ? isoDate(y, 2, 28) : isoDate(y, m, d);
}

/** The season after `s`, for a plan whose method is past this year. */
export function nextSeason(s: Season): Season {
  return seasonOf(sameDayNextYear(s.lastFrost), s.today);
}
