import { makeStyles, tokens } from '@fluentui/react-components';
import { CheckmarkCircle16Regular, Warning16Regular } from '@fluentui/react-icons';
import { capitalise } from '@homeground/shared';
import { Heading } from '../../../components/page/page-heading.js';
import { useFormatters, useWords } from '../../../lib/i18n/index.js';
import { type SummaryFacts, summaryLines } from '../utils/share-facts.js';
import { CountStepper } from '../../../components/forms/count-stepper.js';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  card: {
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusXLarge,
    boxShadow: tokens.shadow4,
    padding: tokens.spacingHorizontalL,
    display: 'grid',
    gap: tokens.spacingVerticalS,
    alignContent: 'start',
  },
  head: { display: 'flex', justifyContent: 'space-between', gap: tokens.spacingHorizontalM, alignItems: 'baseline' },
  name: { margin: 0 },
  scientific: { fontStyle: 'italic', color: tokens.colorNeutralForeground3, display: 'block' },
  left: { fontWeight: tokens.fontWeightSemibold, whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' },
  none: { color: tokens.colorNeutralForeground3 },
  facts: { margin: 0, paddingLeft: tokens.spacingHorizontalL, display: 'grid', gap: tokens.spacingVerticalXXS },
  words: { margin: 0, fontSize: tokens.fontSizeBase200, color: tokens.colorNeutralForeground2 },
  list: { listStyle: 'none', margin: 0, padding: 0, display: 'grid', gap: tokens.spacingVerticalXXS },
  item: {
    display: 'flex',
    gap: tokens.spacingHorizontalXS,
    alignItems: 'flex-start',
    fontSize: tokens.fontSizeBase200,
  },
  caution: { flexShrink: 0, marginTop: '2px', color: tokens.colorStatusWarningForeground3 },
  fit: { flexShrink: 0, marginTop: '2px', color: tokens.colorBrandForeground1 },
  whyTitle: { margin: 0, fontWeight: tokens.fontWeightSemibold, fontSize: tokens.fontSizeBase200 },
});

export interface OfferCardProps {
  commonName: string;
  scientificName: string;
  facts: SummaryFacts;
  /** Wildlife value in parts, each already in words (caterpillars, bees, monarchs, birds). */
  wildlife: readonly string[];
  cautions: readonly { kind: string; text: string }[];
  left: number;
  /** How it suits the taker's yard, in words, with why (when they described their yard). */
  fit?: { words: string; why: readonly string[] } | null;
  /** The count chosen and its limit; without it the card only reads. */
  count?: { value: number; max: number; onChange: (value: number) => void };
}

/** One species on offer: its fact-card summary, wildlife value in words, cautions and how many are left. */
export function OfferCard({ commonName, scientificName, facts, wildlife, cautions, left, fit, count }: OfferCardProps) {
  const { t } = useTranslation('taker');
  const words = useWords();
  const { heightRange } = useFormatters();
  const styles = useStyles();
  return (
    <article className={styles.card} aria-label={commonName}>
      <div className={styles.head}>
        <Heading level="card" className={styles.name}>
          {capitalise(commonName)}
          <span className={styles.scientific}>{scientificName}</span>
        </Heading>
        <span className={left === 0 ? styles.none : styles.left}>
          {left === 0 ? t('allGone') : t('left', { count: left })}
        </span>
      </div>
      <ul className={styles.facts}>
        {summaryLines(facts, words, (min, max) => t('tall', { height: heightRange(min, max) })).map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
      {wildlife.length > 0 ? (
        <ul className={styles.list} aria-label={t('wildlifeFor', { name: commonName })}>
          {wildlife.map((w) => (
            <li key={w} className={styles.words}>
              {w}
            </li>
          ))}
        </ul>
      ) : null}
      {fit ? (
        <div>
          <p className={styles.whyTitle}>{fit.words}</p>
          <ul className={styles.list} aria-label={t('whyItFitsFor', { name: commonName })}>
            {fit.why.map((w) => (
              <li key={w} className={styles.item}>
                <CheckmarkCircle16Regular className={styles.fit} aria-hidden />
                <span>{w}</span>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {cautions.length > 0 ? (
        <ul className={styles.list} aria-label={t('cautionsFor', { name: commonName })}>
          {cautions.map((c) => (
            <li key={c.kind} className={styles.item}>
              <Warning16Regular className={styles.caution} aria-hidden />
              <span>
                <strong>{t('cautionLabel')}</strong> {c.text}
              </span>
            </li>
          ))}
        </ul>
      ) : null}
      {count && left > 0 ? (
        <CountStepper
          label={t('countLabel', { name: commonName })}
          value={count.value}
          max={count.max}
          onChange={count.onChange}
        />
      ) : null}
    </article>
  );
}
