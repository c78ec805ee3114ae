/**
 * Seeds sown before a group's reached germination counts as its default: fewer than this and one
 * unlucky tray would set next year's plan (Homeground's rule of thumb, common practice to want a
 * few dozen seeds before trusting a rate).
 */
export const MIN_SEEDS_FOR_REACHED_RATE = 30;

/**
 * Germination a group really reached with a species in past seasons, in whole percent: seedlings
 * logged as come up over seeds logged as sown, across every past batch. Null when too few seeds were
 * sown to say. Next season this becomes the species' default rate (the organiser can still change it).
 */
export function reachedGerminationPct(past: { sown: number; germinated: number }): number | null {
  if (past.sown < MIN_SEEDS_FOR_REACHED_RATE) return null;
  const pct = Math.round((100 * Math.min(past.germinated, past.sown)) / past.sown);
  // The seed list needs a rate of at least 1 % (the targets' schema); nothing came up is still 1 %.
  return Math.max(1, pct);
}
