import { useTranslation } from 'react-i18next';
import { makeStyles, tokens } from '@fluentui/react-components';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';

const STEPS = ['choose', 'grow', 'share'] as const;

const useStyles = makeStyles({
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(260px, 1fr))',
    gap: tokens.spacingHorizontalL,
    marginBottom: tokens.spacingVerticalXXXL,
  },
  text: { margin: 0, lineHeight: tokens.lineHeightBase400 },
});

export function HowItWorks() {
  const styles = useStyles();
  const { t } = useTranslation('home');
  return (
    <section aria-labelledby="how-it-works">
      <Heading level="section" id="how-it-works">
        {t('how.title')}
      </Heading>
      <div className={styles.grid}>
        {STEPS.map((step) => (
          <ContentCard key={step} as="article">
            <Heading level="card">{t(`how.${step}Title`)}</Heading>
            <p className={styles.text}>{t(`how.${step}Text`)}</p>
          </ContentCard>
        ))}
      </div>
    </section>
  );
}
