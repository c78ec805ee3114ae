import {
  Button,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
} from '@fluentui/react-components';
import { ArrowDownloadRegular, PrintRegular } from '@fluentui/react-icons';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useTranslation } from 'react-i18next';
import { downloadSeedListCsv, type SeasonSeedList } from '../../../api/seasons/seasons.api.js';
import { seedListQueryOptions } from '../../../api/seasons/seasons.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { useFormatters } from '../../../lib/i18n/index.js';
import { SeedListNotes } from './seed-list-notes.js';
import { useSeasonStyles } from './season.styles.js';
import './seed-list-print.css';

/**
 * The seed list: per target, seeds to sow (target ÷ (germination × (1 − losses))), their weight and
 * packets, and which to collect locally instead, with the collecting cautions. Prints black on white.
 */
export function SeedListCard({ slug }: { slug: string }) {
  const { t } = useTranslation('season');
  const seedList = useQuery(seedListQueryOptions(slug));
  return (
    <ContentCard aria-labelledby="season-seed-list">
      <Heading level="section" id="season-seed-list">
        {t('seedList.title')}
      </Heading>
      <QueryState
        query={seedList}
        loading={t('seedList.loading')}
        error={t('seedList.failed')}
        isEmpty={(l) => l.rows.length === 0}
        empty={t('seedList.empty')}
      >
        {(list) => <SeedListBody slug={slug} list={list} />}
      </QueryState>
    </ContentCard>
  );
}

function SeedListBody({ slug, list }: { slug: string; list: SeasonSeedList }) {
  const { t } = useTranslation('season');
  const { number } = useFormatters();
  const styles = useSeasonStyles();
  /** "12.5 g / 0.441 oz", or words when the record gives no seeds per pound. */
  const weightWords = (grams: number | null, ounces: number | null) =>
    grams === null || ounces === null
      ? t('seedList.noWeight')
      : t('seedList.weightLine', { grams: number(grams), ounces: number(ounces) });
  return (
    <div data-print-root="seed-list">
      <p className={styles.lead}>
        {t('seedList.lead', {
          year: list.year,
          losses: number(list.lossFactor, { style: 'percent' }),
          perPacket: number(list.seedsPerPacket),
        })}
      </p>
      <div className={styles.scroller} role="region" aria-label={t('seedList.tableLabel')} tabIndex={0}>
        <Table className={styles.table} aria-labelledby="season-seed-list">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>{t('seedList.species')}</TableHeaderCell>
              <TableHeaderCell>{t('seedList.seedsToSow')}</TableHeaderCell>
              <TableHeaderCell>{t('seedList.packets')}</TableHeaderCell>
              <TableHeaderCell>{t('seedList.weight')}</TableHeaderCell>
              <TableHeaderCell>{t('seedList.targetPlants')}</TableHeaderCell>
              <TableHeaderCell>{t('seedList.germination')}</TableHeaderCell>
              <TableHeaderCell>{t('seedList.getItBy')}</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {list.rows.map((r) => (
              <TableRow key={r.slug}>
                <TableCell>
                  {r.commonName}
                  <span className={styles.scientific}>{r.scientificName}</span>
                </TableCell>
                <TableCell>{number(r.seedsToSow)}</TableCell>
                <TableCell>{number(r.packets)}</TableCell>
                <TableCell>{weightWords(r.grams, r.ounces)}</TableCell>
                <TableCell>{number(r.targetPlants)}</TableCell>
                <TableCell>
                  {t(r.germinationFrom === 'yours' ? 'seedList.rateYours' : 'seedList.rateRecord', {
                    pct: number(r.germinationRatePct),
                  })}
                </TableCell>
                <TableCell>
                  {r.neverCollectWild
                    ? t('seedList.neverWild')
                    : r.collectLocally
                      ? t('seedList.collectLocally')
                      : r.buyBy === 'weight'
                        ? t('seedList.buyByWeight')
                        : t('seedList.buyInPackets')}
                </TableCell>
              </TableRow>
            ))}
            <TableRow>
              <TableCell>
                <strong>{t('seedList.allTargets')}</strong>
              </TableCell>
              <TableCell>{number(list.totals.seedsToSow)}</TableCell>
              <TableCell>{number(list.totals.packets)}</TableCell>
              <TableCell>{weightWords(list.totals.grams, list.totals.ounces)}</TableCell>
              <TableCell>{number(list.totals.targetPlants)}</TableCell>
              <TableCell />
              <TableCell />
            </TableRow>
          </TableBody>
        </Table>
      </div>
      <SeedListNotes list={list} />
      <SeedListActions slug={slug} year={list.year} />
    </div>
  );
}

function SeedListActions({ slug, year }: { slug: string; year: number }) {
  const styles = useSeasonStyles();
  const { t } = useTranslation('season');
  const [failure, setFailure] = useState<string | null>(null);
  const download = async () => {
    setFailure(null);
    try {
      // The CSV sits behind sign-in, so it is fetched with the token and handed over as a file.
      const blob = await downloadSeedListCsv(slug);
      const url = URL.createObjectURL(blob);
      const link = document.createElement('a');
      link.href = url;
      link.download = `homeground-seed-list-${year}.csv`;
      link.click();
      URL.revokeObjectURL(url);
    } catch (error) {
      setFailure(error instanceof Error ? error.message : t('seedList.csvFailed'));
    }
  };
  return (
    <div className={styles.actions} data-print="hide">
      <Button icon={<ArrowDownloadRegular />} onClick={() => void download()}>
        {t('seedList.csv')}
      </Button>
      <Button icon={<PrintRegular />} onClick={() => window.print()}>
        {t('seedList.print')}
      </Button>
      {failure ? <span role="alert">{failure}</span> : null}
    </div>
  );
}
