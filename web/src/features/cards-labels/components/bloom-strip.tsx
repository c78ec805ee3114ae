import { makeStyles, tokens } from '@fluentui/react-components';
import { MONTH_NUMBERS, MONTH_WORDS } from '@homeground/shared';
import type { FlowerSwatch } from '../../../theme/flower-colours.js';

const useStyles = makeStyles({
  strip: { display: 'grid', gridTemplateColumns: 'repeat(12, 1fr)', gap: '2px' },
  month: { textAlign: 'center', fontSize: '0.85em', color: tokens.colorNeutralForeground3 },
  inBloom: { color: tokens.colorNeutralForeground1, fontWeight: 700 },
  bar: { height: '0.5em', marginTop: '1px', borderBottom: `1px solid ${tokens.colorNeutralStroke1}` },
  // A bloom month is filled and framed in black, so it stands out on a grey copy too.
  barInBloom: { border: `1px solid ${tokens.colorNeutralForeground1}` },
});

/**
 * A species' bloom strip: twelve month letters with the bloom months filled in its flower colour.
 * Drawn for the eye only; the card says the months in words beside it.
 */
export function BloomStrip({ months, swatch }: { months: readonly number[]; swatch: FlowerSwatch }) {
  const styles = useStyles();
  return (
    <div className={styles.strip} aria-hidden data-testid="bloom-strip">
      {MONTH_NUMBERS.map((month) => {
        const inBloom = months.includes(month);
        return (
          <div key={month} className={inBloom ? `${styles.month} ${styles.inBloom}` : styles.month}>
            {MONTH_WORDS[month].initial}
            <div
              className={inBloom ? `${styles.bar} ${styles.barInBloom}` : styles.bar}
              style={inBloom ? { backgroundColor: swatch.fill } : undefined}
            />
          </div>
        );
      })}
    </div>
  );
}
