import { BLOOM_PERIODS, type BloomPeriod, type PaletteConstraint } from '../types/recommendation.js';
import { joinWords } from '../scoring/plain-words.js';
import { groundWords, lostOut, names, onlyAvailable, type ConstraintInput } from './constraint-input.js';
import { OBJECTIVE_WEIGHTS, grassTargets } from './objective-weights.js';

/** CP42 rules (CP42-IN, CHECK-VALUES §3, R): ≥ 3 flowering species per bloom period, ≥ 9 in all. */
const CP42 = 'nrcs-cp42-indiana-2012';
const PER_PERIOD = OBJECTIVE_WEIGHTS.periodTarget;
const FLOWERING = OBJECTIVE_WEIGHTS.floweringTarget;

const PERIOD: Record<BloomPeriod, { words: string; one: string; many: string }> = {
  early: { words: 'April to mid-June', one: 'early bloomer', many: 'early bloomers' },
  mid: { words: 'mid-June to July', one: 'midsummer bloomer', many: 'midsummer bloomers' },
  late: { words: 'August to October', one: 'late bloomer', many: 'late bloomers' },
};

function periodConstraint(input: ConstraintInput, period: BloomPeriod): PaletteConstraint {
  const p = PERIOD[period];
  const inMix = input.chosen.filter((i) => i.periods.includes(period));
  const available = input.candidates.filter((i) => i.periods.includes(period));
  const met = inMix.length >= PER_PERIOD;
  const has = inMix.length === 0 ? 'The mix has none' : `The mix has ${inMix.length}: ${joinWords(names(inMix))}`;
  let detail = `${has}.`;
  if (!met && available.length < PER_PERIOD) {
    const only = onlyAvailable(available.length, p.one, p.many, groundWords(input));
    detail = `${has}. ${only}; CP42 then allows a species from another period in its place.`;
  } else if (!met) {
    detail = `${has}. ${lostOut(input, `${available.length - inMix.length} more ${p.many} suit your ground but`)}`;
  }
  return {
    id: `cp42-${period}`,
    rule: `At least ${PER_PERIOD} species in flower ${p.words} (CP42 ${period} period)`,
    applies: true,
    met,
    detail,
    source: CP42,
  };
}

function floweringConstraint(input: ConstraintInput): PaletteConstraint {
  const inMix = input.chosen.filter((i) => i.flowering).length;
  const available = input.candidates.filter((i) => i.flowering).length;
  const met = inMix >= FLOWERING;
  let detail = `The mix has ${inMix} flowering species.`;
  if (!met && input.size < FLOWERING) {
    detail += ` A mix of ${input.size} species cannot hold the ${FLOWERING} of a full CP42 mix; choose ${FLOWERING} or more species to meet it.`;
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
    rule: `At least ${FLOWERING} flowering species (wildflowers, legumes, shrubs) in a full mix (CP42)`,
    applies: true,
    met,
    detail,
    source: CP42,
  };
}

export function bloomConstraints(input: ConstraintInput): PaletteConstraint[] {
  return [...BLOOM_PERIODS.map((p) => periodConstraint(input, p)), floweringConstraint(input)];
}
