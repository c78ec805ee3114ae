import type { SeasonGrower } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { batchesQueryOptions, growersQueryOptions } from '../../../api/batches/batches.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { SupplyTable } from '../../../components/supplies/supply-table.js';
import { roomWords, SEASON_BATCHES_WORDS as W } from '../utils/season-batches-words.js';
import { GrowerMailCard } from './grower-mail-card.js';
import { ProgressCard } from './progress-card.js';
import { useSeasonBatchesStyles } from './season-batches.styles.js';
import { SplitEditor } from './split-card.js';

/** The organiser's part of the season page: growers, the split, the group's supplies, and progress. */
export function SeasonBatchesPanel({ slug }: { slug: string }) {
  const styles = useSeasonBatchesStyles();
  const batches = useQuery(batchesQueryOptions(slug));
  const growers = useQuery(growersQueryOptions(slug));
  return (
    <div className={styles.stack}>
      <ContentCard aria-labelledby="season-growers">
        <Heading level="section" id="season-growers">
          {W.growers}
        </Heading>
        <p className={styles.lead}>{W.growersLead}</p>
        <QueryState
          query={growers}
          loading={W.loading}
          error={W.failed}
          isEmpty={(g) => g.length === 0}
          empty={W.noGrowers}
        >
          {(g) => <GrowerList growers={g} />}
        </QueryState>
        <QueryState query={batches} loading={W.loading} error={W.failed}>
          {(b) => (
            <>
              <SplitEditor key={b.batches.map((x) => x.id).join()} slug={slug} saved={b} />
              <Heading level="card">{W.groupSupplies}</Heading>
              {b.supplies.group ? <SupplyTable list={b.supplies.group} label="The group's supply list" /> : null}
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
  return (
    <ul className={styles.list} aria-label="Growers and their room">
      {growers.map((g) => (
        <li key={g.userId}>
          <strong>{g.displayName}</strong>:{' '}
          {g.methods.length === 0
            ? W.notStated
            : g.methods
                .map((m) => roomWords(m.method, g.used.find((u) => u.method === m.method)?.units ?? 0, m.capacity))
                .join('; ')}
        </li>
      ))}
    </ul>
  );
}
