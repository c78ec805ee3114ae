import { makeStyles, tokens } from '@fluentui/react-components';
import { PageIntro } from '../components/page/page-intro.js';
import { ChooseSpecies, PrintWorkspace, useCardSelection, useChosenSpecies } from '../features/cards-labels/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

const useStyles = makeStyles({
  note: { margin: `0 0 ${tokens.spacingVerticalL}`, color: tokens.colorNeutralForeground2 },
});

/** /cards-and-labels?species=slug1,slug2 or ?mix=<saved mix id>: choose species, then print (see `useCardSelection`). */
export function CardsLabelsRoute() {
  useDocumentTitle('Cards & labels');
  const styles = useStyles();
  const selection = useCardSelection();
  const chosen = useChosenSpecies(selection.slugs);

  return (
    <>
      <PageIntro title="Cards & labels">
        Print fact cards (four to a page) and pot labels for the plants you grow: black on white with a thin band of
        flower colour, so they stay readable when photocopied.
      </PageIntro>
      {selection.isMixMissing ? (
        <p className={styles.note} role="status">
          The saved mix in this link could not be opened, so its species were not added.
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
