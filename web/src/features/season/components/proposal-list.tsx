import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { AddRegular, CheckmarkRegular } from '@fluentui/react-icons';
import type { ShareList } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { Heading } from '../../../components/page/page-heading.js';
import type { TargetDraft } from '../hooks/use-target-draft.js';
import { useFormatters, useWords } from '../../../lib/i18n/index.js';
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

/** The proposals with why, each with a button that adds it to the (unsaved) targets. */
export function ProposalList({ list, draft }: { list: ShareList; draft: TargetDraft }) {
  const { t } = useTranslation('season');
  const words = useWords();
  const { number } = useFormatters();
  const styles = useStyles();
  const shared = useSeasonStyles();
  return (
    <section aria-label={t('proposals.label')}>
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
                  aria-label={
                    isAdded
                      ? t('proposals.onTargetsOf', { name: p.commonName })
                      : t('proposals.addOf', { name: p.commonName })
                  }
                  onClick={() => draft.add(p)}
                >
                  {isAdded
                    ? t('proposals.onTargets')
                    : t('proposals.add', { count: p.suggestedPlants, formatted: number(p.suggestedPlants) })}
                </Button>
              </div>
              <p className={styles.meta}>
                {t('proposals.meta', {
                  // Bloom periods as the trade says them (CP42's early / mid / late).
                  bloom:
                    p.bloomPeriods.length === 0
                      ? t('proposals.noBloom')
                      : words.join(p.bloomPeriods.map((period) => t(`proposals.bloom.${period}`))),
                  sun: words.sunPhrase(p.sunOptimum),
                  soil: words.moisturePhrase(p.moistureOptimum).toLowerCase(),
                })}
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
