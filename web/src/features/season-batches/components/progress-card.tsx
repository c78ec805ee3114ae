import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow } from '@fluentui/react-components';
import type { SeasonProgress } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { progressQueryOptions } from '../../../api/batches/batches.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { useTranslation } from 'react-i18next';
import { useFormatters } from '../../../lib/i18n/format.js';
import { forecastWords } from '../utils/season-batches-words.js';
import { useSeasonBatchesStyles } from './season-batches.styles.js';

/** The organiser's dashboard: per species and per grower, with the ready forecast and how it is worked out. */
export function ProgressCard({ slug }: { slug: string }) {
  const { t } = useTranslation('seasonBatches');
  const progress = useQuery(progressQueryOptions(slug));
  return (
    <ContentCard aria-labelledby="season-progress">
      <Heading level="section" id="season-progress">
        {t('progress.title')}
      </Heading>
      <QueryState query={progress} loading={t('split.loading')} error={t('progress.failed')}>
        {(p) => <ProgressTables progress={p} />}
      </QueryState>
    </ContentCard>
  );
}

function ProgressTables({ progress }: { progress: SeasonProgress }) {
  const styles = useSeasonBatchesStyles();
  const { t } = useTranslation('seasonBatches');
  const fmt = useFormatters();
  const n = (v: number) => fmt.number(v);
  return (
    <>
      <p className={styles.lead}>{t('progress.lead')}</p>
      <div className={styles.scroller} role="region" aria-label={t('progress.bySpecies')} tabIndex={0}>
        <Table className={styles.table} aria-label={t('progress.bySpecies')}>
          <TableHeader>
            <TableRow>
              <TableHeaderCell>{t('progress.species')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.target')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.inBatches')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.sown')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.cameUp')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.ready')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.forecast')}</TableHeaderCell>
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
                <TableCell>{n(s.targetPlants)}</TableCell>
                <TableCell>{n(s.plannedPlants)}</TableCell>
                <TableCell>{n(s.sown)}</TableCell>
                <TableCell>{n(s.germinated)}</TableCell>
                <TableCell>{n(s.ready)}</TableCell>
                <TableCell>
                  {forecastWords(t, s.forecast)}
                  {s.shortBy > 0 ? (
                    <span className={styles.short}> · {t('progress.short', { count: s.shortBy })}</span>
                  ) : null}
                  {s.nudge ? <span className={styles.muted}>{s.nudge}</span> : null}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </div>
      <Heading level="card">{t('progress.byGrowerTitle')}</Heading>
      <div className={styles.scroller} role="region" aria-label={t('progress.byGrower')} tabIndex={0}>
        <Table className={styles.table} aria-label={t('progress.byGrower')}>
          <TableHeader>
            <TableRow>
              <TableHeaderCell>{t('progress.grower')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.batches')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.behind')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.sown')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.cameUp')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.lost')}</TableHeaderCell>
              <TableHeaderCell>{t('progress.ready')}</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {progress.growers.map((g) => (
              <TableRow key={g.growerId}>
                <TableCell>{g.growerName}</TableCell>
                <TableCell>{n(g.batches)}</TableCell>
                <TableCell>
                  {g.behind === 0 ? t('progress.behindNone') : <span className={styles.short}>{n(g.behind)}</span>}
                </TableCell>
                <TableCell>{n(g.sown)}</TableCell>
                <TableCell>{n(g.germinated)}</TableCell>
                <TableCell>{n(g.lost)}</TableCell>
                <TableCell>{n(g.ready)}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </div>
      <Heading level="card">{t('progress.howWorkedOut')}</Heading>
      <ul className={styles.list}>
        {progress.method.map((m) => (
          <li key={m}>{m}</li>
        ))}
      </ul>
    </>
  );
}
