import { mergeClasses } from '@fluentui/react-components';
import { isFloweringSpecies, type SpeciesSummary } from '@homeground/shared';
import { useId, useMemo } from 'react';
import { flowerSwatch } from '../../../../theme/flower-colours.js';
import { BloomLegend } from './bloom-legend.js';
import { describeGaps, MONTH_NAMES, monthlyBloom } from '../../utils/bloom-gaps.js';
import { useBloomChartStyles } from './bloom-chart.styles.js';

/**
 * The bloom chart: one bloom strip per species, one column per month. Each bloom cell takes the
 * species' flower colour and its two-letter label; gap months carry a hatch and a "gap" flag; a
 * sentence under the chart names the gaps for anyone who cannot see it.
 */
export function BloomChart({ species }: { species: readonly SpeciesSummary[] }) {
  const styles = useBloomChartStyles();
  const captionId = useId();
  const months = useMemo(() => monthlyBloom(species), [species]);
  const summary = describeGaps(months);

  return (
    <div>
      <p className={styles.caption} aria-hidden>
        The months each species of your mix flowers. On a narrow screen, scroll the chart sideways to see every month.
      </p>
      <div className={styles.scroller} role="region" aria-labelledby={captionId} tabIndex={0}>
        <table className={styles.table}>
          <caption id={captionId} className={styles.visuallyHidden}>
            Bloom chart: the months each species of your mix flowers
          </caption>
          <thead>
            <tr>
              <th scope="col" className={styles.nameHead}>
                Species
              </th>
              {months.map((m) => (
                <th key={m.month} scope="col" className={styles.monthHead}>
                  <span className={styles.visuallyHidden}>
                    {MONTH_NAMES[m.month - 1]}
                    {m.isGap ? ', gap' : ''}
                  </span>
                  <span aria-hidden className={styles.monthLong}>
                    {MONTH_NAMES[m.month - 1].slice(0, 3)}
                  </span>
                  <span aria-hidden className={styles.monthShort}>
                    {MONTH_NAMES[m.month - 1].charAt(0)}
                  </span>
                  {m.isGap ? (
                    <span aria-hidden className={styles.gapFlag}>
                      gap
                    </span>
                  ) : null}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {species.map((s) => {
              const swatch = flowerSwatch(s.flowerColours[0]);
              const counted = isFloweringSpecies(s);
              return (
                <tr key={s.slug}>
                  <th scope="row" className={styles.rowHead}>
                    {s.commonName}
                    {counted ? null : <span className={styles.notCounted}>grass, sedge or fern: not counted</span>}
                  </th>
                  {months.map((m) => {
                    const blooms = s.bloomMonths.includes(m.month);
                    return blooms ? (
                      <td
                        key={m.month}
                        className={mergeClasses(styles.cell, styles.bloom)}
                        style={{ backgroundColor: swatch.fill, color: swatch.ink }}
                        data-bloom={swatch.name}
                      >
                        <span aria-hidden>{swatch.label}</span>
                        <span className={styles.visuallyHidden}>in flower, {swatch.name}</span>
                      </td>
                    ) : (
                      <td key={m.month} className={mergeClasses(styles.cell, m.isGap && styles.gap)}>
                        <span className={styles.visuallyHidden}>not in flower</span>
                      </td>
                    );
                  })}
                </tr>
              );
            })}
          </tbody>
          <tfoot>
            <tr>
              <th scope="row" className={styles.countHead}>
                Flowering species in bloom
              </th>
              {months.map((m) => (
                <td key={m.month} className={mergeClasses(styles.count, m.isGap && styles.countGap)}>
                  {m.inBloom.length}
                </td>
              ))}
            </tr>
          </tfoot>
        </table>
      </div>
      <BloomLegend species={species} />
      <p className={styles.summary} data-testid="bloom-gap-summary">
        {summary}
      </p>
    </div>
  );
}
