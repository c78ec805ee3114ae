import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { makeStyles, tokens } from '@fluentui/react-components';
import { LeafOne20Regular } from '@fluentui/react-icons';
import { hostLevelOf, hostsSpecialistBees, layerOf } from '@homeground/shared';
import type { TFunction } from 'i18next';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { SECTION_FIELDS, shortCitation } from '../utils/source-labels.js';
import { FactSection } from './fact-section.js';
import { SourceNote } from './source-note.js';

const useStyles = makeStyles({
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, display: 'grid', gap: tokens.spacingVerticalS },
});

const HOST_KEYS = { top: 'wildlife.hostTop', good: 'wildlife.hostGood', some: 'wildlife.hostSome' } as const;

/**
 * The caterpillar-host sentence in words, judged within the plant's layer (wildflowers or shrubs
 * and trees; shared wildlife-value.ts), with its citation: never the raw genus count.
 */
export function hostSentence(species: SpeciesDetail, sourceKey: string | undefined, t: TFunction<'detail'>): string {
  const level = hostLevelOf(species);
  let sentence: string;
  if (species.wildlife.lepidopteraGenusCount === null) sentence = t('wildlife.notListed');
  else if (level === 'none') sentence = t('wildlife.noneRecorded');
  else sentence = t(HOST_KEYS[level], { layer: t(`wildlife.${layerOf(species)}`) });
  return sourceKey
    ? t('wildlife.cited', { sentence, citation: shortCitation(sourceKey) })
    : t('wildlife.uncited', { sentence });
}

/** Bees in words: named specialists, a specialist-bee genus, or flowers for pollinators (shared beeWords). */
function beeSentence(species: SpeciesDetail, t: TFunction<'detail'>): string | null {
  const named = species.wildlife.specialistBees;
  if (named.length > 0) return t('wildlife.beesNamed', { bees: named.slice(0, 3).join(', ') });
  if (hostsSpecialistBees(species)) return t('wildlife.beesGenus');
  if (species.growthForm === 'graminoid' || species.growthForm === 'fern' || species.bloomMonths.length === 0)
    return null;
  return t('wildlife.beesFlowers');
}

/** What the plant feeds: caterpillars, monarchs, pollinators, birds and specialist bees. */
export function WildlifeValue({ species }: { species: SpeciesDetail }) {
  const styles = useStyles();
  const { t } = useTranslation('detail');
  const words = useWords();
  const w = species.wildlife;
  const bees = beeSentence(species, t);
  return (
    <FactSection title={t('wildlife.title')} icon={<LeafOne20Regular />}>
      <ul className={styles.list}>
        <li>{hostSentence(species, species.sources['wildlife.lepidopteraGenusCount'], t)}</li>
        {bees ? <li>{t('wildlife.bees', { words: bees })}</li> : null}
        <li>{w.monarchHost ? t('wildlife.monarch') : t('wildlife.notMonarch')}</li>
        {w.pollinators ? <li>{w.pollinators}</li> : null}
        {w.birds ? <li>{w.birds}</li> : null}
        {w.specialistBees.length > 0 ? (
          <li>
            {t('wildlife.specialists')} <i lang="la">{words.join(w.specialistBees)}</i>.
          </li>
        ) : null}
      </ul>
      <SourceNote sources={species.sources} fields={SECTION_FIELDS.wildlife} />
    </FactSection>
  );
}
