import { useTranslation } from 'react-i18next';
import { makeStyles, tokens } from '@fluentui/react-components';
import { PageIntro } from '../components/page/page-intro.js';
import { ChooseSpecies, PrintWorkspace, useCardSelection, useChosenSpecies } from '../features/cards-labels/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

const useStyles = makeStyles({
  note: { margin: `0 0 ${tokens.spacingVerticalL}`, color: tokens.colorNeutralForeground2 },
});

/** /cards-and-labels?species=slug1,slug2 or ?mix=<saved mix id>: choose species, then print (see `useCardSelection`). */
export function CardsLabelsRoute() {
  const { t } = useTranslation('cards');
  useDocumentTitle(t('page.title'));
  const styles = useStyles();
  const selection = useCardSelection();
  const chosen = useChosenSpecies(selection.slugs);

  return (
    <>
      <PageIntro title={t('page.title')}>{t('page.intro')}</PageIntro>
      {selection.isMixMissing ? (
        <p className={styles.note} role="status">
          {t('page.mixMissing')}
        </p>
      ) : null}
      <ChooseSpecies
        slugs={selection.slugs}
        entries={chosen.entries}
        onAdd={selection.add}
        onRemove={selection.remove}
        onClear={selection.clear}
      />
      <PrintWorkspace species={chosen.ready} isLoading={chosen.isLoading || selection.isMixLoading} />
    </>
  );
}
