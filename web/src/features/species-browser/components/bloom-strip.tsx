import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { type FlowerColour, MONTH_NUMBERS } from '@homeground/shared';
import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { flowerSwatch } from '../../../theme/flower-colours.js';

const useStyles = makeStyles({
  root: { display: 'inline-flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
  cells: { display: 'flex', gap: '2px' },
  cell: {
    boxSizing: 'border-box',
    borderRadius: '2px',
    border: `1px solid ${tokens.colorNeutralStroke1}`,
    backgroundColor: tokens.colorNeutralBackground1,
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'center',
    fontSize: tokens.fontSizeBase100,
    fontWeight: tokens.fontWeightSemibold,
    lineHeight: 1,
  },
  compact: { width: '8px', height: '16px', '@media (max-width: 600px)': { width: '6px' } },
  large: { width: '28px', height: '28px', '@media (max-width: 480px)': { width: '20px', height: '24px' } },
  // Bloom months get diagonal hatching over the flower colour: filled-and-striped versus empty
  // reads without colour vision and in a greyscale photocopy.
  blooming: {
    border: `1px solid ${tokens.colorNeutralStrokeAccessible}`,
    backgroundImage: `repeating-linear-gradient(135deg, ${tokens.colorBackgroundOverlay} 0 1px, transparent 1px 4px)`,
  },
  initials: { display: 'flex', gap: '2px', color: tokens.colorNeutralForeground2, fontSize: tokens.fontSizeBase100 },
  initial: { width: '28px', textAlign: 'center', '@media (max-width: 480px)': { width: '20px' } },
});

export interface BloomStripProps {
  bloomMonths: readonly number[];
  flowerColours: readonly FlowerColour[];
  /** `compact` for a table row, `large` with month letters for a detail page. */
  size?: 'compact' | 'large';
  className?: string;
}

/**
 * One species' row of the bloom chart: twelve month cells, bloom months in the flower colour and
 * hatched, with the months said in words for screen readers ("Blooms Jun–Aug").
 */
export function BloomStrip({ bloomMonths, flowerColours, size = 'compact', className }: BloomStripProps) {
  const styles = useStyles();
  const { t } = useTranslation('species');
  const words = useWords();
  const swatch = flowerSwatch(flowerColours[0]);
  const label = words.bloomWords(bloomMonths);
  const colours = words.join(flowerColours.map((c) => words.flowerColour[c]));
  const spoken = bloomMonths.length > 0 && colours ? t('cells.flowers', { months: label, colours }) : label;
  const isLarge = size === 'large';
  return (
    <span role="img" aria-label={spoken} title={spoken} className={mergeClasses(styles.root, className)}>
      <span className={styles.cells} aria-hidden>
        {MONTH_NUMBERS.map((month) => {
          const isBlooming = bloomMonths.includes(month);
          return (
            <span
              key={month}
              className={mergeClasses(
                styles.cell,
                isLarge ? styles.large : styles.compact,
                isBlooming && styles.blooming,
              )}
              style={isBlooming ? { backgroundColor: swatch.fill, color: swatch.ink } : undefined}
              data-month={month}
              data-blooming={isBlooming || undefined}
            />
          );
        })}
      </span>
      {isLarge ? (
        <span className={styles.initials} aria-hidden>
          {MONTH_NUMBERS.map((month) => (
            <span key={month} className={styles.initial}>
              {words.month[month].initial}
            </span>
          ))}
        </span>
      ) : null}
    </span>
  );
}
