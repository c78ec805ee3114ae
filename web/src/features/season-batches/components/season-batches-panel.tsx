import { UNIT_OF, type SeasonGrower } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { batchesQueryOptions, growersQueryOptions } from '../../../api/batches/batches.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { SupplyTable } from '../../../components/supplies/supply-table.js';
import { useTranslation } from 'react-i18next';
import { useWords } from '../../../lib/i18n/index.js';
import { GrowerMailCard } from './grower-mail-card.js';
import { ProgressCard } from './progress-card.js';
import { useSeasonBatchesStyles } from './season-batches.styles.js';
import { SplitEditor } from './split-card.js';

/** The organiser's part of the season page: growers, the split, the group's supplies, and progress. */
export function SeasonBatchesPanel({ slug }: { slug: string }) {
  const styles = useSeasonBatchesStyles();
  const { t } = useTranslation('seasonBatches');
  const batches = useQuery(batchesQueryOptions(slug));
  const growers = useQuery(growersQueryOptions(slug));
  return (
    <div className={styles.stack}>
      <ContentCard aria-labelledby="season-growers">
        <Heading level="section" id="season-growers">
          {t('growers.title')}
        </Heading>
        <p className={styles.lead}>{t('growers.lead')}</p>
        <QueryState
          query={growers}
          loading={t('split.loading')}
          error={t('split.loadFailed')}
          isEmpty={(g) => g.length === 0}
          empty={t('growers.none')}
        >
          {(g) => <GrowerList growers={g} />}
        </QueryState>
        <QueryState query={batches} loading={t('split.loading')} error={t('split.loadFailed')}>
          {(b) => (
            <>
              <SplitEditor key={b.batches.map((x) => x.id).join()} slug={slug} saved={b} />
              <Heading level="card">{t('split.groupSupplies')}</Heading>
              {b.supplies.group ? <SupplyTable list={b.supplies.group} label={t('split.groupSuppliesLabel')} /> : null}
            </>
          )}
        </QueryState>
      </ContentCard>
      <ProgressCard slug={slug} />
      <GrowerMailCard slug={slug} />
    </div>
  );
}

function GrowerList({ growers }: { growers: SeasonGrower[] }) {
  const styles = useSeasonBatchesStyles();
  const { t } = useTranslation('seasonBatches');
  const words = useWords();
  return (
    <ul className={styles.list} aria-label={t('growers.listLabel')}>
      {growers.map((g) => (
        <li key={g.userId}>
          <strong>{g.displayName}</strong>:{' '}
          {g.methods.length === 0
            ? t('growers.notStated')
            : g.methods
                .map((m) =>
                  t('growers.room', {
                    method: words.sowingMethod[m.method].phrase,
                    used: g.used.find((u) => u.method === m.method)?.units ?? 0,
                    capacity: m.capacity,
                    units: t(`units.${UNIT_OF[m.method]}`),
                  }),
                )
                .join('; ')}
        </li>
      ))}
    </ul>
  );
}
