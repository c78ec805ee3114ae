import { makeStyles, tokens } from '@fluentui/react-components';
import { formatHeightRangeCm } from '@homeground/shared';
import { Heading } from '../../../../components/page/page-heading.js';
import { bloomWords, whyItFits } from '../../utils/mix-rows.js';
import type { MixViewProps } from './mix-table.js';
import { plantsWords, seedsWords, spacingWords, weightWords } from '../../utils/quantity-words.js';
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
  return (
    <ul className={styles.grid} aria-label="Your yard mix, one card a species">
      {rows.map((r) => {
        const why = whyItFits(r.chosen.parts);
        return (
          <li key={r.slug} className={styles.card} data-slug={r.slug}>
            <Heading level="card" className={styles.title}>
              {r.species.commonName}
            </Heading>
            <p className={styles.sci}>{r.species.scientificName}</p>
            <p className={styles.meta}>
              Flowers {bloomWords(r.species.bloomMonths)};{' '}
              {formatHeightRangeCm(r.species.heightCm.min, r.species.heightCm.max)} tall
            </p>
            {r.isExcluded ? <p className={styles.pending}>Left out at the next rebalance</p> : null}
            <ul className={styles.roles} aria-label="Role in the mix">
              {r.chosen.roles.map((role) => (
                <li key={role} className={styles.role}>
                  {role}
                </li>
              ))}
            </ul>
            <dl className={styles.figures}>
              <dt className={styles.term}>Plants</dt>
              <dd className={styles.def}>{plantsWords(r.quantity)}</dd>
              <dt className={styles.term}>Spacing</dt>
              <dd className={styles.def}>{spacingWords(r.quantity)}</dd>
              <dt className={styles.term}>Seeds to sow</dt>
              <dd className={styles.def}>{seedsWords(r.quantity)}</dd>
              <dt className={styles.term}>Seed weight</dt>
              <dd className={styles.def}>{weightWords(r.quantity)}</dd>
            </dl>
            <SpeciesCautions name={r.species.commonName} cautions={cautions[r.slug]} />
            <p className={styles.whyTitle}>Why it fits</p>
            <ul className={styles.why}>
              {why.fits.map((t) => (
                <li key={t}>{t}</li>
              ))}
              {why.mindful.map((t) => (
                <li key={t}>Worth knowing: {t}</li>
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
