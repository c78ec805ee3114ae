import { mergeClasses } from '@fluentui/react-components';
import { isFloweringSpecies, type MonthNumber, type SpeciesSummary } from '@homeground/shared';
import { useId, useMemo } from 'react';
import { useTranslation } from 'react-i18next';
import { useWords } from '../../../../lib/i18n/index.js';
import { flowerSwatch } from '../../../../theme/flower-colours.js';
import { BloomLegend } from './bloom-legend.js';
import { describeGaps, monthlyBloom } from '../../utils/bloom-gaps.js';
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
  const { t } = useTranslation('mix');
  const words = useWords();
  const summary = describeGaps(months, t, words);
  const monthWords = (month: number) => words.month[month as MonthNumber];

  return (
    <div>
      {/* About scrolling on a narrow screen: nothing to say on paper. */}
      <p className={styles.caption} aria-hidden data-print="hide">
        {t('bloom.intro')}
      </p>
      <div className={styles.scroller} role="region" aria-labelledby={captionId} tabIndex={0}>
        <table className={styles.table}>
          <caption id={captionId} className={styles.visuallyHidden}>
            {t('bloom.caption')}
          </caption>
          <thead>
            <tr>
              <th scope="col" className={styles.nameHead}>
                {t('bloom.species')}
              </th>
              {months.map((m) => (
                <th key={m.month} scope="col" className={styles.monthHead}>
                  <span className={styles.visuallyHidden}>
                    {m.isGap ? t('bloom.monthGap', { month: monthWords(m.month).long }) : monthWords(m.month).long}
                  </span>
                  <span aria-hidden className={styles.monthLong}>
                    {monthWords(m.month).short}
                  </span>
                  <span aria-hidden className={styles.monthShort}>
                    {monthWords(m.month).initial}
                  </span>
                  {m.isGap ? (
                    <span aria-hidden className={styles.gapFlag}>
                      {t('bloom.gap')}
                    </span>
                  ) : null}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {species.map((s) => {
              const swatch = flowerSwatch(s.flowerColours[0]);
              const first = s.flowerColours[0];
              const colour = first ? words.flowerColour[first] : t('bloom.colourUnknown');
              const label = first ? t(`bloom.cellLabel.${first}`) : swatch.label;
              const counted = isFloweringSpecies(s);
              return (
                <tr key={s.slug}>
                  <th scope="row" className={styles.rowHead}>
                    {s.commonName}
                    {counted ? null : <span className={styles.notCounted}>{t('bloom.notCounted')}</span>}
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
                        <span aria-hidden>{label}</span>
                        <span className={styles.visuallyHidden}>{t('bloom.inFlower', { colour })}</span>
                      </td>
                    ) : (
                      <td key={m.month} className={mergeClasses(styles.cell, m.isGap && styles.gap)}>
                        <span className={styles.visuallyHidden}>{t('bloom.notInFlower')}</span>
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
                {t('bloom.count')}
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
