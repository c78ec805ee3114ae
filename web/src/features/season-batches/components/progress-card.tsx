import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow } from '@fluentui/react-components';
import type { SeasonProgress } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { progressQueryOptions } from '../../../api/batches/batches.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { forecastWords, SEASON_BATCHES_WORDS as W } from '../utils/season-batches-words.js';
import { useSeasonBatchesStyles } from './season-batches.styles.js';

/** The organiser's dashboard: per species and per grower, with the ready forecast and how it is worked out. */
export function ProgressCard({ slug }: { slug: string }) {
  const progress = useQuery(progressQueryOptions(slug));
  return (
    <ContentCard aria-labelledby="season-progress">
      <Heading level="section" id="season-progress">
        {W.progress}
      </Heading>
      <QueryState query={progress} loading={W.loading} error={W.progressFailed}>
        {(p) => <ProgressTables progress={p} />}
      </QueryState>
    </ContentCard>
  );
}

function ProgressTables({ progress }: { progress: SeasonProgress }) {
  const styles = useSeasonBatchesStyles();
  return (
    <>
      <p className={styles.lead}>{W.progressLead}</p>
      <div className={styles.scroller} role="region" aria-label="Progress by species" tabIndex={0}>
        <Table className={styles.table} aria-label="Progress by species">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Species</TableHeaderCell>
              <TableHeaderCell>Target</TableHeaderCell>
              <TableHeaderCell>In batches</TableHeaderCell>
              <TableHeaderCell>Seeds sown</TableHeaderCell>
              <TableHeaderCell>Came up</TableHeaderCell>
              <TableHeaderCell>Ready</TableHeaderCell>
              <TableHeaderCell>Ready forecast for the share</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {progress.species.map((s) => (
              <TableRow key={s.slug}>
                <TableCell>
                  {s.commonName}
                  <span className={styles.muted}>
                    <i>{s.scientificName}</i>
                  </span>
                </TableCell>
                <TableCell>{s.targetPlants}</TableCell>
                <TableCell>{s.plannedPlants}</TableCell>
                <TableCell>{s.sown}</TableCell>
                <TableCell>{s.germinated}</TableCell>
                <TableCell>{s.ready}</TableCell>
                <TableCell>
                  {forecastWords(s.forecast)}
                  {s.shortBy > 0 ? <span className={styles.short}> · {s.shortBy} short of the target</span> : null}
                  {s.nudge ? <span className={styles.muted}>{s.nudge}</span> : null}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </div>
      <Heading level="card">{W.byGrower}</Heading>
      <div className={styles.scroller} role="region" aria-label="Progress by grower" tabIndex={0}>
        <Table className={styles.table} aria-label="Progress by grower">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Grower</TableHeaderCell>
              <TableHeaderCell>Batches</TableHeaderCell>
              <TableHeaderCell>Behind plan</TableHeaderCell>
              <TableHeaderCell>Seeds sown</TableHeaderCell>
              <TableHeaderCell>Came up</TableHeaderCell>
              <TableHeaderCell>Lost</TableHeaderCell>
              <TableHeaderCell>Ready</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {progress.growers.map((g) => (
              <TableRow key={g.growerId}>
                <TableCell>{g.growerName}</TableCell>
                <TableCell>{g.batches}</TableCell>
                <TableCell>{g.behind === 0 ? 'none' : <span className={styles.short}>{g.behind}</span>}</TableCell>
                <TableCell>{g.sown}</TableCell>
                <TableCell>{g.germinated}</TableCell>
                <TableCell>{g.lost}</TableCell>
                <TableCell>{g.ready}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </div>
      <Heading level="card">{W.howWorkedOut}</Heading>
      <ul className={styles.list}>
        {progress.method.map((m) => (
          <li key={m}>{m}</li>
        ))}
      </ul>
    </>
  );
}
