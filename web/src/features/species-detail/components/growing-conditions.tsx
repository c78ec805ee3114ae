import { useFormatters, useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { capitalise } from '@homeground/shared';
import { Drop20Regular, Ruler20Regular } from '@fluentui/react-icons';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { SECTION_FIELDS } from '../utils/source-labels.js';
import { FactList } from './fact-list.js';
import { FactSection } from './fact-section.js';
import { SourceNote } from './source-note.js';

/** Where it grows: light, moisture, soil and the plant communities it belongs to. */
export function GrowingConditions({ species }: { species: SpeciesDetail }) {
  const { t } = useTranslation('detail');
  const words = useWords();
  return (
    <FactSection title={t('conditions.title')} icon={<Drop20Regular />}>
      <FactList
        facts={[
          [t('conditions.sun'), words.sunPhrase(species.sun)],
          [t('conditions.moisture'), words.moisturePhrase(species.moisture)],
          [t('conditions.soil'), words.soilPhrase(species.soilTextures)],
          [t('conditions.habitats'), capitalise(words.join(species.habitats.map((h) => words.habitat[h])))],
        ]}
      />
      <SourceNote sources={species.sources} fields={SECTION_FIELDS.conditions} />
    </FactSection>
  );
}

/** Size and habit: height and spread in both unit systems, form, lifespan, spread and deer. */
export function SizeAndHabit({ species }: { species: SpeciesDetail }) {
  const { t } = useTranslation('detail');
  const f = useFormatters();
  const words = useWords();
  return (
    <FactSection title={t('size.title')} icon={<Ruler20Regular />}>
      <FactList
        facts={[
          [t('size.height'), f.heightRange(species.heightCm.min, species.heightCm.max)],
          [t('size.spread'), f.heightRange(species.spreadCm.min, species.spreadCm.max)],
          [t('size.growthForm'), capitalise(words.growthForm[species.growthForm])],
          [t('size.lifespan'), capitalise(words.lifespan[species.lifespan])],
          [t('size.spreadHabit'), words.habitLine(words.spreadHabit[species.spreadHabit])],
          [t('size.deer'), words.habitLine(words.deerResistance[species.deerResistance])],
        ]}
      />
      <SourceNote sources={species.sources} fields={SECTION_FIELDS.size} />
    </FactSection>
  );
}
