/**
 * Every duration the sowing calendar uses, with its source key and status (R = read in a source,
 * M = from memory, CP = common practice), as listed in CHECK-VALUES §4.
 */
export const DURATIONS = {
  /** Sow indoors 8 weeks before the average last spring frost; 8–12 weeks is usual (M, from-memory). */
  indoorWeeksBeforeFrost: 8,
  /** Seed sown indoors (after any stratifying) sprouts in about a week at room temperature (M, from-memory). */
  indoorSproutAfterDays: 7,
  /**
   * Soil-block seedlings go out without root disturbance, so they skip the setback of potting up and
   * a transplant shock (CP, common-practice): one week less to a sturdy plant.
   */
  soilBlockDaysSaved: 7,
  /** Indoor sowing is past for the season when plants would be ready after this many days past the frost date (M). */
  indoorLatestReadyAfterFrostDays: 120,
  /**
   * Plants ready a week or more before the share are held outdoors and potted on if roots fill the
   * pot (CP, common-practice); a shorter wait needs no step.
   */
  potOnWhenHeldDays: 7,
  /** Collect pots and trays this many days before the share (CP). */
  collectPotsBeforeShareDays: 14,
  /** Write and set pot labels this many days before the share (CP). */
  labelPotsBeforeShareDays: 3,
  /** Start checking stratifying seed for sprouts 28–35 days in (R, iowa-prairie-network-stratification). */
  checkSproutsAfterDays: 28,
  /** Cold-moist length when a record gives none: ~60 d suits many prairie species (R, iowa-prairie-network-stratification). */
  defaultColdMoistDays: 60,
  /** Pot up under lights once the first true leaves show, about 4 weeks after sowing (CP, common-practice). */
  potUpAfterDays: 28,
  /** Move soil-block seedlings from mini blocks to larger blocks after about 3 weeks (CP, common-practice). */
  potOnBlocksAfterDays: 21,
  /**
   * Hardening off takes 7–14 days (M, from-memory); we plan 10: start 1–2 h/day in shade and add
   * about 1 h a day (R, UF-HO; no key in sources.json yet), which reaches a full day in about 10.
   */
  hardenOffDays: 10,
  /** Seed in outdoor containers sprouts as they warm, about 30 days before last frost (M, from-memory). */
  outdoorSproutBeforeFrostDays: 30,
  /** Split winter-sown clumps into cells about 3 weeks after they sprout, at the first true leaves (CP, common-practice). */
  winterSownPotUpAfterDays: 21,
  /** Split outdoor-pot seedlings into their own pots about 3 weeks after they sprout (CP, common-practice). */
  outdoorPotUpAfterDays: 21,
  /** Vent covered containers on warm days from about 6 weeks before last frost (M, common-practice). */
  ventBeforeFrostDays: 42,
  /** Leave a margin after the cold need is met before spring warmth, in case winter is short (CP). */
  winterSowingMarginDays: 14,
  /** Direct-sow seed that needs no cold once the soil reaches 10–13 °C, ~2 weeks after last frost (M, from-memory). */
  warmSoilAfterFrostDays: 14,
  /** Frost stays possible for about 2 weeks after the average date, which is a 50 % date (M, from-memory). */
  frostWatchDays: 14,
} as const;

/** Calendar windows, as month and day. */
export const WINDOWS = {
  /** Winter sowing outdoors in covered containers: December to February (M, from-memory). */
  winterSowingOpens: { month: 12, day: 1 },
  /** Middle of the winter-sowing window: the default sowing day when the seed's cold need allows. */
  winterSowingDefault: { month: 1, day: 15 },
  /** Outdoor dormant seeding (and fall-sown pots): late November (R, iowa-prairie-network-stratification). */
  dormantSeeding: { month: 11, day: 20 },
  /**
   * Outdoors, winter's cold-moist stratification is counted from the dormant-seeding date: seed sown
   * earlier (fresh seed in late summer) gets its warm-moist days before it.
   */
  outdoorColdStarts: { month: 11, day: 20 },
  /** Frost-seeding still works to the end of January (R, iowa-prairie-network-stratification). */
  frostSeedingCloses: { month: 1, day: 31 },
} as const;
