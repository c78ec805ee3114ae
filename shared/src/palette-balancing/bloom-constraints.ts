import { BLOOM_PERIODS, type BloomPeriod, type PaletteConstraint } from '../types/recommendation.js';
import { joinWords } from '../vocabulary/join-words.js';
import { monthName } from '../vocabulary/months.js';
import { periodMonths } from '../scoring/bloom-periods.js';
import type { PaletteItem } from './palette-item.js';
import { groundWords, lostOut, names, onlyAvailable, type ConstraintInput } from './constraint-input.js';
import { OBJECTIVE_WEIGHTS, grassTargets } from './objective-weights.js';

/** CP42 rules (CP42-IN, CHECK-VALUES §3, R): ≥ 3 flowering species per bloom period, ≥ 9 in all. */
const CP42 = 'nrcs-cp42-indiana-2012';
const PER_PERIOD = OBJECTIVE_WEIGHTS.periodTarget;
const FLOWERING = OBJECTIVE_WEIGHTS.floweringTarget;

const PERIOD: Record<BloomPeriod, { words: string; part: string; one: string; many: string }> = {
  early: { words: 'April to mid-June', part: 'Spring', one: 'early bloomer', many: 'early bloomers' },
  mid: { words: 'mid-June to July', part: 'Early summer', one: 'midsummer bloomer', many: 'midsummer bloomers' },
  late: { words: 'August to October', part: 'Late summer and fall', one: 'late bloomer', many: 'late bloomers' },
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
  const has = inMix.length === 0 ? 'The mix has none' : `The mix has ${inMix.length}: ${joinWords(names(inMix))}`;
  const thinWords = thin.map((m) => `${monthName(m)} has ${inFlower(input.chosen, m).length}`);
  let detail =
    thin.length > 0 && inMix.length >= PER_PERIOD ? `${has}, but ${joinWords(thinWords)} in flower.` : `${has}.`;
  if (!met && available < PER_PERIOD) {
    const only = onlyAvailable(available, p.one, p.many, groundWords(input));
    detail = `${has}. ${only}; a species from another part of the season may take its place.`;
  } else if (!met && inMix.length < PER_PERIOD) {
    detail = `${has}. ${lostOut(input, `${available - inMix.length} more ${p.many} suit your ground but`)}`;
  } else if (!met) {
    detail += ' Keep or add a species that flowers then, or choose a larger mix.';
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
  let detail = `The mix has ${inMix} flowering species.`;
  if (!met && input.size < FLOWERING) {
    detail += ` A mix of ${input.size} species cannot hold the ${FLOWERING} kinds of flowers of a full mix; choose ${FLOWERING} or more species to meet it.`;
  } else if (!met && input.size - grassTargets(input.size).min < FLOWERING && available >= FLOWERING) {
    const places = input.size - grassTargets(input.size).min;
    detail += ` Grasses and sedges take their share of a ${input.size}-species mix, leaving about ${places} places for flowers; choose 11 or more species to have both.`;
  } else if (!met && available < FLOWERING) {
    detail += ` ${onlyAvailable(available, 'flowering species', 'flowering species', groundWords(input))}.`;
  } else if (!met) {
    detail += ` ${lostOut(input, `${available - inMix} more flowering species suit your ground but`)}`;
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
