import { makeStyles, tokens } from '@fluentui/react-components';
import { useQuery } from '@tanstack/react-query';
import { useCallback, useEffect } from 'react';
import { useSearchParams } from 'react-router-dom';
import { savedMixQueryOptions } from '../api/mixes/mixes.queries.js';
import { PageIntro } from '../components/page/page-intro.js';
import { paths } from '../config/paths.js';
import { ChooseSpecies, PrintWorkspace, useChosenSpecies } from '../features/cards-labels/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

const useStyles = makeStyles({
  note: { margin: `0 0 ${tokens.spacingVerticalL}`, color: tokens.colorNeutralForeground2 },
});

/**
 * /cards-and-labels?species=slug1,slug2 (from a species page or a yard mix) or ?mix=<saved mix id>.
 * The chosen list lives in the URL, so the page can be bookmarked or sent on as it is.
 */
export function CardsLabelsRoute() {
  useDocumentTitle('Cards & labels');
  const styles = useStyles();
  const [params, setParams] = useSearchParams();
  const { species: slugs, mix: mixId } = paths.cardsLabels.parse(params);
  const chosen = useChosenSpecies(slugs);

  const setSlugs = useCallback(
    (next: string[]) =>
      setParams(
        // The mix's species are now named one by one, so the link drops the mix.
        () => paths.cardsLabels.search({ species: next }),
        { replace: true },
      ),
    [setParams],
  );

  // A saved mix's species join the list once, then the link names them directly.
  const mix = useQuery({ ...savedMixQueryOptions(mixId ?? ''), enabled: Boolean(mixId) });
  useEffect(() => {
    if (mixId && mix.data) setSlugs([...slugs, ...mix.data.chosen.filter((s) => !slugs.includes(s))]);
    // slugs is read at the moment the mix arrives; re-running on every list change would re-add removed ones.
  }, [mixId, mix.data, setSlugs]);

  return (
    <>
      <PageIntro title="Cards & labels">
        Print fact cards (four to a page) and pot labels for the plants you grow: black on white with a thin band of
        flower colour, so they stay readable when photocopied.
      </PageIntro>
      {mixId && mix.isError ? <p className={styles.note} role="status">The saved mix in this link could not be opened, so its species were not added.</p> : null}
      <ChooseSpecies
        slugs={slugs}
        entries={chosen.entries}
        onAdd={(added) => setSlugs([...slugs, ...added.filter((s) => !slugs.includes(s))])}
        onRemove={(slug) => setSlugs(slugs.filter((s) => s !== slug))}
        onClear={() => setSlugs([])}
      />
      <PrintWorkspace species={chosen.ready} isLoading={chosen.isLoading || (Boolean(mixId) && mix.isPending)} />
    </>
  );
}
