import { makeStyles, tokens } from '@fluentui/react-components';

const useStyles = makeStyles({
  table: { width: '100%', borderCollapse: 'collapse', fontVariantNumeric: 'tabular-nums' },
  caption: { textAlign: 'left', fontWeight: tokens.fontWeightSemibold, paddingBottom: tokens.spacingVerticalS },
  row: { borderBottom: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}` },
  label: {
    textAlign: 'left',
    fontWeight: tokens.fontWeightRegular,
    padding: `${tokens.spacingVerticalXS} 0`,
    width: '38%',
  },
  cell: { padding: `${tokens.spacingVerticalXS} 0 ${tokens.spacingVerticalXS} ${tokens.spacingHorizontalM}` },
  track: {
    position: 'relative',
    height: '14px',
    backgroundColor: tokens.colorNeutralBackground3,
    borderRadius: tokens.borderRadiusSmall,
    '@media print': { border: `1px solid ${tokens.colorNeutralStrokeAccessible}` },
  },
  bar: {
    height: '100%',
    backgroundColor: tokens.colorBrandBackground,
    borderRadius: tokens.borderRadiusSmall,
    // Bars print as solid shapes even when the browser drops background colours.
    '@media print': { boxShadow: `inset 0 0 0 20px ${tokens.colorNeutralForeground1}` },
  },
  target: {
    position: 'absolute',
    top: '-3px',
    bottom: '-3px',
    width: '2px',
    // Centred on its value, so a target at 100% stays inside the track.
    marginLeft: '-1px',
    backgroundColor: tokens.colorPaletteMarigoldBorderActive,
  },
  words: { fontSize: tokens.fontSizeBase200, color: tokens.colorNeutralForeground2 },
});

export interface BarRow {
  label: string;
  value: number;
  /** The season's target for this row, drawn as a mark on the bar and said in words. */
  target?: number;
}

/**
 * A bar chart that is a table first: each row's label, its count in words and a CSS bar scaled to
 * the largest value (or target), so screen readers and grey photocopies read the numbers, not colour.
 */
export function BarTable({
  caption,
  rows,
  words,
}: {
  caption: string;
  rows: readonly BarRow[];
  /** The row's count in words, in the page's language (with its target when it has one). */
  words: (row: BarRow) => string;
}) {
  const styles = useStyles();
  const max = Math.max(1, ...rows.map((r) => Math.max(r.value, r.target ?? 0)));
  const pct = (n: number) => `${Math.round((n / max) * 1000) / 10}%`;
  return (
    <table className={styles.table}>
      <caption className={styles.caption}>{caption}</caption>
      <tbody>
        {rows.map((r) => (
          <tr key={r.label} className={styles.row}>
            <th scope="row" className={styles.label}>
              {r.label}
            </th>
            <td className={styles.cell}>
              <div className={styles.track} aria-hidden>
                <div className={styles.bar} style={{ width: pct(r.value) }} />
                {r.target !== undefined ? <div className={styles.target} style={{ left: pct(r.target) }} /> : null}
              </div>
              <span className={styles.words}>{words(r)}</span>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
