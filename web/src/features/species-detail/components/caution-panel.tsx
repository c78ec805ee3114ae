import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { makeStyles, tokens } from '@fluentui/react-components';
import { Warning24Regular } from '@fluentui/react-icons';
import { useId } from 'react';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { hgTokens } from '../../../theme/index.js';
import { shortCitation } from '../utils/source-labels.js';

const useStyles = makeStyles({
  card: { borderLeft: `6px solid ${hgTokens.hgColorGoldenrod}` },
  heading: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  icon: { color: tokens.colorStatusWarningForeground1, flexShrink: 0 },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, display: 'grid', gap: tokens.spacingVerticalM },
  source: {
    display: 'block',
    fontSize: tokens.fontSizeBase200,
    color: hgTokens.hgColorLoam,
    marginTop: tokens.spacingVerticalXXS,
  },
  none: { margin: 0 },
  rules: { margin: `${tokens.spacingVerticalL} 0 0`, color: tokens.colorNeutralForeground2 },
});

/** Cautions first and in full, calm and specific, each with where it comes from. */
export function CautionPanel({ species }: { species: SpeciesDetail }) {
  const styles = useStyles();
  const { t } = useTranslation('detail');
  const words = useWords();
  const id = useId();
  const cautions = species.cautions;
  return (
    <ContentCard aria-labelledby={id} className={styles.card}>
      <Heading level="section" id={id} className={styles.heading}>
        <Warning24Regular className={styles.icon} aria-hidden />
        {t('cautions.title')}
      </Heading>
      {cautions.length === 0 ? (
        <p className={styles.none}>{t('cautions.none')}</p>
      ) : (
        <ul className={styles.list}>
          {cautions.map((c) => (
            <li key={`${c.kind}-${c.text}`}>
              <strong>{words.caution[c.kind].title}.</strong>{' '}
              {words.locale === 'en' ? (
                c.text
              ) : (
                // The record's own sentence is written in English: the general caution in the reader's
                // language comes first, then the record's, marked as English for screen readers.
                <>
                  {words.caution[c.kind].sentence} {t('cautions.recordLead')} <span lang="en">{c.text}</span>
                </>
              )}
              <span className={styles.source}>{t('cautions.source', { citation: shortCitation(c.source) })}</span>
            </li>
          ))}
        </ul>
      )}
      <p className={styles.rules}>{t('cautions.rules')}</p>
    </ContentCard>
  );
}
