import { countOf } from '../scoring/plain-words.js';
import type { BloomPeriod } from '../types/recommendation.js';
import type { PlantLayer } from '../scoring/layers.js';
import type { Species, SowingMethod } from '../types/species.js';
import { joinWords } from '../vocabulary/join-words.js';
import { formatMonths } from '../vocabulary/months.js';
import { sowingMethodsPhrase } from '../vocabulary/seed-words.js';
import { MOISTURE_WORDS, SUN_WORDS } from '../vocabulary/site-words.js';
import { OUTDOOR_WINTER_METHODS, type SeedEase } from './seed-ease.js';

/**
 * The "why" sentences of a share-list proposal (DESIGN.md voice: say why, never a score). Each
 * function returns one sentence or null when it has nothing worth saying.
 */

function germinationWords(pct: number): string {
  return pct >= 60 ? `most good seed comes up (about ${pct} %)` : `about ${pct} % of good seed comes up, so sow extra`;
}

export function easeWords(ease: SeedEase, suits: readonly SowingMethod[]): string {
  const outdoors = suits.filter((m) => OUTDOOR_WINTER_METHODS.includes(m));
  const chill =
    ease.coldDays === 0
      ? 'needs no treatment'
      : outdoors.length > 0
        ? `needs ${ease.coldDays} days of cold-moist stratification, which a winter outdoors gives it (${sowingMethodsPhrase(outdoors)})`
        : `needs ${ease.coldDays} days of cold-moist stratification in the refrigerator first`;
  const germ = germinationWords(ease.germinationRatePct);
  switch (ease.level) {
    case 'easy':
      return `Easy from seed: ${chill}, and ${germ}.`;
    case 'moderate':
      return ease.extraSteps > 0
        ? `Takes one extra step: nick or soak the seed coat before sowing${ease.coldDays > 0 ? `; it then ${chill}` : ''}, and ${germ}.`
        : `Takes patience: ${chill}, and ${germ}.`;
    default:
      return ease.warmDays > 0
        ? `Slow from seed: it needs ${ease.warmDays} days warm and then ${ease.coldDays} days cold, often two winters; ${germ}.`
        : `Slow from seed: ${chill}, and ${germ}.`;
  }
}

export function methodWords(suits: readonly SowingMethod[]): string {
  return `Your growers can raise it by ${sowingMethodsPhrase(suits)}.`;
}

const LAYER_WORDS: Record<PlantLayer, string> = {
  herbaceous: 'wildflowers and grasses',
  woody: 'trees, shrubs and vines',
};

/**
 * Caterpillar value compared within the species' layer among this region's candidates: `rank` is
 * the share of candidates of the layer with a lower genus count (0–1).
 */
export function caterpillarWords(species: Species, layer: PlantLayer, rank: number): string | null {
  const count = species.wildlife.lepidopteraGenusCount;
  if (!count) return null;
  const kinds = countOf(count, 'moth or butterfly species', 'moth and butterfly species');
  if (rank >= 0.9)
    return `One of the best caterpillar plants among ${LAYER_WORDS[layer]} here: its genus hosts ${kinds}.`;
  if (rank >= 0.6) return `A good caterpillar plant among ${LAYER_WORDS[layer]} here: its genus hosts ${kinds}.`;
  return `Its genus hosts the caterpillars of ${kinds}.`;
}

export function wildlifeWords(species: Species): string[] {
  const out: string[] = [];
  if (species.wildlife.monarchHost)
    out.push('Feeds monarch caterpillars, which eat only milkweeds and a few close relatives.');
  if (species.wildlife.pollinators) out.push(species.wildlife.pollinators);
  if (species.wildlife.specialistBees.length > 0)
    out.push(`Specialist bees depend on it: ${joinWords(species.wildlife.specialistBees)}.`);
  if (species.wildlife.birds) out.push(species.wildlife.birds);
  return out;
}

const PERIOD_WORDS: Record<BloomPeriod, string> = { early: 'early', mid: 'midsummer', late: 'late' };

/** `fills` names the periods the list had no flowers in until this species came. */
export function bloomSentence(
  species: Species,
  periods: readonly BloomPeriod[],
  fills: readonly BloomPeriod[],
): string | null {
  if (species.bloomMonths.length === 0 || periods.length === 0) return null;
  const when = `Blooms ${formatMonths(species.bloomMonths)} (${joinWords(periods.map((p) => PERIOD_WORDS[p]))})`;
  if (fills.length === 0) return `${when}.`;
  return `${when}, bringing the list its first ${joinWords(fills.map((p) => PERIOD_WORDS[p]))} flowers.`;
}

/** The yards it suits, from where it thrives. */
export function yardWords(species: Species): string {
  const sun = joinWords(
    species.sunOptimum.map((s) => SUN_WORDS[s]),
    'or',
  );
  const moisture = joinWords(
    species.moistureOptimum.map((m) => MOISTURE_WORDS[m]),
    'or',
  );
  const forWhom =
    species.sunOptimum.includes('shade') ||
    (species.sunOptimum.includes('part') && !species.sunOptimum.includes('full'))
      ? ' for takers with shady yards'
      : species.moistureOptimum.includes('wet') && !species.moistureOptimum.includes('dry')
        ? ' for wet spots and rain gardens'
        : species.moistureOptimum.includes('dry') && !species.moistureOptimum.includes('wet')
          ? ' for dry, sunny spots'
          : '';
  return `Thrives in ${sun} and ${moisture} soil${forWhom}.`;
}

/** Where the seed comes from, from USDA PLANTS' commercial availability. */
export function supplyWords(species: Species): string | null {
  switch (species.commercialAvailability) {
    case 'routine':
      return 'Seed is easy to buy from native seed nurseries.';
    case 'contract-only':
      return 'Seed is mostly grown to order: ask a native seed nursery early, or collect it locally with permission.';
    case 'field-collection-only':
    case 'none-known':
      return "Seed is seldom sold: plan to collect it locally, with the landowner's permission.";
    default:
      return null;
  }
}

export const MILKWEED_WORDS = 'A native milkweed for the monarch share of the plants.';
