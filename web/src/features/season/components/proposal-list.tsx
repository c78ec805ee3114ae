import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { AddRegular, CheckmarkRegular } from '@fluentui/react-icons';
import { moisturePhrase, type ShareList, type ShareListProposal, sunPhrase } from '@homeground/shared';
import { Heading } from '../../../components/page/page-heading.js';
import type { TargetDraft } from '../hooks/use-target-draft.js';
import { countWords } from '../utils/season-words.js';
import { useSeasonStyles } from './season.styles.js';

const useStyles = makeStyles({
  list: {
    listStyle: 'none',
    margin: `${tokens.spacingVerticalL} 0 0`,
    padding: 0,
    display: 'grid',
    gap: tokens.spacingVerticalL,
  },
  item: {
    borderTop: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    paddingTop: tokens.spacingVerticalM,
    display: 'grid',
    gap: tokens.spacingVerticalS,
  },
  head: { display: 'flex', flexWrap: 'wrap', justifyContent: 'space-between', gap: tokens.spacingHorizontalM },
  meta: { margin: 0, color: tokens.colorNeutralForeground2 },
});

/** Bloom periods as the trade says them (CP42's early / mid / late). */
function bloomWords(p: ShareListProposal): string {
  return p.bloomPeriods.length === 0 ? 'no early, mid or late bloom' : p.bloomPeriods.join(', ');
}

/** The proposals with why, each with a button that adds it to the (unsaved) targets. */
export function ProposalList({ list, draft }: { list: ShareList; draft: TargetDraft }) {
  const styles = useStyles();
  const shared = useSeasonStyles();
  return (
    <section aria-label="Proposed species">
      {list.notes.length > 0 ? (
        <ul className={shared.list}>
          {list.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      ) : null}
      <ul className={styles.list}>
        {list.proposals.map((p) => {
          const isAdded = draft.has(p.slug);
          return (
            <li key={p.slug} className={styles.item}>
              <div className={styles.head}>
                <Heading level="card">
                  {p.commonName} <span className={shared.scientific}>{p.scientificName}</span>
                </Heading>
                <Button
                  icon={isAdded ? <CheckmarkRegular /> : <AddRegular />}
                  disabled={isAdded}
                  aria-label={isAdded ? `${p.commonName} is on your targets` : `Add ${p.commonName} to targets`}
                  onClick={() => draft.add(p)}
                >
                  {isAdded ? 'On your targets' : `Add ${countWords(p.suggestedPlants)} plants`}
                </Button>
              </div>
              <p className={styles.meta}>
                Bloom period: {bloomWords(p)}. Suits: {sunPhrase(p.sunOptimum)};{' '}
                {moisturePhrase(p.moistureOptimum).toLowerCase()}.
              </p>
              <ul className={shared.list}>
                {p.why.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
