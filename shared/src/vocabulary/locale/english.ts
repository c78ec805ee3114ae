import { CAUTION_WORDS, cautionList } from '../caution-words.js';
import { joinWords } from '../join-words.js';
import { bloomWords, formatMonths, MONTH_WORDS } from '../months.js';
import { GLOBAL_ROLE_WORDS, GROUP_ROLE_WORDS } from '../people-words.js';
import { ECOREGION_METHOD_WORDS, ecoregionFoundWords } from '../place-words.js';
import {
  DEER_RESISTANCE_WORDS,
  FLOWER_COLOUR_WORDS,
  GROWTH_FORM_WORDS,
  habitLine,
  LIFESPAN_WORDS,
  SPREAD_HABIT_WORDS,
} from '../plant-words.js';
import { SOURCED_FIELD_WORDS, SPECIES_TAG_WORDS } from '../record-words.js';
import {
  SOWING_METHOD_WORDS,
  sowingMethodsPhrase,
  TREATMENT_WORDS,
  treatmentBrief,
  treatmentHow,
  treatmentShortWords,
  treatmentTitle,
  weeksWords,
} from '../seed-words.js';
import {
  describeGround,
  HABITAT_WORDS,
  MOISTURE_WORDS,
  moisturePhrase,
  siteShortWords,
  SOIL_TEXTURE_WORDS,
  soilPhrase,
  SUN_WORDS,
  sunPhrase,
} from '../site-words.js';
import { sowingDepthSentence } from '../sowing-depth.js';
import type { Vocabulary } from './vocabulary.js';

/** English: the word tables and phrase helpers beside this folder, gathered under one shape. */
export const ENGLISH_VOCABULARY: Vocabulary = {
  locale: 'en',
  sun: SUN_WORDS,
  moisture: MOISTURE_WORDS,
  soilTexture: SOIL_TEXTURE_WORDS,
  habitat: HABITAT_WORDS,
  growthForm: GROWTH_FORM_WORDS,
  lifespan: LIFESPAN_WORDS,
  spreadHabit: SPREAD_HABIT_WORDS,
  deerResistance: DEER_RESISTANCE_WORDS,
  flowerColour: FLOWER_COLOUR_WORDS,
  caution: CAUTION_WORDS,
  treatment: TREATMENT_WORDS,
  sowingMethod: SOWING_METHOD_WORDS,
  speciesTag: SPECIES_TAG_WORDS,
  sourcedField: SOURCED_FIELD_WORDS,
  groupRole: GROUP_ROLE_WORDS,
  globalRole: GLOBAL_ROLE_WORDS,
  ecoregionMethod: ECOREGION_METHOD_WORDS,
  month: MONTH_WORDS,
  join: joinWords,
  formatMonths,
  bloomWords,
  sunPhrase,
  moisturePhrase,
  soilPhrase,
  describeGround,
  siteShortWords,
  cautionList,
  habitLine,
  weeksWords,
  treatmentTitle,
  treatmentBrief,
  treatmentShortWords,
  treatmentHow,
  sowingDepthSentence,
  sowingMethodsPhrase,
  ecoregionFoundWords,
};
