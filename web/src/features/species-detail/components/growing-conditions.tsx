import {
  capitalise,
  DEER_RESISTANCE_WORDS,
  formatHeightRangeCm,
  GROWTH_FORM_WORDS,
  HABITAT_WORDS,
  habitLine,
  joinWords,
  LIFESPAN_WORDS,
  moisturePhrase,
  soilPhrase,
  SPREAD_HABIT_WORDS,
  sunPhrase,
} from '@homeground/shared';
import { Drop20Regular, Ruler20Regular } from '@fluentui/react-icons';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { SECTION_FIELDS } from '../utils/source-labels.js';
import { FactList } from './fact-list.js';
import { FactSection } from './fact-section.js';
import { SourceNote } from './source-note.js';

/** Where it grows: light, moisture, soil and the plant communities it belongs to. */
export function GrowingConditions({ species }: { species: SpeciesDetail }) {
  return (
    <FactSection title="Where it grows" icon={<Drop20Regular />}>
      <FactList
        facts={[
          ['Sun', sunPhrase(species.sun)],
          ['Moisture', moisturePhrase(species.moisture)],
          ['Soil', soilPhrase(species.soilTextures)],
          ['Habitats', capitalise(joinWords(species.habitats.map((h) => HABITAT_WORDS[h])))],
        ]}
      />
      <SourceNote sources={species.sources} fields={SECTION_FIELDS.conditions} />
    </FactSection>
  );
}

/** Size and habit: height and spread in both unit systems, form, lifespan, spread and deer. */
export function SizeAndHabit({ species }: { species: SpeciesDetail }) {
  return (
    <FactSection title="Size and habit" icon={<Ruler20Regular />}>
      <FactList
        facts={[
          ['Height', formatHeightRangeCm(species.heightCm.min, species.heightCm.max)],
          ['Spread', formatHeightRangeCm(species.spreadCm.min, species.spreadCm.max)],
          ['Growth form', capitalise(GROWTH_FORM_WORDS[species.growthForm])],
          ['Lifespan', capitalise(LIFESPAN_WORDS[species.lifespan])],
          ['Spread habit', habitLine(SPREAD_HABIT_WORDS[species.spreadHabit])],
          ['Deer resistance', habitLine(DEER_RESISTANCE_WORDS[species.deerResistance])],
        ]}
      />
      <SourceNote sources={species.sources} fields={SECTION_FIELDS.size} />
    </FactSection>
  );
}
