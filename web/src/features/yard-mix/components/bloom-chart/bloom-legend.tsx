import { mergeClasses } from '@fluentui/react-components';
import type { SpeciesSummary } from '@homeground/shared';
import { flowerSwatch, type FlowerSwatch } from '../../../../theme/flower-colours.js';
import { MIN_IN_BLOOM } from '../../utils/bloom-gaps.js';
import { useBloomChartStyles } from './bloom-chart.styles.js';

/** The colours that appear in this chart with their labels, and what the gap hatch means. */
export function BloomLegend({ species }: { species: readonly SpeciesSummary[] }) {
  const styles = useBloomChartStyles();
  const seen = new Map<string, FlowerSwatch>();
  for (const s of species) {
    const swatch = flowerSwatch(s.flowerColours[0]);
    seen.set(swatch.name, swatch);
  }
  return (
    <ul className={styles.legend} aria-label="Bloom chart legend">
      {[...seen.values()].map((sw) => (
        <li key={sw.name} className={styles.legendItem}>
          <span aria-hidden className={styles.swatch} style={{ backgroundColor: sw.fill, color: sw.ink }}>
            {sw.label}
          </span>
          {sw.label}: {sw.name}
        </li>
      ))}
      <li className={styles.legendItem}>
        <span aria-hidden className={mergeClasses(styles.swatch, styles.gap)} />
        Hatched, “gap”: fewer than {MIN_IN_BLOOM} flowering species in bloom (April to October)
      </li>
    </ul>
  );
}
