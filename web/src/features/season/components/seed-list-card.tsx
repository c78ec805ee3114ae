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
import { downloadSeedListCsv, type SeasonSeedList } from '../../../api/seasons/seasons.api.js';
import { seedListQueryOptions } from '../../../api/seasons/seasons.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { countWords } from '../utils/season-words.js';
import { SeedListNotes } from './seed-list-notes.js';
import { useSeasonStyles } from './season.styles.js';
import './seed-list-print.css';

/** "12.5 g / 0.441 oz", or words when the record gives no seeds per pound. */
function weightWords(grams: number | null, ounces: number | null): string {
  return grams === null || ounces === null ? 'no weight on record' : `${grams} g / ${ounces} oz`;
}

/**
 * The seed list: per target, seeds to sow (target ÷ (germination × (1 − losses))), their weight and
 * packets, and which to collect locally instead, with the collecting cautions. Prints black on white.
 */
export function SeedListCard({ slug }: { slug: string }) {
  const seedList = useQuery(seedListQueryOptions(slug));
  return (
    <ContentCard aria-labelledby="season-seed-list">
      <Heading level="section" id="season-seed-list">
        Seed list
      </Heading>
      <QueryState
        query={seedList}
        loading="Working out the seed list"
        error="The seed list did not load."
        isEmpty={(l) => l.rows.length === 0}
        empty="The seed list fills in once the season has targets."
      >
        {(list) => <SeedListBody slug={slug} list={list} />}
      </QueryState>
    </ContentCard>
  );
}

function SeedListBody({ slug, list }: { slug: string; list: SeasonSeedList }) {
  const styles = useSeasonStyles();
  return (
    <div data-print-root="seed-list">
      <p className={styles.lead}>
        Worked out for {list.year} with {Math.round(list.lossFactor * 100)}% of seedlings allowed for losses and{' '}
        {list.seedsPerPacket} seeds in a packet.
      </p>
      <div className={styles.scroller} role="region" aria-label="Seed list table" tabIndex={0}>
        <Table className={styles.table} aria-labelledby="season-seed-list">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Species</TableHeaderCell>
              <TableHeaderCell>Seeds to sow</TableHeaderCell>
              <TableHeaderCell>Packets</TableHeaderCell>
              <TableHeaderCell>Weight</TableHeaderCell>
              <TableHeaderCell>Target plants</TableHeaderCell>
              <TableHeaderCell>Germination</TableHeaderCell>
              <TableHeaderCell>Get it by</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {list.rows.map((r) => (
              <TableRow key={r.slug}>
                <TableCell>
                  {r.commonName}
                  <span className={styles.scientific}>{r.scientificName}</span>
                </TableCell>
                <TableCell>{countWords(r.seedsToSow)}</TableCell>
                <TableCell>{countWords(r.packets)}</TableCell>
                <TableCell>{weightWords(r.grams, r.ounces)}</TableCell>
                <TableCell>{countWords(r.targetPlants)}</TableCell>
                <TableCell>
                  {r.germinationRatePct}% {r.germinationFrom === 'yours' ? '(yours)' : '(record)'}
                </TableCell>
                <TableCell>
                  {r.neverCollectWild
                    ? 'Buy: never from the wild'
                    : r.collectLocally
                      ? 'Collect locally instead'
                      : r.buyBy === 'weight'
                        ? 'Buy by weight'
                        : 'Buy in packets'}
                </TableCell>
              </TableRow>
            ))}
            <TableRow>
              <TableCell>
                <strong>All targets</strong>
              </TableCell>
              <TableCell>{countWords(list.totals.seedsToSow)}</TableCell>
              <TableCell>{countWords(list.totals.packets)}</TableCell>
              <TableCell>{weightWords(list.totals.grams, list.totals.ounces)}</TableCell>
              <TableCell>{countWords(list.totals.targetPlants)}</TableCell>
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
      setFailure(error instanceof Error ? error.message : 'The CSV did not download. Try again.');
    }
  };
  return (
    <div className={styles.actions} data-print="hide">
      <Button icon={<ArrowDownloadRegular />} onClick={() => void download()}>
        Download the seed list (CSV)
      </Button>
      <Button icon={<PrintRegular />} onClick={() => window.print()}>
        Print the seed list
      </Button>
      {failure ? <span role="alert">{failure}</span> : null}
    </div>
  );
}
