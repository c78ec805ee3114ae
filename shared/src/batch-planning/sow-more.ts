import { seedsToSow } from '../quantities/seed-count.js';
import type { IsoDate } from '../sowing-calendar/calendar-date.js';
import type { GrowerMethod } from '../types/batch.js';
import type { Species } from '../types/species.js';
import { UNIT_WORDS } from '../vocabulary/batch-words.js';
import { batchSchedule } from './batch-schedule.js';
import { UNIT_OF, unitsFor } from './batch-units.js';

export interface SowMoreInput {
  species: Species;
  /** The method to sow more by (the species' first batch's). */
  method: GrowerMethod;
  /** Plants short of the target at the expected forecast. */
  shortBy: number;
  /** Expected plants ready at the share, for the sentence. */
  expected: number;
  targetPlants: number;
  germinationRatePct: number;
  lossFactor: number;
  lastFrost: IsoDate;
  plantShareDate: IsoDate;
  today: IsoDate;
}

/**
 * A nudge while there is still time: "At this rate about 40 of 120 will be ready: sow about 90 more
 * seeds (9 more covered containers), starting by 2027-03-20." The start date is the sowing calendar's
 * for a batch begun now (its first step: stratifying or sowing); no nudge when such a batch would be
 * ready only after the share, or nothing is short.
 */
export function sowMoreNudge(input: SowMoreInput): string | null {
  if (input.shortBy <= 0) return null;
  const schedule = batchSchedule({
    species: input.species,
    method: input.method,
    lastFrost: input.lastFrost,
    plantShareDate: input.plantShareDate,
    today: input.today,
  });
  if (schedule.readyAfterShare || schedule.readyDate === null) return null;
  const first = schedule.steps.find(
    (s) => s.kind === 'start-warm' || s.kind === 'start-stratifying' || s.kind === 'sow',
  );
  if (!first || first.date < input.today) return null;
  const seeds = seedsToSow(input.shortBy, input.germinationRatePct, input.lossFactor);
  const units = unitsFor(input.method, input.shortBy);
  const unit = UNIT_WORDS[UNIT_OF[input.method]];
  return (
    `At this rate about ${input.expected} of ${input.targetPlants} will be ready: sow about ${seeds} more seeds ` +
    `(${units} more ${units === 1 ? unit.one : unit.many}), starting by ${first.date}.`
  );
}
