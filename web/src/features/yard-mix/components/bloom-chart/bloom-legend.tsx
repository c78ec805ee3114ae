import { mergeClasses } from '@fluentui/react-components';
import type { FlowerColour, SpeciesSummary } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { useWords } from '../../../../lib/i18n/index.js';
import { flowerSwatch, type FlowerSwatch } from '../../../../theme/flower-colours.js';
import { MIN_IN_BLOOM } from '../../utils/bloom-gaps.js';
import { useBloomChartStyles } from './bloom-chart.styles.js';

/** The colours that appear in this chart with their labels, and what the gap hatch means. */
export function BloomLegend({ species }: { species: readonly SpeciesSummary[] }) {
  const styles = useBloomChartStyles();
  const { t } = useTranslation('mix');
  const words = useWords();
  const seen = new Map<string, { swatch: FlowerSwatch; colour: FlowerColour | undefined }>();
  for (const s of species) {
    const swatch = flowerSwatch(s.flowerColours[0]);
    seen.set(swatch.name, { swatch, colour: s.flowerColours[0] });
  }
  return (
    <ul className={styles.legend} aria-label={t('bloom.legend')}>
      {[...seen.values()].map(({ swatch: sw, colour }) => (
        <li key={sw.name} className={styles.legendItem}>
          <span aria-hidden className={styles.swatch} style={{ backgroundColor: sw.fill, color: sw.ink }}>
            {colour ? t(`bloom.cellLabel.${colour}`) : sw.label}
          </span>
          {t('bloom.legendItem', {
            label: colour ? t(`bloom.cellLabel.${colour}`) : sw.label,
            colour: colour ? words.flowerColour[colour] : t('bloom.colourUnknown'),
          })}
        </li>
      ))}
      <li className={styles.legendItem}>
        <span aria-hidden className={mergeClasses(styles.swatch, styles.gap)} />
        {t('bloom.legendGap', { min: MIN_IN_BLOOM })}
      </li>
    </ul>
  );
}
