import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { useFormatters, useWords } from '../../../../lib/i18n/index.js';
import { type MixRow, whyItFits } from '../../utils/mix-rows.js';
import { quantityWords } from '../../utils/quantity-words.js';
import { SpeciesActions } from './species-actions.js';
import { SpeciesCautions } from './species-cautions.js';
import type { SpeciesCaution } from '../../hooks/use-mix-cautions.js';

const useStyles = makeStyles({
  scroller: { overflowX: 'auto', maxWidth: '100%' },
  table: { width: '100%', borderCollapse: 'collapse', fontSize: tokens.fontSizeBase300 },
  th: {
    textAlign: 'left',
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalS}`,
    borderBottom: `2px solid ${tokens.colorNeutralStroke1}`,
    fontWeight: tokens.fontWeightSemibold,
    verticalAlign: 'bottom',
  },
  num: { textAlign: 'right', whiteSpace: 'nowrap' },
  td: {
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalS}`,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
    verticalAlign: 'top',
  },
  caption: {
    textAlign: 'left',
    marginBottom: tokens.spacingVerticalS,
    color: tokens.colorNeutralForeground2,
    fontSize: tokens.fontSizeBase200,
  },
  rowHead: { textAlign: 'left', fontWeight: tokens.fontWeightRegular, minWidth: '14rem' },
  name: { fontWeight: tokens.fontWeightSemibold, display: 'block' },
  sci: { fontStyle: 'italic', color: tokens.colorNeutralForeground2, display: 'block' },
  meta: { color: tokens.colorNeutralForeground2, fontSize: tokens.fontSizeBase200, display: 'block' },
  roles: { margin: 0, paddingLeft: tokens.spacingHorizontalL, fontSize: tokens.fontSizeBase200 },
  why: { marginTop: tokens.spacingVerticalXS, fontSize: tokens.fontSizeBase200 },
  whyList: { margin: `${tokens.spacingVerticalXS} 0 0`, paddingLeft: tokens.spacingHorizontalL },
  pending: {
    color: tokens.colorStatusWarningForeground3,
    fontWeight: tokens.fontWeightSemibold,
    fontSize: tokens.fontSizeBase200,
  },
});

export interface MixViewProps {
  rows: readonly MixRow[];
  cautions: Record<string, SpeciesCaution[]>;
  onToggleLock: (slug: string) => void;
  onToggleExclude: (slug: string) => void;
  onSwap: (slug: string) => void;
  isBusy: boolean;
}

/** The mix as a table: one row per species with its roles, quantities, why it fits and cautions. */
export function MixTable({ rows, cautions, onToggleLock, onToggleExclude, onSwap, isBusy }: MixViewProps) {
  const styles = useStyles();
  const { t } = useTranslation('mix');
  const words = useWords();
  const f = useFormatters();
  return (
    <div className={styles.scroller}>
      <table className={styles.table}>
        <caption className={styles.caption}>{t('table.caption')}</caption>
        <thead>
          <tr>
            <th scope="col" className={styles.th}>
              {t('table.species')}
            </th>
            <th scope="col" className={styles.th}>
              {t('table.role')}
            </th>
            <th scope="col" className={mergeClasses(styles.th, styles.num)}>
              {t('table.plants')}
            </th>
            <th scope="col" className={mergeClasses(styles.th, styles.num)}>
              {t('table.spacing')}
            </th>
            <th scope="col" className={mergeClasses(styles.th, styles.num)}>
              {t('table.seeds')}
            </th>
            <th scope="col" className={mergeClasses(styles.th, styles.num)}>
              {t('table.weight')}
            </th>
            <th scope="col" className={styles.th} data-print="hide">
              {t('table.change')}
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => {
            const why = whyItFits(r.chosen.parts);
            const q = quantityWords(r.quantity, t, f);
            return (
              <tr key={r.slug} data-slug={r.slug}>
                <th scope="row" className={mergeClasses(styles.td, styles.rowHead)}>
                  <span className={styles.name}>{r.species.commonName}</span>
                  <span className={styles.sci}>{r.species.scientificName}</span>
                  <span className={styles.meta}>
                    {t('row.meta', {
                      bloom: words.bloomWords(r.species.bloomMonths),
                      height: f.heightRange(r.species.heightCm.min, r.species.heightCm.max),
                    })}
                  </span>
                  {r.isExcluded ? <span className={styles.pending}>{t('row.leftOut')}</span> : null}
                  <SpeciesCautions name={r.species.commonName} cautions={cautions[r.slug]} />
                  <details className={styles.why}>
                    <summary>{t('row.whyItFits')}</summary>
                    <ul className={styles.whyList}>
                      {why.fits.map((reason) => (
                        <li key={reason}>{reason}</li>
                      ))}
                      {why.mindful.map((reason) => (
                        <li key={reason}>{t('row.worthKnowing', { reason })}</li>
                      ))}
                    </ul>
                  </details>
                </th>
                <td className={styles.td}>
                  <ul className={styles.roles}>
                    {r.chosen.roles.map((role) => (
                      <li key={role}>{role}</li>
                    ))}
                  </ul>
                </td>
                <td className={mergeClasses(styles.td, styles.num)}>{q.plants}</td>
                <td className={mergeClasses(styles.td, styles.num)}>{q.spacing}</td>
                <td className={mergeClasses(styles.td, styles.num)}>{q.seeds}</td>
                <td className={mergeClasses(styles.td, styles.num)}>{q.weight}</td>
                <td className={styles.td} data-print="hide">
                  <SpeciesActions
                    name={r.species.commonName}
                    isLocked={r.isLocked}
                    isExcluded={r.isExcluded}
                    onToggleLock={() => onToggleLock(r.slug)}
                    onToggleExclude={() => onToggleExclude(r.slug)}
                    onSwap={() => onSwap(r.slug)}
                    disabled={isBusy}
                  />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
