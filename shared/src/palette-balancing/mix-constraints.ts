import type { PaletteConstraint } from '../types/recommendation.js';
import { stateName } from '../scoring/plain-words.js';
import { joinWords } from '../vocabulary/join-words.js';
import { groundWords, lostOut, names, onlyAvailable, type ConstraintInput } from './constraint-input.js';
import { grassTargets } from './objective-weights.js';
import type { HeightTier } from './palette-item.js';

/** NRCS E327136Z2: at least one native Asclepias species when monarchs are a goal (R). */
export function milkweedConstraint(input: ConstraintInput): PaletteConstraint {
  const rule = 'At least one native milkweed when monarchs are a goal: their caterpillars eat nothing else';
  const base = { id: 'monarch-milkweed', rule, source: 'nrcs-e327136z2' } as const;
  if (!input.site.goals.includes('monarchs')) {
    return {
      ...base,
      applies: false,
      met: true,
      detail: 'Monarchs are not one of your goals, so no milkweed is needed.',
    };
  }
  const inMix = input.chosen.filter((i) => i.milkweed);
  if (inMix.length > 0) {
    return {
      ...base,
      applies: true,
      met: true,
      detail: `The mix has ${joinWords(names(inMix))}, food for monarch caterpillars.`,
    };
  }
  const available = input.candidates.filter((i) => i.milkweed).length;
  let detail: string;
  const withheld = input.protectedMilkweeds ?? [];
  if (available > 0) {
    detail = lostOut(
      input,
      `${available} native milkweed${available === 1 ? '' : 's'} suit${available === 1 ? 's' : ''} your ground but`,
    );
  } else if (withheld.length > 0) {
    const one = withheld.length === 1;
    detail =
      `${joinWords(withheld)} ${one ? 'suits' : 'suit'} your ground but ${one ? 'is' : 'are'} protected in the wild, so not chosen for you; ` +
      'keep one in the mix to meet this rule, bought from a nursery that propagates it.';
  } else {
    const nearest = input.milkweedNearMisses[0];
    const closest = nearest ? ` The closest is ${nearest.name}: ${nearest.reason}` : '';
    detail = `${onlyAvailable(0, 'milkweed', 'milkweeds', groundWords(input))} in ${stateName(input.region.state)}.${closest}`;
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
    return { ...base, rule, applies: false, met: true, detail: 'A mix this small does not need a grass.' };
  }
  const inMix = input.chosen.filter((i) => i.graminoid);
  const available = input.candidates.filter((i) => i.graminoid).length;
  const has = inMix.length === 0 ? 'The mix has none' : `The mix has ${inMix.length}: ${joinWords(names(inMix))}`;
  if (inMix.length > max) {
    return { ...base, applies: true, met: false, detail: `${has}, which leaves too few places for flowers.` };
  }
  if (inMix.length >= min) return { ...base, applies: true, met: true, detail: `${has}.` };
  const why =
    available < min
      ? `${onlyAvailable(available, 'grass or sedge', 'grasses and sedges', groundWords(input))}.`
      : lostOut(input, `${available - inMix.length} more grasses or sedges suit your ground but`);
  return { ...base, applies: true, met: false, detail: `${has}. ${why}` };
}

const TIER_WORDS: Record<HeightTier, string> = {
  front: 'front (under 2 ft / 60 cm)',
  middle: 'middle (2–4 ft / 60–120 cm)',
  back: 'back (over 4 ft / 120 cm)',
};
const TIERS: HeightTier[] = ['front', 'middle', 'back'];

/** Plants for the front, middle and back of the bed, as far as the candidates allow (Homeground's rule). */
export function heightConstraint(input: ConstraintInput): PaletteConstraint {
  const inMix = TIERS.filter((t) => input.chosen.some((i) => i.tier === t));
  const available = TIERS.filter((t) => input.candidates.some((i) => i.tier === t));
  const target = Math.min(TIERS.length, available.length, input.size);
  const met = inMix.length >= target;
  const parts = inMix.map((t) => `${TIER_WORDS[t]}: ${joinWords(names(input.chosen.filter((i) => i.tier === t)))}`);
  let detail = `${parts.join('; ')}.`;
  const unavailable = TIERS.filter((t) => !available.includes(t));
  if (unavailable.length > 0) {
    const limit = input.site.maxHeightCm !== undefined ? ' or your height limit' : '';
    detail += ` No plant for the ${joinWords(unavailable.map((t) => TIER_WORDS[t]))} row suits your ground${limit}.`;
  }
  if (!met)
    detail += ` ${lostOut(input, `Plants for the ${joinWords(available.filter((t) => !inMix.includes(t)))} row`)}`;
  return {
    id: 'height-spread',
    rule: 'Plants for the front, middle and back of the bed, as far as the species that suit it allow',
    applies: true,
    met,
    detail,
    source: 'common-practice',
  };
}
