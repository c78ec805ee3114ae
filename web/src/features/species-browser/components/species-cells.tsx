import type { TFunction } from 'i18next';
import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { capitalise, hostLevelOf, type SpeciesSummary, SUN_LEVELS } from '@homeground/shared';
import { Checkmark16Filled, Warning16Regular } from '@fluentui/react-icons';
import type { ReactNode } from 'react';
import { RouterLink } from '../../../components/links/router-link.js';
import type { NameHighlights } from '../hooks/use-name-highlights.js';
import type { OptionalColumn } from '../hooks/use-column-choice.js';
import { heightRangeParts } from '../utils/height-words.js';
import { BloomStrip } from './bloom-strip.js';
import { HighlightedText } from './highlighted-text.js';
import { useTableStyles } from './species-table.styles.js';

/** A dash for an empty cell, with words for a screen reader instead of "dash". */
function Nothing({ spoken }: { spoken: string }) {
  const styles = useTableStyles();
  return (
    <span className={styles.muted} aria-label={spoken} role="img">
      —
    </span>
  );
}

export function NameCell({
  species,
  href,
  highlights,
}: {
  species: SpeciesSummary;
  href: string;
  highlights?: NameHighlights;
}) {
  const styles = useTableStyles();
  return (
    <RouterLink to={href} className={styles.nameLink}>
      <HighlightedText text={species.commonName} ranges={highlights?.commonName} />
    </RouterLink>
  );
}

/** The content of one optional cell; the table decides which columns show. */
export function OptionalCell({
  column,
  species,
  highlights,
}: {
  column: OptionalColumn;
  species: SpeciesSummary;
  highlights?: NameHighlights;
}): ReactNode {
  const styles = useTableStyles();
  const { t } = useTranslation('species');
  const words = useWords();
  switch (column) {
    case 'scientificName':
      return (
        <i className={styles.scientific}>
          <HighlightedText text={species.scientificName} ranges={highlights?.scientificName} />
        </i>
      );
    case 'family':
      return species.family;
    case 'growthForm':
      return capitalise(words.growthForm[species.growthForm]);
    case 'height': {
      const { feet, metric } = heightRangeParts(species.heightCm.min, species.heightCm.max);
      return (
        <span className={styles.nowrap}>
          {feet}
          <br />
          <span className={styles.small}>{metric}</span>
        </span>
      );
    }
    case 'bloom':
      return (
        <span className={styles.bloomCell}>
          <BloomStrip bloomMonths={species.bloomMonths} flowerColours={species.flowerColours} />
          <span className={styles.small} aria-hidden>
            {words.formatMonths(species.bloomMonths) || t('cells.notRecorded')}
          </span>
        </span>
      );
    case 'sun':
      return SUN_LEVELS.filter((s) => species.sun.includes(s))
        .map((s) => capitalise(words.sun[s]))
        .join(', ');
    case 'moisture':
      return species.moisture.map((m) => capitalise(words.moisture[m])).join(', ');
    case 'hostValue':
      return wildlifeWords(species, t);
    case 'monarchHost':
      return species.monarchHost ? (
        <span className={styles.yes}>
          <Checkmark16Filled className={styles.yesIcon} aria-hidden />
          {t('cells.yes')}
        </span>
      ) : (
        <span className={styles.muted}>{t('cells.no')}</span>
      );
    case 'cautions':
      return species.cautionKinds.length === 0 ? (
        <Nothing spoken={t('cells.noCautions')} />
      ) : (
        <span className={styles.caution}>
          <Warning16Regular className={styles.cautionIcon} aria-label={t('cells.caution')} role="img" />
          <span>{species.cautionKinds.map((k) => words.caution[k].title).join(', ')}</span>
        </span>
      );
  }
}

const HOST_SHORT = {
  top: 'cells.hostTop',
  good: 'cells.hostGood',
  some: 'cells.hostSome',
  none: null,
} as const;

/** Homeground's several-part wildlife summary in a few words (caterpillars within its layer, monarchs), never a count. */
function wildlifeWords(species: SpeciesSummary, t: TFunction<'species'>): string {
  const level = hostLevelOf({
    growthForm: species.growthForm,
    scientificName: species.scientificName,
    wildlife: { lepidopteraGenusCount: species.lepidopteraGenusCount } as SpeciesSummaryWildlife,
  });
  const host = HOST_SHORT[level];
  const parts = [host ? t(host) : '', species.monarchHost ? t('cells.monarchHost') : ''].filter(Boolean);
  return parts.length > 0 ? parts.join('; ') : t('cells.notRecorded');
}
type SpeciesSummaryWildlife = Parameters<typeof hostLevelOf>[0]['wildlife'];
