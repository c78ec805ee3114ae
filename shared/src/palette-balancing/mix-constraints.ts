import type { PaletteConstraint } from '../types/recommendation.js';
import { stateName } from '../scoring/plain-words.js';
import { wordsFor } from '../vocabulary/locale/words-for.js';
import { reasonIn } from '../scoring/locale/reasons-in.js';
import { groundWords, namesOf, wordsOf, type ConstraintInput } from './constraint-input.js';
import { grassTargets } from './objective-weights.js';
import type { HeightTier } from './palette-item.js';

/** NRCS E327136Z2: at least one native Asclepias species when monarchs are a goal (R). */
export function milkweedConstraint(input: ConstraintInput): PaletteConstraint {
  const rule = 'At least one native milkweed when monarchs are a goal: their caterpillars eat nothing else';
  const base = { id: 'monarch-milkweed', rule, source: 'nrcs-e327136z2' } as const;
  const w = wordsOf(input);
  const locale = input.locale ?? 'en';
  if (!input.site.goals.includes('monarchs')) {
    return {
      ...base,
      applies: false,
      met: true,
      detail: w.noMonarchGoal,
    };
  }
  const inMix = input.chosen.filter((i) => i.milkweed);
  if (inMix.length > 0) {
    return {
      ...base,
      applies: true,
      met: true,
      detail: w.milkweedsInMix(namesOf(input, inMix)),
    };
  }
  const available = input.candidates.filter((i) => i.milkweed).length;
  let detail: string;
  const withheld = input.protectedMilkweeds ?? [];
  if (available > 0) {
    detail = w.lostOut('milkweed', available, input.size, input.locked.length);
  } else if (withheld.length > 0) {
    detail = w.protectedMilkweeds(withheld.length, wordsFor(locale).join(withheld));
  } else {
    const nearest = input.milkweedNearMisses[0];
    const none = w.noMilkweedInState(groundWords(input), stateName(input.region.state));
    detail = nearest ? `${none} ${w.closestMilkweed(nearest.name, reasonIn(nearest.reason, locale))}` : none;
  }
  return { ...base, applies: true, met: false, detail };
}

/** Grasses and sedges share (Homeground's rule, see grassTargets; common practice). */
export function grassConstraint(input: ConstraintInput): PaletteConstraint {
  const { min, max } = grassTargets(input.size);
  const base = {
    id: 'grass-share',
    rule: `Grasses and sedges: ${min}–${max} of the ${input.size} species`,
    source: 'common-practice',
  } as const;
  if (input.size < 4) {
    const rule = 'Grasses and sedges in mixes of 4 or more species';
    return { ...base, rule, applies: false, met: true, detail: wordsOf(input).smallMixNoGrass };
  }
  const inMix = input.chosen.filter((i) => i.graminoid);
  const available = input.candidates.filter((i) => i.graminoid).length;
  const w = wordsOf(input);
  const list = namesOf(input, inMix);
  if (inMix.length > max) {
    return { ...base, applies: true, met: false, detail: w.mixHasTooMany(inMix.length, list) };
  }
  if (inMix.length >= min) return { ...base, applies: true, met: true, detail: w.mixHas(inMix.length, list) };
  const why =
    available < min
      ? w.onlyAvailable('grass', available, groundWords(input))
      : w.lostOut('grass', available - inMix.length, input.size, input.locked.length);
  return { ...base, applies: true, met: false, detail: `${w.mixHas(inMix.length, list)} ${why}` };
}

const TIERS: HeightTier[] = ['front', 'middle', 'back'];

/** Plants for the front, middle and back of the bed, as far as the candidates allow (Homeground's rule). */
export function heightConstraint(input: ConstraintInput): PaletteConstraint {
  const inMix = TIERS.filter((t) => input.chosen.some((i) => i.tier === t));
  const available = TIERS.filter((t) => input.candidates.some((i) => i.tier === t));
  const target = Math.min(TIERS.length, available.length, input.size);
  const met = inMix.length >= target;
  const w = wordsOf(input);
  const join = wordsFor(input.locale ?? 'en').join;
  const parts = inMix.map((t) =>
    w.tierHas(
      w.tier[t],
      namesOf(
        input,
        input.chosen.filter((i) => i.tier === t),
      ),
    ),
  );
  const sentences = [`${parts.join('; ')}.`];
  const unavailable = TIERS.filter((t) => !available.includes(t));
  if (unavailable.length > 0) {
    sentences.push(w.noPlantForRows(join(unavailable.map((t) => w.tier[t])), input.site.maxHeightCm !== undefined));
  }
  if (!met) {
    const rows = join(available.filter((t) => !inMix.includes(t)).map((t) => w.tierShort[t]));
    sentences.push(w.rowsLostOut(rows, input.size, input.locked.length));
  }
  const detail = sentences.join(' ');
  return {
    id: 'height-spread',
    rule: 'Plants for the front, middle and back of the bed, as far as the species that suit it allow',
    applies: true,
    met,
    detail,
    source: 'common-practice',
  };
}
