import { MessageBar, MessageBarBody } from '@fluentui/react-components';
import type { SeasonBatches } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { myBatchesQueryOptions } from '../../../api/batches/batches.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { QueryState } from '../../../components/states/index.js';
import { SupplyTable } from '../../../components/supplies/supply-table.js';
import { useTranslation } from 'react-i18next';
import { useFormatters } from '../../../lib/i18n/index.js';
import { localToday } from '../utils/my-batches-words.js';
import { BatchCard } from './batch-card.js';
import { CalendarDownload } from './calendar-download.js';
import { GrowerSetupCard } from './grower-setup-card.js';
import { useMyBatchesStyles } from './my-batches.styles.js';
import { useLogOutbox, type LogOutboxState } from '../offline/use-log-outbox.js';
import { OutboxBar } from './outbox-bar.js';

/** A grower's batches in one group's season, with their own supply list. */
export function MyBatchesPage({ slug, userId }: { slug: string; userId: string }) {
  const styles = useMyBatchesStyles();
  const { t } = useTranslation('batches');
  const batches = useQuery(myBatchesQueryOptions(slug, userId));
  const outbox = useLogOutbox(slug, userId);
  return (
    <>
      <PageIntro title={t('page.title')}>{t('page.lead')}</PageIntro>
      <OutboxBar outbox={outbox} />
      <QueryState
        query={batches}
        loading={t('page.loading')}
        error={t('page.failed')}
        isEmpty={(d) => d.data.batches.length === 0}
        empty={t('page.none')}
      >
        {(d) => (
          <>
            {d.savedAt ? <SavedCopyBar savedAt={d.savedAt} /> : null}
            <BatchList slug={slug} answer={d.data} outbox={outbox} />
          </>
        )}
      </QueryState>
      <div className={styles.after}>
        <GrowerSetupCard slug={slug} userId={userId} />
      </div>
    </>
  );
}

/** Says the page shows the copy kept on the device, and from when, because the server could not be reached. */
function SavedCopyBar({ savedAt }: { savedAt: string }) {
  const { t } = useTranslation('batches');
  const { moment } = useFormatters();
  return (
    <MessageBar intent="info" aria-label={t('offline.savedLabel')}>
      <MessageBarBody>{t('offline.saved', { when: moment(savedAt) })}</MessageBarBody>
    </MessageBar>
  );
}

function BatchList({ slug, answer, outbox }: { slug: string; answer: SeasonBatches; outbox: LogOutboxState }) {
  const styles = useMyBatchesStyles();
  const { t } = useTranslation('batches');
  const today = localToday();
  const mine = answer.supplies.byGrower[0];
  return (
    <div className={styles.stack}>
      <CalendarDownload slug={slug} year={answer.year} />
      {answer.batches.map((b) => (
        <BatchCard key={b.id} slug={slug} batch={b} today={today} outbox={outbox} />
      ))}
      {mine ? (
        <ContentCard aria-labelledby="my-supplies">
          <Heading level="section" id="my-supplies">
            {t('page.supplies')}
          </Heading>
          <SupplyTable list={mine.list} label={t('page.suppliesLabel')} />
        </ContentCard>
      ) : null}
    </div>
  );
}
