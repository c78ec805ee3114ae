import {
  capitalise,
  CAUTION_WORDS,
  formatMonths,
  hostLevelOf,
  MOISTURE_WORDS,
  type SpeciesSummary,
  SUN_LEVELS,
  SUN_WORDS,
} from '@homeground/shared';
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
      return capitalise(species.growthForm);
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
            {formatMonths(species.bloomMonths) || 'not recorded'}
          </span>
        </span>
      );
    case 'sun':
      return SUN_LEVELS.filter((s) => species.sun.includes(s))
        .map((s) => capitalise(SUN_WORDS[s]))
        .join(', ');
    case 'moisture':
      return species.moisture.map((m) => capitalise(MOISTURE_WORDS[m])).join(', ');
    case 'hostValue':
      return wildlifeWords(species);
    case 'monarchHost':
      return species.monarchHost ? (
        <span className={styles.yes}>
          <Checkmark16Filled className={styles.yesIcon} aria-hidden />
          Yes
        </span>
      ) : (
        <span className={styles.muted}>No</span>
      );
    case 'cautions':
      return species.cautionKinds.length === 0 ? (
        <Nothing spoken="No cautions recorded" />
      ) : (
        <span className={styles.caution}>
          <Warning16Regular className={styles.cautionIcon} aria-label="Caution:" role="img" />
          <span>{species.cautionKinds.map((k) => CAUTION_WORDS[k].title).join(', ')}</span>
        </span>
      );
  }
}

const HOST_SHORT = {
  top: 'among the best caterpillar hosts',
  good: 'a good caterpillar host',
  some: 'a few caterpillars',
  none: '',
} as const;

/** Homeground's several-part wildlife summary in a few words (caterpillars within its layer, monarchs), never a count. */
function wildlifeWords(species: SpeciesSummary): string {
  const level = hostLevelOf({
    growthForm: species.growthForm,
    scientificName: species.scientificName,
    wildlife: { lepidopteraGenusCount: species.lepidopteraGenusCount } as SpeciesSummaryWildlife,
  });
  const parts = [HOST_SHORT[level], species.monarchHost ? 'monarch host' : ''].filter(Boolean);
  return parts.length > 0 ? parts.join('; ') : 'not recorded';
}
type SpeciesSummaryWildlife = Parameters<typeof hostLevelOf>[0]['wildlife'];
