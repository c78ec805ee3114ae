import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { capitalise, GRAMS_PER_POUND, SOWING_METHODS, type SowingMethod } from '@homeground/shared';
import { makeStyles, tokens } from '@fluentui/react-components';
import { Beaker20Regular, Checkmark20Regular, Dismiss20Regular } from '@fluentui/react-icons';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { Heading } from '../../../components/page/page-heading.js';
import { hgTokens } from '../../../theme/index.js';
import { treatmentWords } from '../utils/germination-words.js';
import { SECTION_FIELDS } from '../utils/source-labels.js';
import { FactSection } from './fact-section.js';
import { SourceNote } from './source-note.js';

const useStyles = makeStyles({
  steps: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, display: 'grid', gap: tokens.spacingVerticalM },
  stepTitle: { fontWeight: tokens.fontWeightSemibold },
  stepBody: { margin: `${tokens.spacingVerticalXXS} 0 0` },
  note: { margin: `${tokens.spacingVerticalXXS} 0 0`, color: hgTokens.hgColorLoam },
  para: { margin: `${tokens.spacingVerticalM} 0 0` },
  subheading: { marginTop: tokens.spacingVerticalL, marginBottom: tokens.spacingVerticalS },
  methods: { listStyleType: 'none', margin: 0, padding: 0, display: 'grid', gap: tokens.spacingVerticalS },
  method: {
    display: 'grid',
    gridTemplateColumns: '20px 1fr',
    columnGap: tokens.spacingHorizontalS,
    alignItems: 'start',
  },
  suits: { color: tokens.colorBrandForeground1 },
  notSuited: { color: tokens.colorNeutralForeground3 },
  how: { display: 'block', fontSize: tokens.fontSizeBase200, color: tokens.colorNeutralForeground2 },
});

/** Which of the five ways to raise it suit this species, suited ones first, each said in words. */
function MethodList({ methods }: { methods: readonly SowingMethod[] }) {
  const styles = useStyles();
  const { t } = useTranslation('detail');
  const words = useWords();
  const ordered = [...SOWING_METHODS].sort((a, b) => Number(methods.includes(b)) - Number(methods.includes(a)));
  return (
    <ul className={styles.methods}>
      {ordered.map((m) => {
        const suits = methods.includes(m);
        return (
          <li key={m} className={styles.method}>
            {suits ? (
              <Checkmark20Regular className={styles.suits} aria-hidden />
            ) : (
              <Dismiss20Regular className={styles.notSuited} aria-hidden />
            )}
            <span>
              <strong>{capitalise(words.sowingMethod[m].phrase)}</strong>:{' '}
              {suits ? t('seed.suits') : t('seed.notSuited')}
              {suits ? <span className={styles.how}>{words.sowingMethod[m].how}</span> : null}
            </span>
          </li>
        );
      })}
    </ul>
  );
}

/** Raising it from seed: treatments as steps in plain words, depth, expected germination, methods. */
export function GerminationGuide({ species }: { species: SpeciesDetail }) {
  const styles = useStyles();
  const { t } = useTranslation('detail');
  const words = useWords();
  const g = species.germination;
  const steps = g.treatments.map((step) => treatmentWords(step, words));
  return (
    <FactSection title={t('seed.title')} icon={<Beaker20Regular />}>
      <ol className={styles.steps} aria-label={t('seed.steps')}>
        {steps.map((s, i) => (
          <li key={i}>
            <span className={styles.stepTitle}>{s.title}</span>
            <p className={styles.stepBody}>{s.body}</p>
            {s.note ? <p className={styles.note}>{t('seed.note', { note: s.note })}</p> : null}
          </li>
        ))}
      </ol>
      <p className={styles.para}>{words.sowingDepthSentence(g)}</p>
      <p className={styles.para}>
        {g.seedsPerPound
          ? t('seed.rateSeeds', {
              rate: g.germinationRatePct,
              perPound: g.seedsPerPound,
              perGram: Math.round(g.seedsPerPound / GRAMS_PER_POUND),
            })
          : t('seed.rate', { rate: g.germinationRatePct })}
      </p>
      <Heading level="card" className={styles.subheading}>
        {t('seed.ways')}
      </Heading>
      <MethodList methods={g.methods} />
      <SourceNote sources={species.sources} fields={SECTION_FIELDS.germination} />
    </FactSection>
  );
}
