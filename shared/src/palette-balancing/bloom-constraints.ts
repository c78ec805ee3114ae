import { BLOOM_PERIODS, type BloomPeriod, type PaletteConstraint } from '../types/recommendation.js';
import { wordsFor } from '../vocabulary/locale/words-for.js';
import { periodMonths } from '../scoring/bloom-periods.js';
import type { PaletteItem } from './palette-item.js';
import { groundWords, namesOf, wordsOf, type ConstraintInput } from './constraint-input.js';
import { OBJECTIVE_WEIGHTS, grassTargets } from './objective-weights.js';

/** CP42 rules (CP42-IN, CHECK-VALUES §3, R): ≥ 3 flowering species per bloom period, ≥ 9 in all. */
const CP42 = 'nrcs-cp42-indiana-2012';
const PER_PERIOD = OBJECTIVE_WEIGHTS.periodTarget;
const FLOWERING = OBJECTIVE_WEIGHTS.floweringTarget;

// The rule's headline stays English here: reasons-in.ts says it again in the reader's language.
const PERIOD: Record<BloomPeriod, { words: string; part: string }> = {
  early: { words: 'April to mid-June', part: 'Spring' },
  mid: { words: 'mid-June to July', part: 'Early summer' },
  late: { words: 'August to October', part: 'Late summer and fall' },
};

/** Months of a period in the bloom chart's sense (whole months; June belongs to both early and mid). */
const monthsOf = (period: BloomPeriod) => periodMonths(period);

/** Species of the mix in flower in a month (the bloom chart's count). */
function inFlower(items: readonly PaletteItem[], month: number): PaletteItem[] {
  return items.filter((i) => i.flowering && (i.months ?? []).includes(month));
}

/**
 * A part of the season is met when every one of its months has at least 3 species in flower: the
 * bloom chart shows months, so a rule met on the period's total while September had one species in
 * flower would contradict it. (CP42 counts species per period; counting per month is stricter.)
 */
function periodConstraint(input: ConstraintInput, period: BloomPeriod): PaletteConstraint {
  const p = PERIOD[period];
  const inMix = input.chosen.filter((i) => i.periods.includes(period));
  // Counted, not listed: the candidates may be 10,000.
  let available = 0;
  for (const i of input.candidates) if (i.periods.includes(period)) available++;
  const thin = monthsOf(period).filter((m) => inFlower(input.chosen, m).length < PER_PERIOD);
  const met = inMix.length >= PER_PERIOD && thin.length === 0;
  const w = wordsOf(input);
  const list = namesOf(input, inMix);
  const thinWords = wordsFor(input.locale ?? 'en').join(
    thin.map((m) => w.monthHas(m, inFlower(input.chosen, m).length)),
  );
  let detail: string;
  if (!met && available < PER_PERIOD) {
    detail = `${w.mixHas(inMix.length, list)} ${w.onlyAvailableInPeriod(period, available, groundWords(input))}`;
  } else if (!met && inMix.length < PER_PERIOD) {
    const lost = w.lostOut(period, available - inMix.length, input.size, input.locked.length);
    detail = `${w.mixHas(inMix.length, list)} ${lost}`;
  } else {
    const has =
      thin.length > 0 && inMix.length >= PER_PERIOD
        ? w.mixHasButThin(inMix.length, list, thinWords)
        : w.mixHas(inMix.length, list);
    detail = met ? has : `${has} ${w.keepOrAddBloomer}`;
  }
  return {
    id: `cp42-${period}`,
    rule: `${p.part} (${p.words}): at least ${PER_PERIOD} species in flower every month, so something is in flower from spring to frost`,
    applies: true,
    met,
    detail,
    source: CP42,
  };
}

function floweringConstraint(input: ConstraintInput): PaletteConstraint {
  const inMix = input.chosen.filter((i) => i.flowering).length;
  let available = 0;
  for (const i of input.candidates) if (i.flowering) available++;
  const met = inMix >= FLOWERING;
  const w = wordsOf(input);
  const has = w.floweringCount(inMix);
  let detail = has;
  if (!met && input.size < FLOWERING) {
    detail = `${has} ${w.tooSmallForFlowers(input.size, FLOWERING)}`;
  } else if (!met && input.size - grassTargets(input.size).min < FLOWERING && available >= FLOWERING) {
    detail = `${has} ${w.grassesTakeShare(input.size, input.size - grassTargets(input.size).min)}`;
  } else if (!met && available < FLOWERING) {
    detail = `${has} ${w.onlyAvailable('flowering', available, groundWords(input))}`;
  } else if (!met) {
    detail = `${has} ${w.lostOut('flowering', available - inMix, input.size, input.locked.length)}`;
  }
  return {
    id: 'cp42-flowering',
    rule: `At least ${FLOWERING} kinds of flowers (wildflowers, legumes, shrubs) in a full mix`,
    applies: true,
    met,
    detail,
    source: CP42,
  };
}

export function bloomConstraints(input: ConstraintInput): PaletteConstraint[] {
  return [...BLOOM_PERIODS.map((p) => periodConstraint(input, p)), floweringConstraint(input)];
}
