import { makeStyles, tokens } from '@fluentui/react-components';
import { capitalise, type GerminationReport, SOWING_METHOD_WORDS } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { useFormatters } from '../../../lib/i18n/index.js';
import { BarTable } from './bar-table.js';

const useStyles = makeStyles({
  stack: { display: 'grid', gap: tokens.spacingVerticalL },
  scroller: { overflowX: 'auto', maxWidth: '100%' },
  table: { width: '100%', borderCollapse: 'collapse', fontVariantNumeric: 'tabular-nums' },
  caption: { textAlign: 'left', fontWeight: tokens.fontWeightSemibold, paddingBottom: tokens.spacingVerticalS },
  head: { textAlign: 'right', padding: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalM}` },
  first: { textAlign: 'left', fontWeight: tokens.fontWeightRegular, padding: `${tokens.spacingVerticalXS} 0` },
  cell: { textAlign: 'right', padding: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalM}` },
  row: { borderBottom: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}` },
});

type Row = { label: string; sown: number; germinated: number; ready: number };

/**
 * Germination from the growers' batch logs: a table by method and one by grower (seeds sown,
 * seedlings up, plants ready; counts only, growers by first name), then plants ready by method as bars.
 */
export function GerminationTables({ germination }: { germination: GerminationReport }) {
  const styles = useStyles();
  const { t } = useTranslation('report');
  const format = useFormatters();
  const byMethod: Row[] = germination.byMethod.map((m) => ({
    ...m,
    label: capitalise(SOWING_METHOD_WORDS[m.method].phrase),
  }));
  const byGrower: Row[] = germination.byGrower.map((g) => ({ ...g, label: g.grower }));
  const table = (caption: string, first: string, rows: readonly Row[]) => (
    <div className={styles.scroller}>
      <table className={styles.table}>
        <caption className={styles.caption}>{caption}</caption>
        <thead>
          <tr className={styles.row}>
            <th scope="col" className={styles.first}>
              {first}
            </th>
            <th scope="col" className={styles.head}>
              {t('sown')}
            </th>
            <th scope="col" className={styles.head}>
              {t('up')}
            </th>
            <th scope="col" className={styles.head}>
              {t('ready')}
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.label} className={styles.row}>
              <th scope="row" className={styles.first}>
                {r.label}
              </th>
              <td className={styles.cell}>{format.number(r.sown)}</td>
              <td className={styles.cell}>{format.number(r.germinated)}</td>
              <td className={styles.cell}>{format.number(r.ready)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
  return (
    <div className={styles.stack}>
      {table(t('byMethodCaption'), t('method'), byMethod)}
      {table(t('byGrowerCaption'), t('grower'), byGrower)}
      <BarTable
        caption={t('readyByMethodCaption')}
        words={(r) => t('ready_count', { count: r.value, formatted: format.number(r.value) })}
        rows={byMethod.map((m) => ({ label: m.label, value: m.ready }))}
      />
    </div>
  );
}
