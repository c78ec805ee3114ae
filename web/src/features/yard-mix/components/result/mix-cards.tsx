import { makeStyles, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { Heading } from '../../../../components/page/page-heading.js';
import { useFormatters, useWords } from '../../../../lib/i18n/index.js';
import { whyItFits } from '../../utils/mix-rows.js';
import type { MixViewProps } from './mix-table.js';
import { quantityWords } from '../../utils/quantity-words.js';
import { SpeciesActions } from './species-actions.js';
import { SpeciesCautions } from './species-cautions.js';

const useStyles = makeStyles({
  grid: {
    listStyle: 'none',
    margin: 0,
    padding: 0,
    display: 'grid',
    gap: tokens.spacingVerticalL,
    gridTemplateColumns: 'repeat(auto-fill, minmax(min(100%, 300px), 1fr))',
  },
  card: {
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusXLarge,
    boxShadow: tokens.shadow4,
    padding: tokens.spacingHorizontalL,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    breakInside: 'avoid',
  },
  title: { marginBottom: 0 },
  sci: { fontStyle: 'italic', color: tokens.colorNeutralForeground2, margin: 0 },
  meta: { margin: 0, color: tokens.colorNeutralForeground2, fontSize: tokens.fontSizeBase200 },
  roles: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalXS,
    listStyle: 'none',
    margin: 0,
    padding: 0,
  },
  role: {
    fontSize: tokens.fontSizeBase200,
    padding: `1px ${tokens.spacingHorizontalS}`,
    borderRadius: tokens.borderRadiusCircular,
    border: `1px solid ${tokens.colorBrandStroke2}`,
    backgroundColor: tokens.colorBrandBackground2,
  },
  figures: {
    display: 'grid',
    gridTemplateColumns: 'auto 1fr',
    gap: `0 ${tokens.spacingHorizontalM}`,
    margin: 0,
    fontSize: tokens.fontSizeBase200,
  },
  term: { color: tokens.colorNeutralForeground2 },
  def: { margin: 0, fontVariantNumeric: 'tabular-nums' },
  whyTitle: { margin: 0, fontWeight: tokens.fontWeightSemibold, fontSize: tokens.fontSizeBase200 },
  why: { margin: 0, paddingLeft: tokens.spacingHorizontalL, fontSize: tokens.fontSizeBase200 },
  pending: {
    margin: 0,
    color: tokens.colorStatusWarningForeground3,
    fontWeight: tokens.fontWeightSemibold,
    fontSize: tokens.fontSizeBase200,
  },
  actions: { marginTop: 'auto' },
});

/** The mix as cards, easier to read on a phone: one card per species. */
export function MixCards({ rows, cautions, onToggleLock, onToggleExclude, onSwap, isBusy }: MixViewProps) {
  const styles = useStyles();
  const { t } = useTranslation('mix');
  const words = useWords();
  const f = useFormatters();
  return (
    <ul className={styles.grid} aria-label={t('cardsLabel')}>
      {rows.map((r) => {
        const why = whyItFits(r.chosen.parts);
        const q = quantityWords(r.quantity, t, f);
        return (
          <li key={r.slug} className={styles.card} data-slug={r.slug}>
            <Heading level="card" className={styles.title}>
              {r.species.commonName}
            </Heading>
            <p className={styles.sci}>{r.species.scientificName}</p>
            <p className={styles.meta}>
              {t('row.meta', {
                bloom: words.bloomWords(r.species.bloomMonths),
                height: f.heightRange(r.species.heightCm.min, r.species.heightCm.max),
              })}
            </p>
            {r.isExcluded ? <p className={styles.pending}>{t('row.leftOut')}</p> : null}
            <ul className={styles.roles} aria-label={t('table.role')}>
              {r.chosen.roles.map((role) => (
                <li key={role} className={styles.role}>
                  {role}
                </li>
              ))}
            </ul>
            <dl className={styles.figures}>
              <dt className={styles.term}>{t('table.plants')}</dt>
              <dd className={styles.def}>{q.plants}</dd>
              <dt className={styles.term}>{t('table.spacing')}</dt>
              <dd className={styles.def}>{q.spacing}</dd>
              <dt className={styles.term}>{t('table.seeds')}</dt>
              <dd className={styles.def}>{q.seeds}</dd>
              <dt className={styles.term}>{t('table.weight')}</dt>
              <dd className={styles.def}>{q.weight}</dd>
            </dl>
            <SpeciesCautions name={r.species.commonName} cautions={cautions[r.slug]} />
            <p className={styles.whyTitle}>{t('row.whyItFits')}</p>
            <ul className={styles.why}>
              {why.fits.map((reason) => (
                <li key={reason}>{reason}</li>
              ))}
              {why.mindful.map((reason) => (
                <li key={reason}>{t('row.worthKnowing', { reason })}</li>
              ))}
            </ul>
            <div className={styles.actions}>
              <SpeciesActions
                name={r.species.commonName}
                isLocked={r.isLocked}
                isExcluded={r.isExcluded}
                onToggleLock={() => onToggleLock(r.slug)}
                onToggleExclude={() => onToggleExclude(r.slug)}
                onSwap={() => onSwap(r.slug)}
                disabled={isBusy}
              />
            </div>
          </li>
        );
      })}
    </ul>
  );
}
