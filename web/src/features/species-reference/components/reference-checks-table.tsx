import { makeStyles, tokens } from '@fluentui/react-components';
import type { ReferenceCheck, ReferenceVerdict } from '@homeground/shared';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  table: { width: '100%', borderCollapse: 'collapse', fontVariantNumeric: 'tabular-nums' },
  head: {
    textAlign: 'start',
    fontWeight: tokens.fontWeightSemibold,
    padding: tokens.spacingVerticalS,
    borderBottom: `${tokens.strokeWidthThick} solid ${tokens.colorNeutralStroke1}`,
  },
  cell: {
    verticalAlign: 'top',
    padding: tokens.spacingVerticalS,
    borderBottom: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    overflowWrap: 'anywhere',
  },
  caption: { captionSide: 'top', textAlign: 'start', fontStyle: 'italic', color: tokens.colorNeutralForeground3 },
  small: { display: 'block', color: tokens.colorNeutralForeground3, fontSize: tokens.fontSizeBase200 },
  agrees: { color: tokens.colorPaletteGreenForeground1, fontWeight: tokens.fontWeightSemibold },
  differs: { color: tokens.colorPaletteRedForeground1, fontWeight: tokens.fontWeightSemibold },
  quiet: { color: tokens.colorNeutralForeground2 },
});

/**
 * Checks in a table: the fact, what the record holds, what the reference says (with its file and
 * source key), whether they agree in words, and the record's note where it knowingly differs.
 */
export function ReferenceChecksTable({ checks, caption }: { checks: ReferenceCheck[]; caption: string }) {
  const styles = useStyles();
  const { t } = useTranslation('reference');
  const verdictClass = (v: ReferenceVerdict) =>
    v === 'agrees' ? styles.agrees : v === 'differs' ? styles.differs : styles.quiet;
  return (
    <table className={styles.table}>
      <caption className={styles.caption}>{caption}</caption>
      <thead>
        <tr>
          <th className={styles.head}>{t('table.fact')}</th>
          <th className={styles.head}>{t('table.record')}</th>
          <th className={styles.head}>{t('table.reference')}</th>
          <th className={styles.head}>{t('table.verdict')}</th>
          <th className={styles.head}>{t('table.note')}</th>
        </tr>
      </thead>
      <tbody>
        {checks.map((c) => (
          <tr key={c.field}>
            <th scope="row" className={styles.cell}>
              {t(`fields.${c.field}`)}
            </th>
            <td className={styles.cell}>{c.record}</td>
            <td className={styles.cell}>
              {c.reference}
              <span className={styles.small}>{t('table.source', { file: c.file, source: c.source })}</span>
            </td>
            <td className={styles.cell}>
              <span className={verdictClass(c.verdict)}>{t(`verdicts.${c.verdict}`)}</span>
              <span className={styles.small}>{t('table.rule', { rule: c.rule })}</span>
            </td>
            <td className={styles.cell}>
              {c.reconciliation ?? <span className={styles.quiet}>{t('table.noNote')}</span>}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
