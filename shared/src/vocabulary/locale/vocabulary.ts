import type { GlobalRole, GroupRole } from '../../types/auth.js';
import {
  type Germination,
  type Habitat,
  type Moisture,
  type SowingMethod,
  type SoilTexture,
  type Sun,
  type TreatmentStep,
  type FlowerColour,
  type GrowthForm,
  type SourcedField,
} from '../../types/species.js';
import type { CautionKind, CautionWords } from '../caution-words.js';
import type { MonthNumber, MonthWords } from '../months.js';
import type { EcoregionMethod } from '../place-words.js';
import type { DeerResistance, HabitWords, Lifespan, SpreadHabit } from '../plant-words.js';
import type { RoleWords } from '../people-words.js';
import type { SpeciesTag } from '../record-words.js';
import type { SowingMethodWords, TreatmentKind, TreatmentWords } from '../seed-words.js';
import type { PlaceLookup } from '../../types/place.js';

/** The languages Homeground speaks; English is the catalogue's own. */
export const WORD_LOCALES = ['en', 'es'] as const;
export type WordLocale = (typeof WORD_LOCALES)[number];

/**
 * Every word table of one language. Each table is a `Record` over its enum, so a language that misses
 * a value (or a new enum value without its word in every language) does not compile.
 */
export interface WordTables {
  sun: Record<Sun, string>;
  moisture: Record<Moisture, string>;
  soilTexture: Record<SoilTexture, string>;
  habitat: Record<Habitat, string>;
  growthForm: Record<GrowthForm, string>;
  lifespan: Record<Lifespan, string>;
  spreadHabit: Record<SpreadHabit, HabitWords>;
  deerResistance: Record<DeerResistance, HabitWords>;
  flowerColour: Record<FlowerColour, string>;
  caution: Record<CautionKind, CautionWords>;
  treatment: Record<TreatmentKind, TreatmentWords>;
  sowingMethod: Record<SowingMethod, SowingMethodWords>;
  speciesTag: Record<SpeciesTag, string>;
  sourcedField: Record<SourcedField, string>;
  groupRole: Record<GroupRole, RoleWords>;
  globalRole: Record<GlobalRole, RoleWords>;
  ecoregionMethod: Record<EcoregionMethod, string>;
  month: Record<MonthNumber, MonthWords>;
}

type Step = Pick<TreatmentStep, 'kind' | 'days'>;

/** The tables of one language and the phrases built from them, in that language's own word order. */
export interface Vocabulary extends WordTables {
  locale: WordLocale;
  /** ["a", "b", "c"] → "a, b and c" / "a, b y c" (Intl.ListFormat in the locale). */
  join(words: readonly string[], conjunction?: 'and' | 'or'): string;
  /** [8, 9, 10] → "Aug–Oct" / "ago–oct"; all twelve → "all year" / "todo el año". */
  formatMonths(months: readonly number[]): string;
  /** "Blooms Jun–Aug" / "Florece jun–ago", or the words for none recorded. */
  bloomWords(bloomMonths: readonly number[]): string;
  sunPhrase(sun: readonly Sun[]): string;
  moisturePhrase(moisture: readonly Moisture[]): string;
  soilPhrase(soils: readonly SoilTexture[]): string;
  describeGround(sun: Sun, moisture: Moisture): string;
  siteShortWords(sun: readonly Sun[], moisture: readonly Moisture[]): string;
  cautionList(kinds: readonly CautionKind[]): string;
  habitLine(words: HabitWords): string;
  weeksWords(days: number): string;
  treatmentTitle(step: Step): string;
  treatmentBrief(step: Step): string;
  treatmentShortWords(step: Step): string;
  treatmentHow(step: Step): string;
  sowingDepthSentence(g: Pick<Germination, 'needsLight' | 'sowingDepthMm'>): string;
  sowingMethodsPhrase(methods: readonly SowingMethod[], conjunction?: 'and' | 'or'): string;
  ecoregionFoundWords(lookup: Pick<PlaceLookup, 'ecoregion' | 'zip'>): string;
}
