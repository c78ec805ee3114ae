import { useTranslation } from 'react-i18next';
import { makeStyles, tokens } from '@fluentui/react-components';
import { useId } from 'react';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import type { ChosenEntry } from '../hooks/use-chosen-species.js';
import { ChosenSpeciesList } from './chosen-species-list.js';
import { PastedNames } from './pasted-names.js';
import { SpeciesSearch } from './species-search.js';

const useStyles = makeStyles({
  card: { marginBottom: tokens.spacingVerticalXL },
  ways: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(280px, 1fr))',
    gap: tokens.spacingHorizontalXXL,
    marginBottom: tokens.spacingVerticalXL,
  },
});

export interface ChooseSpeciesProps {
  slugs: readonly string[];
  entries: readonly ChosenEntry[];
  onAdd: (slugs: string[]) => void;
  onRemove: (slug: string) => void;
  onClear: () => void;
}

/** The three ways in: search, a pasted list, or a link that already names the species. */
export function ChooseSpecies({ slugs, entries, onAdd, onRemove, onClear }: ChooseSpeciesProps) {
  const styles = useStyles();
  const { t } = useTranslation('cards');
  const headingId = useId();
  return (
    <ContentCard className={styles.card} aria-labelledby={headingId}>
      <Heading level="section" id={headingId}>
        {t('choose.title')}
      </Heading>
      <div className={styles.ways}>
        <SpeciesSearch chosen={slugs} onAdd={(s) => onAdd([s.slug])} />
        <PastedNames onAdd={onAdd} />
      </div>
      <ChosenSpeciesList entries={entries} onRemove={onRemove} onClear={onClear} />
    </ContentCard>
  );
}
