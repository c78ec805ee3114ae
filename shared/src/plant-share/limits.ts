import type { HouseholdLimits, PlantLine } from './requests.js';

/** A broken limit, named by the request field it concerns (as the 400 lists it). */
export interface LimitProblem {
  field: string;
  message: string;
}

/**
 * Checks a household's lines against the share's limits: at most `perSpecies` of any one species and
 * `total` plants in all. Pure: the API answers 400 with these problems and writes nothing.
 */
export function checkHouseholdLimits(lines: readonly PlantLine[], limits: HouseholdLimits): LimitProblem[] {
  const problems: LimitProblem[] = [];
  lines.forEach((l, i) => {
    if (l.count > limits.perSpecies)
      problems.push({
        field: `lines.${i}.count`,
        message: `must be at most ${limits.perSpecies}: each household may take ${limits.perSpecies} of a species`,
      });
  });
  const total = lines.reduce((n, l) => n + l.count, 0);
  if (total > limits.total)
    problems.push({
      field: 'lines',
      message: `ask for ${total} plants, and each household may take ${limits.total} in all`,
    });
  return problems;
}

/** Plants on a list of lines. */
export function plantsOn(lines: readonly { count: number }[]): number {
  return lines.reduce((n, l) => n + l.count, 0);
}
